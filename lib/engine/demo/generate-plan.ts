import { DEFAULT_MATERIALS } from "../plan/defaults";
import type { FixtureDoc, PlanDocument } from "../plan/schema";
import { fixtureSchema, MAX_WALL_MM, planDocumentSchema, PLAN_SCHEMA_VERSION, settingsSchema } from "../plan/schema";
import { baseCabinet } from "../fixtures/base-cabinet";
import { baseCabinetParamsSchema } from "../fixtures/base-cabinet/params";
import { inches } from "../units/length";
import { seededRandom } from "../geometry/seeded-random";

/** Grid cell for free-standing fixtures, mm. */
const CELL_MM = 3000;

type Gen = { kind: string; params: (r: () => number) => Record<string, unknown> };

const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];

const FREE_KINDS: readonly Gen[] = [
  { kind: "workbench", params: (r) => ({ widthMm: inches(pick(r, [48, 60, 72, 96])), heightMm: inches(pick(r, [34, 36, 38])) }) },
  { kind: "base-cabinet", params: (r) => ({ widthMm: inches(pick(r, [18, 24, 30, 36])), sections: [{ drawerCount: pick(r, [2, 3, 4, 5]) }] }) },
  { kind: "mobile-base", params: () => ({}) },
  { kind: "shelf-run", params: (r) => ({ bays: pick(r, [1, 2, 3]), levels: pick(r, [3, 4, 5]) }) },
  { kind: "wall-cabinet", params: (r) => ({ doorCount: pick(r, [1, 2]) }) },
  { kind: "lumber-rack", params: (r) => ({ levels: pick(r, [3, 4, 5]) }) },
  { kind: "pegboard", params: () => ({}) },
  { kind: "cleat-wall", params: (r) => ({ rows: pick(r, [3, 4, 5]) }) },
];

/**
 * A plan with `n` fixtures for tests and benchmarks, the same for the same seed: a square shop sized to fit,
 * about 40% of the fixtures in base-cabinet runs along the walls (every fifth bay a tool shelf, with a stop track
 * on the next counter), the rest free on a grid with quarter-turn rotations. Invented data. Past
 * PLAN_LIMITS.fixtures the plan is for benchmarks only: parsePlan refuses it.
 */
export function generatePlan(n: number, seed = 1): PlanDocument {
  const r = seededRandom(seed);
  // Stop tracks sit on the default cabinet's counter.
  const materials = DEFAULT_MATERIALS.map((m) => ({ ...m }));
  const settings = settingsSchema.parse({});
  const counterMm = baseCabinet.workSurfaceMm?.(baseCabinetParamsSchema.parse({}), { settings, materials }) ?? inches(36);
  const side = Math.min(MAX_WALL_MM, Math.max(6000, (Math.ceil(Math.sqrt(n)) + 1) * CELL_MM));
  const fixtures: FixtureDoc[] = [];
  const onWalls = Math.round(n * 0.4);
  let wallIndex = 0;
  let offset = 300;
  let bay = 0;
  while (fixtures.length < onWalls && wallIndex < 4) {
    const wallId = `w${wallIndex + 1}`;
    const isShelf = bay % 5 === 4;
    const width = isShelf ? inches(32) : inches(pick(r, [24, 30, 36]));
    if (offset + width > side - 300) {
      wallIndex++;
      offset = 300;
      bay = 0;
      continue;
    }
    const id = `f${fixtures.length + 1}`;
    if (isShelf) fixtures.push({ id, kind: "tool-shelf", label: "", placement: { mode: "wall", wallId, offsetMm: offset, elevationMm: 0 }, params: { preset: pick(r, ["compact-miter-saw", "sliding-miter-saw", "benchtop-planer"]), widthMm: width } });
    else fixtures.push({ id, kind: "base-cabinet", label: "", placement: { mode: "wall", wallId, offsetMm: offset, elevationMm: 0 }, params: { widthMm: width, sections: [{ fill: pick(r, ["drawers", "drawers", "doors", "open"]), drawerCount: pick(r, [3, 4, 5]) }] } });
    if (bay % 5 === 0 && bay > 0 && fixtures.length < onWalls) {
      fixtures.push({ id: `f${fixtures.length + 1}`, kind: "stop-track", label: "", placement: { mode: "wall", wallId, offsetMm: offset, elevationMm: counterMm }, params: { lengthMm: inches(36), cutLengthsMm: [inches(12), inches(24)] } });
    }
    offset += width;
    bay++;
  }
  const perRow = Math.max(1, Math.floor(side / CELL_MM) - 1);
  let cell = 0;
  while (fixtures.length < n) {
    const g = pick(r, FREE_KINDS);
    const cx = CELL_MM * (1 + (cell % perRow));
    const cy = CELL_MM * (1 + Math.floor(cell / perRow));
    cell++;
    fixtures.push({ id: `f${fixtures.length + 1}`, kind: g.kind, label: "", placement: { mode: "free", xMm: cx - 900, yMm: cy - 500, rotationDeg: pick(r, [0, 90, 180, 270]), elevationMm: 0 }, params: g.params(r) });
  }
  const plan = planDocumentSchema.parse({
    schemaVersion: PLAN_SCHEMA_VERSION,
    room: { walls: [1, 2, 3, 4].map((i) => ({ id: `w${i}`, label: "", lengthMm: side })), ceilingHeightMm: 3000 },
    materials,
    fixtures: [],
    settings,
  });
  // Each fixture is checked on its own, so benchmarks may go past the plan's fixture cap (parsePlan refuses such a plan).
  return { ...plan, fixtures: fixtures.map((f) => fixtureSchema.parse(f)) };
}
