/**
 * Units and room suite: parsing typed lengths against fraction.js (an exact rational parser, the
 * reference), formatting, and solving rooms of 4 to 24 walls by each method.
 */
import Fraction from "fraction.js";
import type { BenchTable } from "../bench";
import { parseLength } from "../../lib/engine/units/parse-length";
import { formatLength } from "../../lib/engine/units/format-length";
import { solveRoom } from "../../lib/engine/room/solve";
import { fmt, timeIt } from "./timing";

export const order = 10;

const INPUTS = ["23 7/8", "95 15/16", "1 1/32", "47 31/32", "3/4", "12 1/2", "60 3/8", "7/8"];

function polygonWalls(n: number) {
  const r = 4000;
  const c = Array.from({ length: n }, (_, i) => ({ x: r * Math.cos((2 * Math.PI * i) / n), y: r * Math.sin((2 * Math.PI * i) / n) }));
  const d = (a: number, b: number) => Math.hypot(c[a].x - c[b].x, c[a].y - c[b].y);
  return {
    walls: c.map((_, i) => ({ id: `w${i}`, lengthMm: d(i, (i + 1) % n) })),
    angles: c.map(() => 180 - 360 / n),
    fan: Array.from({ length: n - 3 }, (_, k) => ({ from: 0, to: k + 2, lengthMm: d(0, k + 2) })),
  };
}

export function run(): BenchTable[] {
  const reps = 1000;
  const ours = timeIt(() => {
    for (let i = 0; i < reps; i++) parseLength(INPUTS[i % INPUTS.length], { units: "in" });
  });
  const ref = timeIt(() => {
    for (let i = 0; i < reps; i++) new Fraction(INPUTS[i % INPUTS.length]).valueOf();
  });
  const fmtT = timeIt(() => {
    for (let i = 0; i < reps; i++) formatLength(i * 3.7, { units: "ft-in", precision: 32 });
  });
  const parsing: BenchTable = {
    title: "Lengths: 1000 parses or formats",
    note: "parseLength also reads feet, metric units and marks and writes messages; fraction.js reads only the number.",
    columns: ["operation", "median ms", "p95 ms", "ratio to fraction.js"],
    rows: [
      ["parseLength (mixed fractions)", fmt(ours.median), fmt(ours.p95), (ours.median / ref.median).toFixed(2)],
      ["fraction.js parse (reference)", fmt(ref.median), fmt(ref.p95), "1.00"],
      ["formatLength (ft-in, 1/32)", fmt(fmtT.median), fmt(fmtT.p95), (fmtT.median / ref.median).toFixed(2)],
    ],
  };
  const rows: (string | number)[][] = [];
  for (const n of [4, 8, 16, 24]) {
    const p = polygonWalls(n);
    const square = timeIt(() => solveRoom({ walls: p.walls }));
    const angles = timeIt(() => solveRoom({ walls: p.walls, cornerAnglesDeg: p.angles }));
    const diag = timeIt(() => solveRoom({ walls: p.walls, diagonals: p.fan }));
    rows.push([n, fmt(square.median), fmt(angles.median), fmt(diag.median), (diag.median / angles.median).toFixed(1)]);
  }
  const rooms: BenchTable = {
    title: "Room solver: one solve, by method",
    note: "Regular polygons; diagonals fan from corner 0 (n-3 of them) and are fitted by least squares from the walked shape.",
    columns: ["walls", "assumed square ms", "angles ms", "diagonals ms", "diagonals / angles"],
    rows,
  };
  return [parsing, rooms];
}
