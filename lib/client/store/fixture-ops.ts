import type { FixtureDoc, PlanDocument, Placement } from "@/lib/engine/plan/schema";

/**
 * Pure edits of a plan document's fixtures: each returns a new document and never mutates the
 * input, so the undo history can keep old documents by reference.
 */

export function addFixture(doc: PlanDocument, fixture: FixtureDoc): PlanDocument {
  return { ...doc, fixtures: [...doc.fixtures, fixture] };
}

export function updateFixture(doc: PlanDocument, id: string, fn: (f: FixtureDoc) => FixtureDoc): PlanDocument {
  const i = doc.fixtures.findIndex((f) => f.id === id);
  if (i < 0) return doc;
  const next = fn(doc.fixtures[i]);
  if (next === doc.fixtures[i]) return doc;
  const fixtures = doc.fixtures.slice();
  fixtures[i] = next;
  return { ...doc, fixtures };
}

export function setPlacement(doc: PlanDocument, id: string, placement: Placement): PlanDocument {
  return updateFixture(doc, id, (f) => (samePlacement(f.placement, placement) ? f : { ...f, placement }));
}

export function setParams(doc: PlanDocument, id: string, params: Record<string, unknown>): PlanDocument {
  return updateFixture(doc, id, (f) => ({ ...f, params }));
}

export function setLabel(doc: PlanDocument, id: string, label: string): PlanDocument {
  return updateFixture(doc, id, (f) => (f.label === label ? f : { ...f, label }));
}

export function removeFixtures(doc: PlanDocument, ids: readonly string[]): PlanDocument {
  if (ids.length === 0) return doc;
  const drop = new Set(ids);
  const fixtures = doc.fixtures.filter((f) => !drop.has(f.id));
  return fixtures.length === doc.fixtures.length ? doc : { ...doc, fixtures };
}

/** Copies fixtures, shifted by `shiftMm` (along the wall, or along x for free ones). Returns the new ids in order. */
export function duplicateFixtures(doc: PlanDocument, ids: readonly string[], shiftMm: number, makeId: () => string): { doc: PlanDocument; ids: string[] } {
  const made: FixtureDoc[] = [];
  for (const id of ids) {
    const f = doc.fixtures.find((x) => x.id === id);
    if (!f) continue;
    const p = f.placement;
    const placement: Placement = p.mode === "wall" ? { ...p, offsetMm: p.offsetMm + shiftMm } : { ...p, xMm: p.xMm + shiftMm, yMm: p.yMm };
    made.push({ ...f, id: makeId(), placement, params: structuredClone(f.params) });
  }
  if (made.length === 0) return { doc, ids: [] };
  return { doc: { ...doc, fixtures: [...doc.fixtures, ...made] }, ids: made.map((f) => f.id) };
}

export function samePlacement(a: Placement, b: Placement): boolean {
  if (a.mode === "wall" && b.mode === "wall") return a.wallId === b.wallId && a.offsetMm === b.offsetMm && a.elevationMm === b.elevationMm;
  if (a.mode === "free" && b.mode === "free") return a.xMm === b.xMm && a.yMm === b.yMm && a.rotationDeg === b.rotationDeg && a.elevationMm === b.elevationMm;
  return false;
}
