import type { Vec2 } from "../geometry/types";

/** A measured distance between two corners, mm. */
export interface DistanceObservation {
  a: number;
  b: number;
  lengthMm: number;
}

/** Solve the square system m x = v by Gaussian elimination with partial pivoting; null when singular. */
export function solveLinear(m: number[][], v: number[]): number[] | null {
  const n = v.length;
  const a = m.map((row, i) => [...row, v[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) pivot = r;
    if (Math.abs(a[pivot][col]) < 1e-9) return null;
    [a[col], a[pivot]] = [a[pivot], a[col]];
    for (let r = col + 1; r < n; r++) {
      const f = a[r][col] / a[col][col];
      for (let c = col; c <= n; c++) a[r][c] -= f * a[col][c];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = a[r][n];
    for (let c = r + 1; c < n; c++) s -= a[r][c] * x[c];
    x[r] = s / a[r][r];
  }
  return x;
}

/**
 * Least-squares corner positions (mm) fitting measured distances, by Gauss-Newton from a starting
 * shape. Corner 0 stays at the origin and corner 1 on the +x axis, which fixes position and turn.
 * Returns null when the distances do not hold the shape rigid or the iteration does not settle.
 */
export function fitDistances(start: readonly Vec2[], observations: readonly DistanceObservation[]): Vec2[] | null {
  const n = start.length;
  // Unknowns: x1, then x and y of corners 2..n-1.
  const unknowns = 2 * n - 3;
  if (observations.length < unknowns) return null;
  const pts = start.map((p) => ({ x: p.x, y: p.y }));
  const index = (corner: number, axis: "x" | "y"): number => (corner === 0 ? -1 : corner === 1 ? (axis === "x" ? 0 : -1) : 1 + 2 * (corner - 2) + (axis === "x" ? 0 : 1));
  for (let iter = 0; iter < 50; iter++) {
    const jtj = Array.from({ length: unknowns }, () => new Array<number>(unknowns).fill(0));
    const jtr = new Array<number>(unknowns).fill(0);
    for (const o of observations) {
      const pa = pts[o.a];
      const pb = pts[o.b];
      const d = Math.hypot(pa.x - pb.x, pa.y - pb.y);
      if (d === 0) return null;
      const r = d - o.lengthMm;
      const ux = (pa.x - pb.x) / d;
      const uy = (pa.y - pb.y) / d;
      const row: [number, number][] = [];
      for (const [k, g] of [[index(o.a, "x"), ux], [index(o.a, "y"), uy], [index(o.b, "x"), -ux], [index(o.b, "y"), -uy]] as [number, number][]) {
        if (k >= 0) row.push([k, g]);
      }
      for (const [i, gi] of row) {
        jtr[i] += gi * r;
        for (const [j, gj] of row) jtj[i][j] += gi * gj;
      }
    }
    const step = solveLinear(jtj, jtr.map((x) => -x));
    if (!step) return null;
    pts[1].x += step[0];
    for (let c = 2; c < n; c++) {
      pts[c].x += step[index(c, "x")];
      pts[c].y += step[index(c, "y")];
    }
    if (Math.max(...step.map(Math.abs)) < 1e-7) return pts;
  }
  return null;
}
