import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { buildPlan } from "@/lib/engine/build";
import type { BuildResult } from "@/lib/engine/build";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import type { Part } from "@/lib/engine/fixtures/types";
import { DEFAULT_MATERIALS } from "@/lib/engine/plan/defaults";
import type { FixtureDoc, PlanDocument } from "@/lib/engine/plan/schema";

// Notes the fixture kinds write, so random parts get real joinery setups.
const NOTES = [
  "rabbet 0.5 in deep x 0.71875 in along the bottom inside edge for the bottom",
  "1 dado(s) 0.71875 in wide x 0.25 in deep for the dividers",
  "groove 8/32 in deep, 16/32 in up, for the bottom",
  "sits in the groove on all four sides",
  "groove 19.0 mm wide x 9.5 mm deep along the top for the T-track",
  "pocket screws into the sides",
  "glued and screwed under the core",
];
const KINDS = ["base-cabinet", "tool-shelf", "stop-track", "wall-cabinet", "shelf-run", "no-such-kind"];
const KEYS = ["side", "bottom", "kick-rail", "stile", "rail", "drawer-side", "drawer-side-2", "top-edge", "fence", "upright", "shelf", "odd-piece"];
// Sizes from short lists so twins and shared settings happen often; a few are wider than a sled or a sheet.
const size = fc.constantFrom(38.1, 50.8, 101.6, 285.8, 584.5, 609.6, 700, 749.3, 774.7, 1219.2, 1300, 2095.5);

const partArb = fc.record({
  key: fc.constantFrom(...KEYS),
  name: fc.constantFrom("Side", "Rail", "Strip"),
  qty: fc.integer({ min: 1, max: 6 }),
  lengthMm: size,
  widthMm: size,
  materialId: fc.constantFrom(...DEFAULT_MATERIALS.map((m) => m.id)),
  grain: fc.constantFrom("length" as const, "width" as const, "none" as const),
  joinery: fc.subarray(NOTES, { maxLength: 3 }),
  edges: fc.subarray(["front", "all four edges"], { maxLength: 1 }),
  thick: fc.constantFrom(1, 2),
});

const planArb = fc
  .record({
    kinds: fc.array(fc.constantFrom(...KINDS), { minLength: 0, maxLength: 8 }),
    parts: fc.array(fc.tuple(fc.nat(), partArb), { maxLength: 40 }),
    units: fc.constantFrom("in" as const, "ft-in" as const, "mm" as const),
    kerfMm: fc.constantFrom(2.38125, 3.175),
  })
  .map(({ kinds, parts, units, kerfMm }) => {
    const base = demoPlan();
    const fixtures: FixtureDoc[] = kinds.map((kind, i) => ({ id: `f${i + 1}`, kind, label: "", placement: base.fixtures[0].placement, params: kind === "stop-track" ? { lengthMm: 1219.2, startFromBladeMm: 50.8, cutLengthsMm: [304.8, 3000] } : {} }));
    const plan: PlanDocument = { ...base, settings: { ...base.settings, units, kerfMm }, fixtures };
    const seen = new Set<string>();
    const list: Part[] = [];
    if (fixtures.length)
      for (const [n, p] of parts) {
        const f = fixtures[n % fixtures.length];
        const id = `${f.id}:${p.key}`;
        if (seen.has(id)) continue;
        seen.add(id);
        const mat = DEFAULT_MATERIALS.find((m) => m.id === p.materialId);
        list.push({ id, fixtureId: f.id, name: p.name, qty: p.qty, lengthMm: p.lengthMm, widthMm: p.widthMm, thicknessMm: (mat?.thicknessMm ?? 18) * p.thick, materialId: p.materialId, stock: mat?.form ?? "sheet", grain: p.grain, edges: p.edges, joinery: p.joinery });
      }
    return { plan, parts: list };
  });

const sumBy = (xs: { key: string; n: number }[]) => {
  const m = new Map<string, number>();
  for (const x of xs) m.set(x.key, (m.get(x.key) ?? 0) + x.n);
  return m;
};

function check(b: BuildResult, parts: readonly Part[]): void {
  const setupById = new Map(b.setups.map((s) => [s.id, s]));
  const rowByLabel = new Map(b.rows.map((r) => [r.label, r]));
  // The rows hold every part once.
  expect(b.rows.reduce((s, r) => s + r.qty, 0)).toBe(parts.reduce((s, p) => s + p.qty, 0));
  // Each row is in every setup it needs exactly once, and a setup holds only rows that name it.
  for (const r of b.rows) {
    expect(new Set(r.setupIds).size).toBe(r.setupIds.length);
    for (const id of r.setupIds) expect(setupById.get(id)?.items.filter((i) => i.label === r.label)).toHaveLength(1);
    // Every piece is crosscut to length once; ripped at most once.
    expect(r.setupIds.filter((id) => id.startsWith("crosscut-"))).toHaveLength(1);
    expect(r.setupIds.filter((id) => id.startsWith("rip-")).length).toBeLessThanOrEqual(1);
  }
  for (const s of b.setups) {
    for (const i of s.items) expect(rowByLabel.get(i.label)?.setupIds).toContain(s.id);
    expect(s.totalQty).toBe(s.items.reduce((a, i) => a + i.qty, 0));
  }
  // Crosscut quantities add up to the pieces of the parts list, per material; rips to the pieces that need one.
  const crossQty = sumBy(b.setups.filter((s) => s.kind === "crosscut").flatMap((s) => s.items.map((i) => ({ key: i.materialId, n: i.qty }))));
  const pieceQty = sumBy(b.rows.map((r) => ({ key: r.materialId, n: r.pieces })));
  expect(crossQty).toEqual(pieceQty);
  const ripQty = sumBy(b.setups.filter((s) => s.kind === "rip").flatMap((s) => s.items.map((i) => ({ key: i.materialId, n: i.qty }))));
  const rippedRows = sumBy(b.rows.filter((r) => r.setupIds.some((id) => id.startsWith("rip-"))).map((r) => ({ key: r.materialId, n: r.pieces })));
  expect(ripQty).toEqual(rippedRows);
  // One setting is made once: no two rip setups share a fence reading, no two crosscut setups a length, so there are
  // never more cutting setups than distinct rip widths plus distinct crosscut lengths.
  for (const kind of ["rip", "crosscut"]) {
    const settings = b.setups.filter((s) => s.kind === kind).map((s) => (s.setting.fenceMm ?? Number.NaN).toFixed(2));
    expect(new Set(settings).size).toBe(settings.length);
  }
  const dims = new Set(b.rows.flatMap((r) => [r.widthMm.toFixed(1), r.lengthMm.toFixed(1)]));
  expect(b.setups.filter((s) => s.kind === "rip").length).toBeLessThanOrEqual(dims.size);
  expect(b.setups.filter((s) => s.kind === "crosscut").length).toBeLessThanOrEqual(dims.size);
  // Every part is in at least one step; fixture steps take each row's full quantity; steps name only real setups.
  const inSteps = new Set(b.steps.flatMap((s) => s.parts.map((p) => p.label)));
  for (const r of b.rows) expect(inSteps.has(r.label)).toBe(true);
  const fixtureQty = sumBy(b.steps.filter((s) => s.id !== "room-cut" && s.id !== "room-repeat").flatMap((s) => s.parts.map((p) => ({ key: p.label, n: p.qty }))));
  for (const r of b.rows) expect(fixtureQty.get(r.label)).toBe(r.qty);
  for (const s of b.steps) for (const id of s.setupIds) expect(setupById.has(id)).toBe(true);
  expect(b.steps.map((s) => s.order)).toEqual(b.steps.map((_, i) => i + 1));
  // Pieces crosscut on a stop track are cut after it is fitted, in the repeat step, never in the first cutting step.
  const repeat = b.steps.find((s) => s.id === "room-repeat");
  for (const s of b.setups.filter((x) => x.stopTrackId)) {
    expect(repeat?.setupIds).toContain(s.id);
    expect(b.steps[0].setupIds).not.toContain(s.id);
  }
  // Stop tables list only crosscuts sent to their track, with the setup's quantity.
  for (const t of b.stopTables) for (const row of t.rows) if (row.setupId) expect(setupById.get(row.setupId)?.stopTrackId).toBe(t.fixtureId);
}

describe("build properties over random plans", () => {
  it("quantities add up, each part is in each setup it needs exactly once, every part is in a step", () => {
    fc.assert(
      fc.property(planArb, ({ plan, parts }) => {
        check(buildPlan(plan, { parts }), parts);
      }),
      { numRuns: 150 },
    );
  });
});
