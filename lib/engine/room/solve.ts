import type { Vec2 } from "../geometry/types";
import { signedArea } from "../geometry/polygon";
import { distance, normalize, perpLeft, sub } from "../geometry/vec2";
import { interiorAnglesDeg } from "./angles";
import { fitDistances } from "./least-squares";
import type { DistanceObservation } from "./least-squares";
import { closeTraverse, round, traverseAngles } from "./traverse";
import { quadFromDiagonal, triangleFromWalls } from "./triangulate";
import type { SolvedRoom, SolvedWall, SquarenessReport } from "./types";

/** What solveRoom needs from the plan's room: the same fields as the plan document, defaults optional. */
export interface RoomMeasurements {
  walls: readonly { id: string; lengthMm: number }[];
  diagonals?: readonly { from: number; to: number; lengthMm: number }[];
  cornerAnglesDeg?: readonly (number | null)[];
  ceilingHeightMm?: number;
}

type Diagonal = { from: number; to: number; lengthMm: number };

/** Default ceiling, mm (9 ft), when none is measured. */
const DEFAULT_CEILING_MM = 2743;

const mmText = (v: number) => `${round(v, 1)} mm`;

/** Keep diagonals that join two corners not already joined by a wall; say which were set aside. */
function usableDiagonals(n: number, diagonals: readonly Diagonal[], notes: string[]): Diagonal[] {
  return diagonals.filter((d) => {
    const ok = d.from < n && d.to < n && d.from !== d.to && Math.abs(d.from - d.to) !== 1 && Math.abs(d.from - d.to) !== n - 1;
    if (!ok) notes.push(`The diagonal from corner ${d.from} to corner ${d.to} does not cross the room and was not used.`);
    return ok;
  });
}

/** Every measured distance between corners: the walls, then the diagonals. */
function observationsOf(lengths: readonly number[], diagonals: readonly Diagonal[]): DistanceObservation[] {
  const n = lengths.length;
  return [...lengths.map((lengthMm, i) => ({ a: i, b: (i + 1) % n, lengthMm })), ...diagonals.map((d) => ({ a: d.from, b: d.to, lengthMm: d.lengthMm }))];
}

/**
 * A four-walled room from its walls and diagonals: exact from the first diagonal that fits, then,
 * with two or more, the least-squares fit of all of them. Null when no diagonal fits the walls.
 * `what` names the diagonals in notes ("diagonal", or "angle" when they come from measured angles).
 */
function quadFromDiagonals(lengths: number[], diagonals: Diagonal[], notes: string[], what: "diagonal" | "angle"): Vec2[] | null {
  let start: Vec2[] | null = null;
  for (const d of diagonals) {
    start = quadFromDiagonal(lengths, d);
    if (start) break;
    notes.push(
      what === "diagonal"
        ? `The walls and the ${d.from}-${d.to} diagonal (${mmText(d.lengthMm)}) cannot make two triangles: check that diagonal.`
        : `The measured angle between walls ${d.from} and ${(d.from + 1) % 4} does not fit the wall lengths: check it.`,
    );
  }
  if (!start || diagonals.length < 2) return start;
  const fitted = fitDistances(start, observationsOf(lengths, diagonals));
  if (fitted) return fitted;
  notes.push(`The measured ${what}s could not be fitted together: the first one that fits was used.`);
  return start;
}

/** Fit a room of five or more walls to its diagonals, starting from the walked shape; null when they do not hold it rigid. */
function fitManyWalls(lengths: number[], diagonals: Diagonal[], start: Vec2[], notes: string[]): Vec2[] | null {
  const observations = observationsOf(lengths, diagonals);
  const fitted = fitDistances(start, observations);
  if (fitted && signedArea(fitted) > 0 && maxResidual(fitted, observations) < 25) return fitted;
  notes.push("The diagonals do not hold this room's shape together: the corner angles were used and the diagonals only compared.");
  return null;
}

/** Law of cosines: the diagonal across each measured corner of a four-walled room, mm. */
function anglesToDiagonals(lengths: number[], anglesDeg: readonly (number | null)[]): Diagonal[] {
  const out: Diagonal[] = [];
  for (let k = 0; k < 4; k++) {
    const a = anglesDeg[k];
    if (typeof a !== "number") continue;
    const before = lengths[(k + 3) % 4];
    const after = lengths[k];
    const lengthMm = Math.sqrt(before * before + after * after - 2 * before * after * Math.cos((a * Math.PI) / 180));
    out.push({ from: (k + 3) % 4, to: (k + 1) % 4, lengthMm });
  }
  return out;
}

/** Largest misfit between the corners and the measured distances, mm. */
function maxResidual(corners: Vec2[], observations: readonly DistanceObservation[]): number {
  return observations.reduce((m, o) => Math.max(m, Math.abs(distance(corners[o.a], corners[o.b]) - o.lengthMm)), 0);
}

/**
 * Solve the floor from measured walls (mm, counter-clockwise, corner 0 at the origin, wall 0
 * along +x), diagonals and corner angles (degrees), with a report of how square it is.
 */
export function solveRoom(input: RoomMeasurements): SolvedRoom {
  const n = input.walls.length;
  if (n < 3) throw new Error("A room needs at least three walls.");
  const lengths = input.walls.map((w) => w.lengthMm);
  if (lengths.some((l) => !(l > 0) || !Number.isFinite(l))) throw new Error("Every wall length must be a positive number of mm.");
  const notes: string[] = [];
  const measuredAngles = input.cornerAnglesDeg ?? [];
  const hasAngles = measuredAngles.some((a) => typeof a === "number");
  const diagonals = usableDiagonals(n, input.diagonals ?? [], notes);

  let corners: Vec2[] | null = null;
  let method: SquarenessReport["method"] = "assumed-square";
  let closureErrorMm = 0;

  if (n === 3) {
    corners = triangleFromWalls(lengths);
    if (corners) method = "lengths";
    else notes.push("These three walls cannot make a triangle (one is longer than the other two together): check them.");
  } else if (n === 4 && diagonals.length > 0) {
    corners = quadFromDiagonals(lengths, diagonals, notes, "diagonal");
    if (corners) method = "diagonals";
  } else if (n === 4 && hasAngles) {
    // Four lengths and one angle fix a four-walled room: turn each measured angle into the diagonal across it.
    corners = quadFromDiagonals(lengths, anglesToDiagonals(lengths, measuredAngles), notes, "angle");
    if (corners) method = "angles";
  } else if (n > 4 && diagonals.length > 0 && diagonals.length < n - 3) {
    notes.push(`A room of ${n} walls needs ${n - 3} diagonals to fix its shape; with ${diagonals.length} they were only compared.`);
  }

  if (!corners) {
    const ta = traverseAngles(n, measuredAngles);
    const walked = closeTraverse(lengths, ta.anglesDeg);
    closureErrorMm = Math.hypot(walked.gap.x, walked.gap.y);
    method = ta.measuredCount === 0 ? "assumed-square" : ta.measuredCount === n ? "angles" : "mixed";
    corners = walked.corners;
    if (n > 4 && diagonals.length >= n - 3) {
      const fitted = fitManyWalls(lengths, diagonals, walked.corners, notes);
      if (fitted) {
        corners = fitted;
        closureErrorMm = 0;
        method = "diagonals";
      }
    }
    if (method !== "diagonals") notes.push(...ta.notes);
    if (closureErrorMm > 0.05 && method !== "diagonals") {
      notes.push(
        `Walked with ${method === "assumed-square" ? "square corners" : "these corner angles"}, the walls miss closing by ${mmText(closureErrorMm)}; the gap was spread over the walls in proportion to their length.`,
      );
      if (n === 4) notes.push("Measure a diagonal to fix the room's true shape.");
    }
  }

  return buildRoom(input, corners, method, closureErrorMm, diagonals, hasAngles ? measuredAngles : [], notes);
}

function buildRoom(
  input: RoomMeasurements,
  corners: Vec2[],
  method: SquarenessReport["method"],
  closureErrorMm: number,
  diagonals: Diagonal[],
  measuredAngles: readonly (number | null)[],
  notes: string[],
): SolvedRoom {
  const n = corners.length;
  const walls: SolvedWall[] = input.walls.map((w, i) => {
    const start = corners[i];
    const end = corners[(i + 1) % n];
    const dir = normalize(sub(end, start));
    return { id: w.id, index: i, start, end, dir, inward: perpLeft(dir), lengthMm: w.lengthMm, solvedLengthMm: distance(start, end) };
  });
  const cornerAnglesDeg = interiorAnglesDeg(corners);
  const pairs: { from: number; to: number }[] = n === 4 ? [{ from: 0, to: 2 }, { from: 1, to: 3 }] : diagonals.map((d) => ({ from: Math.min(d.from, d.to), to: Math.max(d.from, d.to) }));
  const seen = new Set<string>();
  const diagonalReport = pairs
    .filter((p) => !seen.has(`${p.from}-${p.to}`) && seen.add(`${p.from}-${p.to}`))
    .map((p) => {
      const measured = diagonals.find((d) => Math.min(d.from, d.to) === p.from && Math.max(d.from, d.to) === p.to);
      return { from: p.from, to: p.to, measuredMm: measured ? measured.lengthMm : null, solvedMm: distance(corners[p.from], corners[p.to]) };
    });
  let diagonalDifferenceMm: number | null = null;
  if (n === 4) {
    // Sign: positive when the 0-2 diagonal is the longer one. Measured values win over solved ones.
    const [d02, d13] = diagonalReport;
    diagonalDifferenceMm = (d02.measuredMm ?? d02.solvedMm) - (d13.measuredMm ?? d13.solvedMm);
  }
  const residuals = [
    ...walls.map((w) => Math.abs((w.solvedLengthMm ?? 0) - w.lengthMm)),
    ...diagonals.map((d) => Math.abs(distance(corners[d.from], corners[d.to]) - d.lengthMm)),
  ];
  const maxResidualMm = Math.max(0, ...residuals);
  if (method === "diagonals" && maxResidualMm > 0.5) {
    notes.push(`The measurements disagree by up to ${mmText(maxResidualMm)}; the shape is the best fit to all of them.`);
  }
  measuredAngles.forEach((a, i) => {
    if (typeof a === "number" && Math.abs(a - cornerAnglesDeg[i]) > 0.5) {
      notes.push(`Corner ${i} was measured at ${round(a, 1)}° but the solved room has ${round(cornerAnglesDeg[i], 1)}°.`);
    }
  });
  const area = signedArea(corners);
  if (area <= 0) notes.push("The solved floor crosses itself or runs clockwise: check the order of the walls and the angles.");
  return {
    corners,
    walls,
    ceilingHeightMm: input.ceilingHeightMm ?? DEFAULT_CEILING_MM,
    areaMm2: Math.abs(area),
    report: {
      cornerAnglesDeg,
      offSquareDeg: cornerAnglesDeg.map((a) => a - 90),
      diagonalDifferenceMm,
      closureErrorMm,
      method,
      notes,
      diagonals: diagonalReport,
      maxResidualMm,
    },
  };
}
