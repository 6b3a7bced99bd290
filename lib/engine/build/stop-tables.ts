import type { StopTrackParams } from "../fixtures/stop-track/params";
import { stopTrackParamsSchema } from "../fixtures/stop-track/params";
import { stopTable, trackStartMm } from "../fixtures/stop-track/stop-table";
import type { PlacedFixture } from "../fixtures/types";
import type { PlanDocument } from "../plan/schema";
import type { TrackReach } from "./cut-setups";
import type { BuildStopRow, BuildStopTable, FixtureLetter, Setup } from "./types";

/** How a note about a track with no saw starts (the plan's notes repeat it). */
export const NO_SAW = "No saw:";

/** Kinds a stop track can serve: a tool shelf holds the saw whose blade the track measures from. */
const SAW_KINDS = new Set(["tool-shelf"]);

export interface TrackDoc {
  fixtureId: string;
  letter: string;
  name: string;
  params: StopTrackParams;
  /** The track's near end from the blade, mm: derived from its saw when attached, else typed. */
  startMm: number;
}

/** The plan's stop tracks with parsed parameters; tracks whose parameters do not parse get a note and are left out. */
export function stopTracks(plan: PlanDocument, letters: readonly FixtureLetter[], notes: string[], placed: readonly PlacedFixture[] = []): TrackDoc[] {
  const out: TrackDoc[] = [];
  const byId = new Map(placed.map((p) => [p.id, p]));
  plan.fixtures.forEach((f, i) => {
    if (f.kind !== "stop-track") return;
    const r = stopTrackParamsSchema.safeParse(f.params);
    const l = letters[i];
    if (!r.success) notes.push(`Stop track ${l.letter} (${l.name}): its settings could not be read, so it has no stop table.`);
    else out.push({ fixtureId: f.id, letter: l.letter, name: l.name, params: r.data, startMm: trackStartMm(r.data, byId.get(f.id)) });
  });
  return out;
}

/** How far each track reaches for cut lengths, mm. */
export function trackReaches(tracks: readonly TrackDoc[], kerfMm: number): TrackReach[] {
  return tracks.map((t) => {
    const s = stopTable({ ...t.params, cutLengthsMm: [] }, { kerfMm } as Parameters<typeof stopTable>[1], t.startMm);
    return { fixtureId: t.fixtureId, minCutMm: s.minCutMm, maxCutMm: s.maxCutMm };
  });
}

/**
 * Each track's stop table (mm): one row per repeat crosscut the plan sends to it (longest first, with its labels
 * and quantity), then the lengths typed on the track that the plan does not already list. The kerf side is the
 * track's own setting.
 */
export function buildStopTables(plan: PlanDocument, tracks: readonly TrackDoc[], setups: readonly Setup[]): BuildStopTable[] {
  const saws = new Set(plan.fixtures.filter((f) => SAW_KINDS.has(f.kind)).map((f) => f.id));
  return tracks.map((t): BuildStopTable => {
    const mine = setups.filter((s) => s.stopTrackId === t.fixtureId && s.setting.lengthMm !== undefined);
    const planLengths = mine.map((s) => s.setting.lengthMm as number);
    const typed = t.params.cutLengthsMm.filter((L) => !planLengths.some((p) => Math.abs(p - L) < 0.05));
    const table = stopTable({ ...t.params, cutLengthsMm: [...planLengths, ...typed] }, plan.settings, t.startMm);
    const rows = table.rows.map((r, i): BuildStopRow => {
      const s = i < mine.length ? mine[i] : undefined;
      return {
        cutLengthMm: r.cutLengthMm,
        fromBladeMm: r.fromBladeMm,
        fromTrackStartMm: r.fromTrackStartMm,
        tapeReadingMm: r.tapeReadingMm,
        inReach: r.inReach,
        source: s ? "plan" : "typed",
        labels: s ? s.items.map((x) => x.label) : [],
        qty: s ? s.totalQty : 0,
        ...(s ? { setupId: s.id } : {}),
      };
    });
    const notes: string[] = [];
    if (t.params.sawId === null) notes.push(`${NO_SAW} the track is not on a saw, so the table measures from a blade at its typed start. Attach it to a saw station.`);
    else if (!saws.has(t.params.sawId)) notes.push(`${NO_SAW} its saw (${t.params.sawId}) is gone from the plan, so the table measures from a blade at its typed start. Attach it to a saw station.`);
    const out = rows.filter((r) => !r.inReach).length;
    if (out) notes.push(`${out} typed length${out > 1 ? "s are" : " is"} out of the track's reach: cut ${out > 1 ? "them" : "it"} to a measured mark.`);
    if (rows.length === 0) notes.push("No repeat crosscuts of solid stock fall within this track's reach, and no lengths are typed on it.");
    return { fixtureId: t.fixtureId, letter: t.letter, name: t.name, side: t.params.side, kerfSide: t.params.kerfSide, kerfMm: table.kerfMm, tapeOffsetMm: table.tapeOffsetMm, minCutMm: table.minCutMm, maxCutMm: table.maxCutMm, rows, notes };
  });
}
