import type { Vec2 } from "../geometry/types";

/** A wall of the solved floor: from its start corner to its end corner, counter-clockwise around the room. */
export interface SolvedWall {
  id: string;
  index: number;
  start: Vec2;
  end: Vec2;
  /** Unit vector from start to end. */
  dir: Vec2;
  /** Unit vector pointing into the room. */
  inward: Vec2;
  /** Measured length, mm. */
  lengthMm: number;
  /** Length of the solved wall, start to end, mm: differs from the measured length by what closing the room took. */
  solvedLengthMm?: number;
}

/** How far the measured room is from square and from closing, with numbers. */
export interface SquarenessReport {
  /** Interior angle at each corner, degrees (corner i is where wall i starts). */
  cornerAnglesDeg: number[];
  /** Each corner's departure from 90 degrees, degrees (signed). */
  offSquareDeg: number[];
  /** For a four-walled room: difference between the two diagonals, mm (0 when square); null otherwise. */
  diagonalDifferenceMm: number | null;
  /** Gap between the last wall's end and the first wall's start before closing, mm. */
  closureErrorMm: number;
  /** How the shape was fixed: from diagonals, from angles, assumed square, some of each, or (a three-walled room) from the lengths alone. */
  method: "diagonals" | "angles" | "assumed-square" | "mixed" | "lengths";
  notes: string[];
  /** Diagonals: measured (null when not measured) against the solved shape, mm. For four walls both 0-2 and 1-3 are listed. */
  diagonals?: { from: number; to: number; measuredMm: number | null; solvedMm: number }[];
  /** Largest difference between a measured length (wall or diagonal) and the solved shape, mm. */
  maxResidualMm?: number;
}

// Fields marked optional were added after the first contract; solveRoom always fills them.

/** The floor as solved from the measurements. Corners counter-clockwise, first corner at the origin, first wall along +x. */
export interface SolvedRoom {
  corners: Vec2[];
  walls: SolvedWall[];
  ceilingHeightMm: number;
  /** Floor area, mm². */
  areaMm2?: number;
  report: SquarenessReport;
}
