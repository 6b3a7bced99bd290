/**
 * Plan version 1 to 2: left and right become as a person standing in the room facing the wall sees them, and
 * stop tracks belong to a saw. In version 1 "left" meant toward the wall's start corner, which that person has on
 * their right; every stored side is flipped so each plan keeps its physical layout:
 * - an entry door's `hinge` (absent meant "left"),
 * - a stop track's `side` (absent meant "right"); its typed `startFromBladeMm` (absent meant 2 in) is kept,
 * - a tool shelf's `tool.bladeXMm` (from the tool's edge) and `toolOffsetXMm` (from the bay's end),
 * - a table saw base's `bladeFromLeftMm`.
 * Then a stop track on a wall is attached (`sawId`) to the nearest tool shelf on the same wall when that is
 * unambiguous (one nearest, with its side taken from where the track stands); otherwise `sawId` is null and
 * the track shows as detached. Steps return new objects.
 */

type Raw = Record<string, unknown>;

const isObject = (v: unknown): v is Raw => typeof v === "object" && v !== null && !Array.isArray(v);
const finite = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);
const flip = (v: unknown, absent: "left" | "right"): "left" | "right" => ((v === "left" || v === "right" ? v : absent) === "left" ? "right" : "left");
/** Rounded to 0.0001 mm so stored documents do not carry float noise. */
const r4 = (v: number): number => Math.round(v * 1e4) / 1e4;

const IN = 25.4;
// Version 1's defaults and tool widths, frozen here so this step means the same whatever later versions change.
const V1_TOOL_WIDTH_IN: Readonly<Record<string, number>> = {
  "sliding-miter-saw": 26,
  "compact-miter-saw": 20,
  "benchtop-planer": 22,
  "drill-press": 12,
  "spindle-sander": 15,
  "benchtop-table-saw": 22,
};
const V1_BAY_WIDTH_MM = 32 * IN;
const V1_TRACK_LENGTH_MM = 48 * IN;
const V1_TRACK_START_MM = 2 * IN;
const V1_TABLE_WIDTH_MM = 40 * IN;
/** Two saws whose distances from a track differ by less than this are equally near: ambiguous, mm. */
const TIE_MM = 1;

function toolShelf(params: Raw): Raw {
  const out: Raw = { ...params };
  const tool = isObject(params.tool) ? { ...params.tool } : {};
  const presetWidth = (V1_TOOL_WIDTH_IN[typeof params.preset === "string" ? params.preset : ""] ?? 26) * IN;
  const toolWidth = finite(tool.widthMm) ? tool.widthMm : presetWidth;
  if (finite(tool.bladeXMm)) tool.bladeXMm = r4(Math.max(0, toolWidth - tool.bladeXMm));
  if (isObject(params.tool)) out.tool = tool;
  if (finite(params.toolOffsetXMm)) {
    const bay = finite(params.widthMm) ? params.widthMm : V1_BAY_WIDTH_MM;
    out.toolOffsetXMm = r4(Math.max(0, bay - toolWidth - params.toolOffsetXMm));
  }
  return out;
}

/** A wall fixture's span along its wall in version 1, mm, or null when free or unreadable. */
function span(f: Raw, width: number): { wallId: string; from: number; to: number } | null {
  const p = f.placement;
  if (!isObject(p) || p.mode !== "wall" || typeof p.wallId !== "string" || !finite(p.offsetMm)) return null;
  return { wallId: p.wallId, from: p.offsetMm, to: p.offsetMm + width };
}

function attach(track: Raw, params: Raw, fixtures: readonly Raw[]): Raw {
  const length = finite(params.lengthMm) ? params.lengthMm : V1_TRACK_LENGTH_MM;
  const t = span(track, length);
  if (!t) return { ...params, sawId: null };
  const saws = fixtures
    .filter((f) => f.kind === "tool-shelf" && typeof f.id === "string")
    .map((f) => {
      const p = isObject(f.params) ? f.params : {};
      return { id: f.id as string, s: span(f, finite(p.widthMm) ? p.widthMm : V1_BAY_WIDTH_MM) };
    })
    .filter((x): x is { id: string; s: NonNullable<typeof x.s> } => !!x.s && x.s.wallId === t.wallId)
    .map((x) => ({ ...x, gap: Math.max(0, x.s.from - t.to, t.from - x.s.to) }))
    .sort((a, b) => a.gap - b.gap);
  if (saws.length === 0 || (saws.length > 1 && saws[1].gap - saws[0].gap < TIE_MM)) return { ...params, sawId: null };
  const saw = saws[0];
  // Along the wall from its start is the viewer's right to left: a track further along stands on the saw's left.
  const side = (t.from + t.to) / 2 >= (saw.s.from + saw.s.to) / 2 ? "left" : "right";
  return { ...params, sawId: saw.id, side };
}

function fixture(f: unknown, all: readonly Raw[]): unknown {
  if (!isObject(f)) return f;
  const params: Raw = isObject(f.params) ? f.params : {};
  if (f.kind === "tool-shelf") return { ...f, params: toolShelf(params) };
  if (f.kind === "mobile-base" && finite(params.bladeFromLeftMm)) {
    const w = finite(params.tableWidthMm) ? params.tableWidthMm : V1_TABLE_WIDTH_MM;
    return { ...f, params: { ...params, bladeFromLeftMm: r4(Math.max(0, w - params.bladeFromLeftMm)) } };
  }
  if (f.kind === "stop-track") {
    const flipped: Raw = { ...params, side: flip(params.side, "right"), startFromBladeMm: finite(params.startFromBladeMm) ? params.startFromBladeMm : V1_TRACK_START_MM };
    return { ...f, params: attach(f, flipped, all) };
  }
  return f;
}

/** The version 1 to 2 step (see the file comment). Unreadable parts are left for the schema to report. */
export function upgradeSides1to2(doc: Raw): Raw {
  const out: Raw = { ...doc, schemaVersion: 2 };
  const room = doc.room;
  if (isObject(room) && Array.isArray(room.openings)) {
    out.room = { ...room, openings: room.openings.map((o) => (isObject(o) && o.kind === "entry-door" ? { ...o, hinge: flip(o.hinge, "left") } : o)) };
  }
  if (Array.isArray(doc.fixtures)) {
    const all = doc.fixtures.filter(isObject);
    out.fixtures = doc.fixtures.map((f) => fixture(f, all));
  }
  return out;
}
