/** Where a snap landed, for the status line and tests. */
export type SnapTarget = "wall-start" | "wall-end" | "neighbour" | "grid" | "none";

export interface WallSnapInput {
  /** Proposed offset of the fixture's left end from the wall start, mm. */
  offsetMm: number;
  widthMm: number;
  wallLengthMm: number;
  /** Spans of the other fixtures on the same wall, mm along the wall. */
  neighbours: readonly { startMm: number; endMm: number }[];
  gridStepMm: number;
  /** How close an edge must come to snap to it, mm. */
  thresholdMm: number;
  enabled: boolean;
}

/**
 * Snaps a fixture sliding along a wall: its ends to the wall ends and to neighbours' ends first,
 * then to the grid step; the result stays on the wall.
 */
export function snapAlongWall(s: WallSnapInput): { offsetMm: number; target: SnapTarget } {
  const maxOffset = Math.max(0, s.wallLengthMm - s.widthMm);
  const clamp = (v: number) => Math.min(maxOffset, Math.max(0, v));
  if (!s.enabled) return { offsetMm: clamp(s.offsetMm), target: "none" };
  const candidates: { at: number; target: SnapTarget }[] = [
    { at: 0, target: "wall-start" },
    { at: s.wallLengthMm - s.widthMm, target: "wall-end" },
  ];
  for (const n of s.neighbours) {
    candidates.push({ at: n.endMm, target: "neighbour" }, { at: n.startMm - s.widthMm, target: "neighbour" });
  }
  let best: { at: number; target: SnapTarget } | null = null;
  let bestD = s.thresholdMm;
  for (const c of candidates) {
    const d = Math.abs(c.at - s.offsetMm);
    if (d <= bestD) {
      bestD = d;
      best = c;
    }
  }
  if (best) return { offsetMm: clamp(best.at), target: best.target };
  return { offsetMm: clamp(snapToGrid(s.offsetMm, s.gridStepMm)), target: "grid" };
}

/** Rounds to the nearest multiple of the step (no rounding when the step is 0). */
export function snapToGrid(v: number, stepMm: number): number {
  if (!(stepMm > 0)) return v;
  return Math.round(v / stepMm) * stepMm;
}
