/** The kinds of standing work a surface is for. */
export type WorkTask = "precision" | "light" | "heavy";

/** A recommended height band for one kind of work, mm above the floor, with where it comes from. */
export interface WorkSurfaceBand {
  task: WorkTask;
  minMm: number;
  maxMm: number;
  /** Middle of the band, mm. */
  targetMm: number;
  /** The band relative to the elbow, mm (negative = below the elbow). */
  fromElbowMm: { min: number; max: number };
  source: string;
}

const GRANDJEAN = "Grandjean, Fitting the Task to the Man";

/**
 * Offsets from standing elbow height, mm. Light work 10-15 cm below and heavy work 15-40 cm below
 * (Grandjean, published); precision work 5-10 cm above (Grandjean, value from memory).
 */
export const WORK_SURFACE_OFFSETS: Readonly<Record<WorkTask, { min: number; max: number; source: string }>> = Object.freeze({
  precision: { min: 50, max: 100, source: `${GRANDJEAN}: precision work 5-10 cm above elbow height (value from memory), so the eyes are closer and the forearms can rest.` },
  light: { min: -150, max: -100, source: `${GRANDJEAN}: light work 10-15 cm below elbow height.` },
  heavy: { min: -400, max: -150, source: `${GRANDJEAN}: heavy work 15-40 cm below elbow height, so the body's weight can bear on the work.` },
});

/** Recommended standing work-surface heights for an elbow height, mm, one band per kind of work. */
export function recommendedWorkSurfaces(elbowMm: number): Record<WorkTask, WorkSurfaceBand> {
  const band = (task: WorkTask): WorkSurfaceBand => {
    const o = WORK_SURFACE_OFFSETS[task];
    const minMm = elbowMm + o.min;
    const maxMm = elbowMm + o.max;
    return { task, minMm, maxMm, targetMm: (minMm + maxMm) / 2, fromElbowMm: { min: o.min, max: o.max }, source: o.source };
  };
  return { precision: band("precision"), light: band("light"), heavy: band("heavy") };
}

/** How a surface height (mm) sits against the band for a task: offByMm is 0 inside, negative when too low, positive when too high. */
export function assessWorkSurface(surfaceMm: number, elbowMm: number, task: WorkTask): { band: WorkSurfaceBand; within: boolean; offByMm: number } {
  const band = recommendedWorkSurfaces(elbowMm)[task];
  const offByMm = surfaceMm < band.minMm ? surfaceMm - band.minMm : surfaceMm > band.maxMm ? surfaceMm - band.maxMm : 0;
  return { band, within: offByMm === 0, offByMm };
}

/** The kinds of work a surface at this height suits for this elbow, mm; empty when it suits none. */
export function tasksSuitedTo(surfaceMm: number, elbowMm: number): WorkTask[] {
  const bands = recommendedWorkSurfaces(elbowMm);
  return (Object.keys(bands) as WorkTask[]).filter((t) => surfaceMm >= bands[t].minMm && surfaceMm <= bands[t].maxMm);
}
