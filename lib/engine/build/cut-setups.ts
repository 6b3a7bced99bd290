import { DEFAULT_BOARD_WIDTHS_MM } from "../boards/stock";
import { DEFAULT_SHEET_WIDTH_MM, cuttable } from "../nesting/pieces";
import type { Material } from "../plan/schema";
import type { CutRow, Setup, Station } from "./types";
import { STATION_INFO, testCutFor } from "./setup-kinds";

const EPS = 0.5;
/** A crosscut sled takes strips up to about 24 in wide (common practice; sleds vary): wider ones are panel cuts. */
export const SLED_MAX_WIDTH_MM = 609.6;
/** A 10 in miter saw that does not slide crosscuts about 5-1/2 in wide at 90 degrees (common practice; check the saw's manual). */
export const MITER_MAX_WIDTH_MM = 139.7;
/** Many contractor and jobsite saws rip about 24 in right of the blade (common practice; check the saw's manual). */
export const COMMON_RIP_CAPACITY_MM = 609.6;

/** A stop track's reach for plan crosscuts. */
export interface TrackReach {
  fixtureId: string;
  minCutMm: number;
  maxCutMm: number;
}

/** How a row is sawn, mm: rip width (null when it comes at the stock's own width), crosscut length and the width the crosscut crosses. */
export function sawDims(row: CutRow, materials: ReadonlyMap<string, Material>): { ripMm: number | null; crossMm: number; acrossMm: number } {
  const mat = materials.get(row.materialId);
  if (row.stock === "sheet") {
    // Grain along the part's length runs along the sheet: rip to width. Grain across: rip to length. No grain: rip the narrow way.
    const [rip, cross] = row.grain === "width" ? [row.lengthMm, row.widthMm] : row.grain === "length" ? [row.widthMm, row.lengthMm] : [Math.min(row.lengthMm, row.widthMm), Math.max(row.lengthMm, row.widthMm)];
    const sheetW = mat?.sheetWidthMm ?? DEFAULT_SHEET_WIDTH_MM;
    return { ripMm: rip >= sheetW - EPS ? null : rip, crossMm: cross, acrossMm: rip };
  }
  // Solid stock is bought at the narrowest dressed width that holds it (as the board plan does); rip only when narrower.
  const stockW = DEFAULT_BOARD_WIDTHS_MM.find((w) => w >= row.widthMm - 1e-6);
  return { ripMm: stockW === undefined || stockW - row.widthMm > EPS ? row.widthMm : null, crossMm: row.lengthMm, acrossMm: row.widthMm };
}

/** The one station for a crosscut length: the handiest that takes every piece at it (stop track, miter saw, sled, panel cut). */
function stationFor(lengthMm: number, widestMm: number, tracks: readonly TrackReach[], late: boolean): { station: Station; track?: TrackReach } {
  if (widestMm <= MITER_MAX_WIDTH_MM + 1e-6) {
    const track = !late ? undefined : tracks.find((t) => lengthMm >= t.minCutMm - 1e-6 && lengthMm <= t.maxCutMm + 1e-6);
    return track ? { station: "miter-saw-stop-track", track } : { station: "miter-saw" };
  }
  return { station: widestMm <= SLED_MAX_WIDTH_MM + 1e-6 ? "table-saw-sled" : "panel-cut" };
}

/**
 * Rip and crosscut setups from the labelled rows (mm). Sizes that read the same on the plan's tape (its display step,
 * `stepMm`) share one setting, so there is one rip setup per distinct rip width and one crosscut setup per distinct
 * crosscut length. Rips run widest first (each narrower rip then comes from a piece still wide enough to ride
 * the fence safely; practice). Each crosscut length gets one station, the handiest that takes all its pieces: narrow
 * pieces at the miter saw (on a stop track when one reaches and every piece at that length is used only after the
 * track is fitted, `late`: a track cannot cut the parts of the counters it sits on), wider ones on the sled (which takes narrow ones too),
 * panel cuts when one is wider than a sled; crosscuts run by station, longest first (long offcuts still feed short parts). Rows get their setup ids.
 */
export function cutSetups(rows: readonly CutRow[], materials: ReadonlyMap<string, Material>, tracks: readonly TrackReach[], fmt: (mm: number) => string, stepMm: number, late: ReadonlySet<string> = new Set()): Setup[] {
  const key = (mm: number) => String(Math.round(mm / stepMm));
  const rips = new Map<string, Setup>();
  const lengths = new Map<string, LengthGroup>();
  const ripOf = new Map<CutRow, string>();
  const crossOf = new Map<CutRow, string>();
  for (const row of rows) {
    if (row.pieces <= 0 || !cuttable(row)) continue;
    const d = sawDims(row, materials);
    if (d.ripMm !== null) {
      const k = key(d.ripMm);
      let s = rips.get(k);
      if (!s) rips.set(k, (s = blank("rip", "table-saw-fence", { fenceMm: d.ripMm, widthMm: d.ripMm })));
      s.items.push({ label: row.label, qty: row.pieces, materialId: row.materialId });
      ripOf.set(row, k);
    }
    const k = key(d.crossMm);
    let g = lengths.get(k);
    if (!g) lengths.set(k, (g = { lengthMm: d.crossMm, widest: 0, items: [] }));
    g.widest = Math.max(g.widest, d.acrossMm);
    g.items.push({ row });
    crossOf.set(row, k);
  }
  const cross = new Map<string, Setup>();
  for (const [k, g] of lengths) {
    const { station, track } = stationFor(g.lengthMm, g.widest, tracks, g.items.every(({ row }) => late.has(row.label)));
    const s = blank("crosscut", station, { fenceMm: g.lengthMm, lengthMm: g.lengthMm });
    if (track) s.stopTrackId = track.fixtureId;
    for (const { row } of g.items) {
      s.items.push({ label: row.label, qty: row.pieces, materialId: row.materialId });
      crossOf.set(row, k);
    }
    cross.set(k, s);
  }
  const stationOrder: Station[] = ["panel-cut", "table-saw-sled", "miter-saw", "miter-saw-stop-track"];
  const ripList = [...rips.values()].sort((a, b) => (b.setting.fenceMm ?? 0) - (a.setting.fenceMm ?? 0));
  const crossList = [...cross.values()].sort((a, b) => stationOrder.indexOf(a.station) - stationOrder.indexOf(b.station) || (a.stopTrackId ?? "").localeCompare(b.stopTrackId ?? "") || (b.setting.lengthMm ?? 0) - (a.setting.lengthMm ?? 0));
  ripList.forEach((s, i) => {
    s.id = `rip-${i + 1}`;
    const w = s.setting.fenceMm ?? 0;
    s.title = `Rip fence at ${fmt(w)} from the blade`;
    s.kerfSide = "Fence to the nearest tooth of the blade; the kerf falls on the offcut side, away from the fence.";
    if (w > COMMON_RIP_CAPACITY_MM) s.cautions = [`Wider than many saws rip (about ${fmt(COMMON_RIP_CAPACITY_MM)}): check the fence's capacity, or break the sheet down with a circular saw and straightedge first.`, ...s.cautions];
  });
  crossList.forEach((s, i) => {
    s.id = `crosscut-${i + 1}`;
    const L = fmt(s.setting.lengthMm ?? 0);
    s.title =
      s.station === "miter-saw-stop-track" ? `Stop block at ${L} on the stop track` : s.station === "table-saw-sled" ? `Sled stop at ${L} from the blade` : s.station === "panel-cut" ? `Mark and cut at ${L} with a straightedge` : `Mark and cut at ${L} at the miter saw`;
    s.kerfSide = s.station === "panel-cut" || s.station === "miter-saw" ? "Cut on the waste side of the mark." : "The stop sets the kept piece; the kerf falls on the offcut side of the blade.";
  });
  for (const s of [...ripList, ...crossList]) finish(s);
  for (const row of rows) {
    const r = ripOf.get(row);
    const c = crossOf.get(row);
    row.setupIds = [...(r !== undefined ? [rips.get(r)?.id ?? ""] : []), ...(c !== undefined ? [cross.get(c)?.id ?? ""] : [])];
  }
  return [...ripList, ...crossList];
}

type LengthGroup = { lengthMm: number; widest: number; items: { row: CutRow }[] };

function blank(kind: Setup["kind"], station: Station, setting: Setup["setting"]): Setup {
  const info = STATION_INFO[station];
  return { id: "", order: 0, kind, station, title: "", setting, items: [], totalQty: 0, tools: [...info.tools], cautions: [...info.cautions], testCut: "" };
}

/** Totals and the test-cut line once the items are in. */
export function finish(s: Setup): void {
  s.totalQty = s.items.reduce((a, i) => a + i.qty, 0);
  s.testCut = testCutFor(s.kind, s.items[0]?.label);
}
