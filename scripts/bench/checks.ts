/**
 * Checks suite: full evaluation of every rule at 300 and 600 fixtures (goal: median <= 4 ms at 300,
 * 600 within 2.2x of 300), the incremental re-check after moving one fixture, and the same full
 * evaluation with the grid index turned into one cell (every query scans every item: the naive
 * all-pairs baseline).
 */
import type { BenchTable } from "../bench";
import { createChecker, evaluatePlan } from "../../lib/engine/checks/evaluate";
import type { Derived } from "../../lib/engine/derive-types";
import type { PlacedFixture, WorldZone } from "../../lib/engine/fixtures/types";
import { planDocumentSchema, type PlanDocument } from "../../lib/engine/plan/schema";
import type { SolvedRoom } from "../../lib/engine/room/types";
import { mm } from "../../lib/engine/units/length";
import { roomZones } from "../../lib/engine/zones";
import { fmt, timeIt } from "./timing";

export const order = 40;

/** A room that grows with n so density stays like a real shop: about 1.2 m^2 of floor per fixture. */
export function shopForBench(n: number, seed: number): { plan: PlanDocument; derived: Derived; fixtures: PlacedFixture[] } {
  let s = seed;
  const rnd = () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
  const W = Math.round(Math.sqrt(n * 1.2e6 * 1.5));
  const D = Math.round(W / 1.5);
  const plan = planDocumentSchema.parse({
    schemaVersion: 1,
    room: {
      walls: [
        { id: "w1", lengthMm: W },
        { id: "w2", lengthMm: D },
        { id: "w3", lengthMm: W },
        { id: "w4", lengthMm: D },
      ],
      openings: [{ id: "g", kind: "garage-door", wallId: "w3", offsetMm: 500, widthMm: 4877 }],
      obstacles: [
        { id: "p", kind: "panel", placement: { mode: "wall", wallId: "w2", offsetMm: 600, elevationMm: 1200 } },
        { id: "bay", kind: "parking-bay", placement: { mode: "wall", wallId: "w1", offsetMm: W - 4000 } },
      ],
    },
  });
  const c = [
    { x: 0, y: 0 },
    { x: W, y: 0 },
    { x: W, y: D },
    { x: 0, y: D },
  ];
  const room: SolvedRoom = {
    corners: c,
    walls: c.map((start, i) => {
      const end = c[(i + 1) % 4];
      const len = Math.hypot(end.x - start.x, end.y - start.y);
      const dir = { x: (end.x - start.x) / len, y: (end.y - start.y) / len };
      return { id: `w${i + 1}`, index: i, start, end, dir, inward: { x: -dir.y, y: dir.x }, lengthMm: len };
    }),
    ceilingHeightMm: 2743,
    report: { cornerAnglesDeg: [], offSquareDeg: [], diagonalDifferenceMm: 0, closureErrorMm: 0, method: "assumed-square", notes: [] },
  };
  const fixtures: PlacedFixture[] = [];
  for (let i = 0; i < n; i++) fixtures.push(randomFixture(`f${i}`, i, W, D, rnd));
  return { plan, fixtures, derived: deriveWith(plan, room, fixtures) };
}

function rect(ox: number, oy: number, rot: number, x0: number, y0: number, x1: number, y1: number) {
  const c = Math.cos(rot);
  const s = Math.sin(rot);
  const p = (x: number, y: number) => ({ x: ox + c * x - s * y, y: oy + s * x + c * y });
  return [p(x0, y0), p(x1, y0), p(x1, y1), p(x0, y1)];
}

function randomFixture(id: string, i: number, W: number, D: number, rnd: () => number, at?: { x: number; y: number }): PlacedFixture {
  const kinds = ["base-cabinet", "base-cabinet", "workbench", "lumber-rack", "wall-cabinet", "tool-shelf"];
  const kind = kinds[i % kinds.length];
  const w = 450 + rnd() * 600;
  const d = kind === "wall-cabinet" ? 305 : 610;
  const h = kind === "wall-cabinet" ? 760 : kind === "lumber-rack" ? 2000 : 914;
  const z = kind === "wall-cabinet" ? 1372 : 0;
  const x = at?.x ?? rnd() * (W - 1200);
  const y = at?.y ?? rnd() * (D - 700);
  const rot = rnd() < 0.25 ? Math.PI / 2 : 0;
  const zones: WorldZone[] = [];
  const zone = (purpose: string, lx0: number, ly0: number, lx1: number, ly1: number, z0: number, z1: number) =>
    zones.push({ id: `${id}:${purpose}`, ownerId: id, purpose, label: purpose, prism: { polygon: rect(x, y, rot, lx0, ly0, lx1, ly1), zMin: mm(z0), zMax: mm(z1) } });
  if (kind === "base-cabinet") zone("drawer-pull", 0, d, w, d + 508, 100, 800);
  if (kind === "tool-shelf") {
    zone("stock-path-left", w / 2 - 2438.4, 100, w / 2, 240, 914, 1066);
    zone("stock-path-right", w / 2, 100, w / 2 + 2438.4, 240, 914, 1066);
    zone("miter-head", 0, 0, w, d, 914, 1500);
  }
  return {
    id,
    kind,
    label: id,
    footprint: { widthMm: w, depthMm: d, heightMm: h },
    origin: { x, y, z },
    rotation: rot,
    body: { polygon: rect(x, y, rot, 0, 0, w, d), zMin: mm(z), zMax: mm(z + h) },
    boxes: [],
    zones,
    workSurfaceMm: kind === "base-cabinet" || kind === "workbench" || kind === "tool-shelf" ? 914.4 : undefined,
  };
}

function deriveWith(plan: PlanDocument, room: SolvedRoom, fixtures: PlacedFixture[]): Derived {
  return { room, fixtures, obstacles: [], zones: [...fixtures.flatMap((f) => f.zones), ...roomZones(plan, room)], parts: [], hardware: [] };
}

export function run(): BenchTable[] {
  const rows: (string | number)[][] = [];
  const medians = new Map<string, number>();
  for (const n of [300, 600]) {
    const { plan, derived } = shopForBench(n, 11);
    const grid = timeIt(() => evaluatePlan(plan, derived), { warmup: 30, runs: 61 });
    const naive = timeIt(() => evaluatePlan(plan, derived, { cellMm: 1e9 }), { warmup: 2, runs: 9 });
    medians.set(`grid${n}`, grid.median);
    rows.push([n, "full, grid index", fmt(grid.median), fmt(grid.p95), evaluatePlan(plan, derived).length]);
    rows.push([n, "full, all-pairs scan", fmt(naive.median), fmt(naive.p95), `${(naive.median / grid.median).toFixed(1)}x slower`]);
    // Incremental: move one fixture back and forth, re-checking its neighbourhood only.
    const checker = createChecker(plan, derived);
    const f = derived.fixtures[n >> 1];
    let s = 5;
    const rnd = () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
    const room = derived.room;
    const W = room.corners[1].x;
    const D = room.corners[2].y;
    let flip = false;
    const inc = timeIt(
      () => {
        flip = !flip;
        const moved = randomFixture(f.id, n >> 1, W, D, rnd, { x: f.origin.x + (flip ? 300 : 0), y: f.origin.y });
        const fx = derived.fixtures.map((x) => (x.id === f.id ? moved : x));
        checker.update(plan, deriveWith(plan, room, fx), [f.id]);
      },
      { warmup: 30, runs: 61 },
    );
    rows.push([n, "incremental, one fixture moved (includes rebuilding the derived arrays)", fmt(inc.median), fmt(inc.p95), `${checker.lastRechecked().size} fixtures re-checked`]);
  }
  const ratio = (medians.get("grid600") ?? 0) / (medians.get("grid300") ?? 1);
  return [
    {
      title: "Checks: every rule over a synthetic shop",
      note: `Goal: full evaluation of 300 fixtures <= 4 ms median; 600 within 2.2x of 300 (measured ${ratio.toFixed(2)}x). Times in ms.`,
      columns: ["fixtures", "run", "median ms", "p95 ms", "note"],
      rows,
    },
  ];
}
