import type { CutRow, Setup, SetupKind, Station } from "./types";
import { finish } from "./cut-setups";
import { STATION_INFO } from "./setup-kinds";

/** A joint read from a part's joinery note (mm). Width undefined: as thick as the mating part. */
export interface JointCut {
  kind: Exclude<SetupKind, "rip" | "crosscut">;
  widthMm?: number;
  depthMm?: number;
  fenceDistanceMm?: number;
  /** Cuts of this kind in one part. */
  count: number;
  where: string;
}

const NUM = "(\\d+(?:\\.\\d+)?(?:/\\d+)?)";
const num = (s: string) => (s.includes("/") ? Number(s.split("/")[0]) / Number(s.split("/")[1]) : Number(s));
const IN = 25.4;

/**
 * The machining a part's joinery note asks for, in mm: rabbets, dados and grooves with their sizes, pocket-screw
 * holes. Notes are written by the fixture kinds (inches in fractions or decimals, or mm); a note that names no
 * machine cut (a butt joint, glue and screws) gives nothing.
 */
export function readJoinery(note: string): JointCut | null {
  let m = new RegExp(`^rabbet ${NUM} in deep x ${NUM} in (.*)$`).exec(note);
  if (m) return { kind: "rabbet", depthMm: num(m[1]) * IN, widthMm: num(m[2]) * IN, fenceDistanceMm: num(m[2]) * IN, count: 1, where: m[3] };
  m = new RegExp(`^(\\d+) dado\\(s\\) ${NUM} in wide x ${NUM} in deep (.*)$`).exec(note);
  if (m) return { kind: "dado", widthMm: num(m[2]) * IN, depthMm: num(m[3]) * IN, count: Number(m[1]), where: m[4] };
  m = new RegExp(`^groove ${NUM} in deep, ${NUM} in up, (.*)$`).exec(note);
  if (m) return { kind: "groove", depthMm: num(m[1]) * IN, fenceDistanceMm: num(m[2]) * IN, count: 1, where: `${m[3]}, ${m[2]} in up from the bottom edge` };
  m = new RegExp(`^groove ${NUM} mm wide x ${NUM} mm deep (.*)$`).exec(note);
  if (m) return { kind: "groove", widthMm: num(m[1]), depthMm: num(m[2]), count: 1, where: m[3] };
  if (/^pocket screws into /.test(note)) return { kind: "pocket-screw", count: 1, where: `holes in the ends, ${note}` };
  return null;
}

const r01 = (mm: number | undefined) => (mm === undefined ? "-" : (Math.round(mm * 10) / 10).toFixed(1));

/**
 * Joinery setups (mm): dados, rabbets and grooves grouped by width x depth (and fence distance where the note fixes
 * it), pocket-screw holes by stock thickness. A groove's unknown width is the thickness of the part that "sits in
 * the groove" in the same fixture. Rows get the ids of their setups appended.
 */
export function joinerySetups(rows: readonly CutRow[], fmt: (mm: number) => string): Setup[] {
  const groups = new Map<string, Setup>();
  const need = new Map<CutRow, string[]>();
  const seatOf = new Map<string, number>();
  for (const r of rows) if (r.joinery.some((j) => /sits in the groove/.test(j))) for (const f of r.fixtures) if (!seatOf.has(f.fixtureId)) seatOf.set(f.fixtureId, r.thicknessMm);
  for (const row of rows) {
    if (row.qty <= 0) continue;
    for (const note of row.joinery) {
      const j = readJoinery(note);
      if (!j) continue;
      const width = j.widthMm ?? (j.kind === "groove" ? row.fixtures.map((f) => seatOf.get(f.fixtureId)).find((x) => x !== undefined) : undefined);
      const station: Station = j.kind === "pocket-screw" ? "pocket-hole-jig" : "dado-stack";
      const k = j.kind === "pocket-screw" ? `pocket|${r01(row.thicknessMm)}` : `${j.kind}|${r01(width)}|${r01(j.depthMm)}|${r01(j.fenceDistanceMm)}`;
      let s = groups.get(k);
      if (!s) {
        const info = STATION_INFO[station];
        const setting = j.kind === "pocket-screw" ? { stockThicknessMm: row.thicknessMm } : { widthMm: width, depthMm: j.depthMm, fenceDistanceMm: j.fenceDistanceMm };
        groups.set(k, (s = { id: "", order: 0, kind: j.kind, station, title: "", setting, items: [], totalQty: 0, tools: [...info.tools], cautions: [...info.cautions], testCut: "" }));
      }
      // One entry per row: a second note of the same setting on the same part adds to its count, not a new entry.
      const existing = s.items.find((i) => i.label === row.label);
      if (existing) continue;
      s.items.push({ label: row.label, qty: row.qty, materialId: row.materialId, where: j.count > 1 ? `${j.count} per part, ${j.where}` : j.where });
      const ids = need.get(row) ?? [];
      ids.push(k);
      need.set(row, ids);
    }
  }
  const order: SetupKind[] = ["dado", "rabbet", "groove", "pocket-screw"];
  const list = [...groups.entries()].sort((a, b) => order.indexOf(a[1].kind) - order.indexOf(b[1].kind) || (b[1].setting.widthMm ?? b[1].setting.stockThicknessMm ?? 0) - (a[1].setting.widthMm ?? a[1].setting.stockThicknessMm ?? 0) || a[0].localeCompare(b[0]));
  const count = new Map<SetupKind, number>();
  const idOf = new Map<string, string>();
  for (const [k, s] of list) {
    const n = (count.get(s.kind) ?? 0) + 1;
    count.set(s.kind, n);
    s.id = `${s.kind}-${n}`;
    s.title = titleOf(s, fmt);
    if (s.kind !== "pocket-screw") s.kerfSide = "Set the fence to the cut's near edge; sneak up on the width with test cuts until the mating part fits.";
    idOf.set(k, s.id);
    finish(s);
  }
  for (const [row, ks] of need) row.setupIds.push(...ks.map((k) => idOf.get(k) ?? k));
  return list.map(([, s]) => s);
}

function titleOf(s: Setup, fmt: (mm: number) => string): string {
  const { widthMm: w, depthMm: d, fenceDistanceMm: f, stockThicknessMm: t } = s.setting;
  const size = `${w === undefined ? "as wide as the mating part" : fmt(w)} wide x ${d === undefined ? "?" : fmt(d)} deep`;
  switch (s.kind) {
    case "dado":
      return `Dado ${size}`;
    case "rabbet":
      return `Rabbet ${size}${f === undefined ? "" : `, fence ${fmt(f)} to the far side of the stack`}`;
    case "groove":
      return `Groove ${size}${f === undefined ? "" : `, ${fmt(f)} from the fence`}`;
    default:
      return `Pocket-screw holes for ${fmt(t ?? 0)} stock`;
  }
}
