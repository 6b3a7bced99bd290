import type { Part } from "../fixtures/types";
import { layersOf } from "../nesting/pieces";
import { partGroupKey } from "../parts/parts-list";
import type { Material, PlanDocument } from "../plan/schema";
import type { CutRow, FixtureLetter } from "./types";

/** Letters for labels: I and O are left out so a pencilled label never reads as 1 or 0. */
const ALPHABET = "ABCDEFGHJKLMNPQRSTUVWXYZ";

/** The letter of the fixture at `index` (0-based) in the plan's stored order: A..Z, then AA, AB, ... */
export function fixtureLetter(index: number): string {
  let n = Math.max(0, Math.floor(index));
  let s = "";
  do {
    s = ALPHABET[n % ALPHABET.length] + s;
    n = Math.floor(n / ALPHABET.length) - 1;
  } while (n >= 0);
  return s;
}

/**
 * Every fixture's letter from its place in the plan's stored fixture list. New fixtures are appended to that list
 * and moving one only changes its placement, so moving never renumbers a plan.
 */
export function fixtureLetters(plan: Pick<PlanDocument, "fixtures">): FixtureLetter[] {
  return plan.fixtures.map((f, i) => ({ fixtureId: f.id, letter: fixtureLetter(i), kind: f.kind, name: f.label || f.id }));
}

/** Label of every part id: the fixture's letter and the part's 1-based place in that fixture's parts ("C3"). */
export function partLabels(letters: readonly FixtureLetter[], parts: readonly Part[]): Map<string, string> {
  const letterOf = new Map(letters.map((l) => [l.fixtureId, l.letter]));
  const count = new Map<string, number>();
  const out = new Map<string, string>();
  for (const p of parts) {
    const n = (count.get(p.fixtureId) ?? 0) + 1;
    count.set(p.fixtureId, n);
    out.set(p.id, `${letterOf.get(p.fixtureId) ?? "?"}${n}`);
  }
  return out;
}

/** Sort key of a label: fixture letter (by length, then alphabet) and then the part number. */
export function compareLabels(a: string, b: string): number {
  const ma = /^([A-Z?]+)(\d+)$/.exec(a);
  const mb = /^([A-Z?]+)(\d+)$/.exec(b);
  if (!ma || !mb) return a.localeCompare(b);
  return ma[1].length - mb[1].length || ma[1].localeCompare(mb[1]) || Number(ma[2]) - Number(mb[2]);
}

/**
 * The labelled cut list: identical parts merged into one row (the parts list's grouping), each labelled after the
 * first part in it, sorted by label so a pencilled label is easy to find. Sizes mm.
 */
export function cutRows(letters: readonly FixtureLetter[], parts: readonly Part[], materials: readonly Material[]): { rows: CutRow[]; labelOf: Map<string, string> } {
  const labelOf = partLabels(letters, parts);
  const letterOf = new Map(letters.map((l) => [l.fixtureId, l.letter]));
  const mats = new Map(materials.map((m) => [m.id, m]));
  // The parts list's grouping (partGroupKey), with each row's fixtures kept in a map: plans of hundreds of
  // identical cabinets put hundreds of fixtures on one row.
  const groups = new Map<string, { row: CutRow; perFixture: Map<string, number> }>();
  for (const p of parts) {
    if (!(p.qty > 0)) continue;
    const key = partGroupKey(p);
    let g = groups.get(key);
    if (!g) {
      const mat = mats.get(p.materialId);
      const layers = layersOf(p.thicknessMm, mat?.thicknessMm);
      const row: CutRow = {
        label: labelOf.get(p.id) ?? "?",
        key,
        name: p.name,
        qty: 0,
        pieces: 0,
        layers,
        lengthMm: p.lengthMm,
        widthMm: p.widthMm,
        thicknessMm: p.thicknessMm,
        materialId: p.materialId,
        materialName: mat?.name ?? p.materialId,
        stock: p.stock,
        grain: p.grain,
        edges: [...p.edges],
        joinery: [...p.joinery],
        fixtures: [],
        partIds: [],
        setupIds: [],
      };
      groups.set(key, (g = { row, perFixture: new Map() }));
    }
    g.row.qty += p.qty;
    g.row.partIds.push(p.id);
    g.perFixture.set(p.fixtureId, (g.perFixture.get(p.fixtureId) ?? 0) + p.qty);
  }
  const rows = [...groups.values()].map(({ row, perFixture }) => {
    row.pieces = row.qty * row.layers;
    row.fixtures = [...perFixture.entries()].map(([fixtureId, qty]) => ({ fixtureId, letter: letterOf.get(fixtureId) ?? "?", qty }));
    return row;
  });
  rows.sort((a, b) => compareLabels(a.label, b.label));
  // Every part of a merged row carries the row's label: that is what gets pencilled on the piece.
  const rowLabel = new Map<string, string>();
  for (const r of rows) for (const id of r.partIds) rowLabel.set(id, r.label);
  return { rows, labelOf: rowLabel };
}
