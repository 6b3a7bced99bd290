import type { Derived } from "./derive-types";
import type { CounterSpan } from "./fixtures/place/neighbours";
import { counterSpan, neighbourCounterHeight } from "./fixtures/place/neighbours";
import { placeObstacles } from "./fixtures/place/obstacles";
import type { FixtureResult } from "./fixtures/place/place-fixture";
import { placeResolved, resolveFixture } from "./fixtures/place/place-fixture";
import { FOLLOWER_KINDS, placeTracks } from "./fixtures/place/tracks";
import { COUNTER_KINDS } from "./fixtures/registry";
import type { FixtureContext } from "./fixtures/types";
import { PLAN_LIMITS } from "./plan/limits";
import type { FixtureDoc, PlanDocument } from "./plan/schema";
import { solveRoom } from "./room/solve";
import type { SolvedRoom } from "./room/types";
import { roomZones } from "./zones";
import { placementFrame } from "./zones/frame";

export { placeFixture } from "./fixtures/place/place-fixture";
export type { FixtureResult } from "./fixtures/place/place-fixture";

/** Kinds whose geometry depends on the counters beside them. */
const NEEDS_NEIGHBOURS = new Set(["tool-shelf"]);

/** The context every fixture of a plan is derived with (settings and materials; no neighbour yet). */
export function planFixtureContext(plan: PlanDocument): FixtureContext {
  return { settings: plan.settings, materials: plan.materials };
}

/** Derived results with notes on what was skipped (unknown kinds, bad parameters, missing walls). */
export interface DeriveReport {
  derived: Derived;
  notes: string[];
}

function placeAll(plan: PlanDocument, room: SolvedRoom, notes: string[]): FixtureResult[] {
  const base = planFixtureContext(plan);
  const results = new Map<string, FixtureResult>();
  const later: { doc: FixtureDoc; r: Extract<ReturnType<typeof resolveFixture>, { ok: true }> }[] = [];
  const counters: CounterSpan[] = [];
  const tracks: FixtureDoc[] = [];
  // Pass 1: everything that does not depend on its neighbours (counters among them).
  for (const doc of plan.fixtures) {
    const r = resolveFixture(doc);
    if (!r.ok) {
      notes.push(r.note);
      continue;
    }
    if (FOLLOWER_KINDS.has(doc.kind)) {
      tracks.push(doc);
      continue;
    }
    if (NEEDS_NEIGHBOURS.has(doc.kind)) {
      later.push({ doc, r });
      continue;
    }
    const frame = placementFrame(room, doc.placement);
    if (!frame) {
      notes.push(`Fixture ${doc.id}: wall "${doc.placement.mode === "wall" ? doc.placement.wallId : ""}" not found, skipped.`);
      continue;
    }
    const res = placeResolved(doc, r.kind, r.params, frame, base);
    results.set(doc.id, res);
    const span = counterSpan(doc, res.placed);
    if (span) counters.push(span);
  }
  // Pass 2: tool shelves take the height of the counters beside them (relative to their own base).
  for (const { doc, r } of later) {
    const frame = placementFrame(room, doc.placement);
    if (!frame) {
      notes.push(`Fixture ${doc.id}: wall not found, skipped.`);
      continue;
    }
    const probe = placeResolved(doc, r.kind, r.params, frame, base);
    const h = neighbourCounterHeight(doc, probe.placed, counters);
    const ctx = h === undefined ? base : { ...base, neighbourCounterHeightMm: h - frame.z0 };
    results.set(doc.id, h === undefined ? probe : placeResolved(doc, r.kind, r.params, frame, ctx));
  }
  // Pass 3: stop tracks follow their saws (and the counters beside them).
  const placedTracks = placeTracks(tracks, plan.fixtures, room, results, base);
  for (const doc of tracks) {
    const res = placedTracks.get(doc.id);
    if (res) results.set(doc.id, res);
    else notes.push(`Fixture ${doc.id}: wall not found, skipped.`);
  }
  // Keep the plan's order.
  return plan.fixtures.map((d) => results.get(d.id)).filter((x): x is FixtureResult => !!x);
}

/** Derive everything from a plan (world mm): solved room, placed fixtures and obstacles, all zones, parts, hardware; with notes. */
export function deriveWithNotes(plan: PlanDocument): DeriveReport {
  const notes: string[] = [];
  const room = solveRoom(plan.room);
  const results = placeAll(plan, room, notes);
  const fixtures = results.map((r) => r.placed);
  const derived: Derived = {
    room,
    fixtures,
    obstacles: placeObstacles(plan.room.obstacles, room),
    zones: [...fixtures.flatMap((f) => f.zones), ...roomZones(plan, room)],
    parts: cappedParts(results, notes),
    hardware: results.flatMap((r) => r.hardware),
  };
  return { derived, notes };
}

/** Parts of every fixture in plan order, stopping before the plan's piece limit (parsePlan refuses such plans; this guards the rest). */
function cappedParts(results: readonly FixtureResult[], notes: string[]): FixtureResult["parts"] {
  const out: FixtureResult["parts"] = [];
  let pieces = 0;
  for (const r of results) {
    const n = r.parts.reduce((s, p) => s + p.qty, 0);
    if (pieces + n > PLAN_LIMITS.pieces) {
      notes.push(`Parts stop at ${PLAN_LIMITS.pieces.toLocaleString("en-US")} pieces: fixture ${r.placed.id} and those after it are left out of the parts list.`);
      break;
    }
    pieces += n;
    for (const p of r.parts) out.push(p);
  }
  return out;
}

/** Derive everything from a plan document (world mm). Unknown kinds and unparsable fixtures are skipped (see deriveWithNotes). */
export function derivePlan(plan: PlanDocument): Derived {
  return deriveWithNotes(plan).derived;
}

/**
 * Re-derive after some fixtures changed (a drag, a parameter edit, an add or delete), reusing the solved room,
 * obstacles, room zones and every unchanged fixture from `previous`. Tool shelves are redone when a counter
 * changed, since their height follows the counters. The room itself must be unchanged; else call derivePlan.
 */
export function rederiveFixtures(plan: PlanDocument, previous: Derived, changedIds: readonly string[]): Derived {
  const changed = new Set(changedIds);
  const room = previous.room;
  const base = planFixtureContext(plan);
  const prev = new Map(previous.fixtures.map((f) => [f.id, f]));
  const counterChanged = plan.fixtures.some((d) => changed.has(d.id) && COUNTER_KINDS.has(d.kind)) || previous.fixtures.some((f) => changed.has(f.id) && COUNTER_KINDS.has(f.kind));
  const redo = (d: FixtureDoc) => changed.has(d.id) || !prev.has(d.id) || (NEEDS_NEIGHBOURS.has(d.kind) && counterChanged);
  const oldParts = groupBy(previous.parts, (p) => p.fixtureId);
  const oldHardware = groupBy(previous.hardware, (h) => h.fixtureId);
  const results = new Map<string, FixtureResult>();
  const counters: CounterSpan[] = [];
  const shelves: FixtureDoc[] = [];
  // Stop tracks are always placed again: cheap, and they follow their saw and its counters.
  const tracks = plan.fixtures.filter((d) => FOLLOWER_KINDS.has(d.kind));
  for (const doc of plan.fixtures) {
    if (FOLLOWER_KINDS.has(doc.kind)) continue;
    if (NEEDS_NEIGHBOURS.has(doc.kind) && redo(doc)) {
      shelves.push(doc);
      continue;
    }
    let res: FixtureResult | undefined;
    const old = prev.get(doc.id);
    if (!redo(doc) && old) res = { placed: old, parts: oldParts.get(doc.id) ?? [], hardware: oldHardware.get(doc.id) ?? [] };
    else {
      const r = resolveFixture(doc);
      const frame = r.ok ? placementFrame(room, doc.placement) : null;
      if (r.ok && frame) res = placeResolved(doc, r.kind, r.params, frame, base);
    }
    if (!res) continue;
    results.set(doc.id, res);
    const span = counterSpan(doc, res.placed);
    if (span) counters.push(span);
  }
  for (const doc of shelves) {
    const r = resolveFixture(doc);
    const frame = r.ok ? placementFrame(room, doc.placement) : null;
    if (!r.ok || !frame) continue;
    const probe = placeResolved(doc, r.kind, r.params, frame, base);
    const h = neighbourCounterHeight(doc, probe.placed, counters);
    results.set(doc.id, h === undefined ? probe : placeResolved(doc, r.kind, r.params, frame, { ...base, neighbourCounterHeightMm: h - frame.z0 }));
  }
  for (const [id, res] of placeTracks(tracks, plan.fixtures, room, results, base)) results.set(id, res);
  const list = plan.fixtures.map((d) => results.get(d.id)).filter((x): x is FixtureResult => !!x);
  const fixtures = list.map((r) => r.placed);
  return {
    room,
    fixtures,
    obstacles: previous.obstacles,
    zones: [...fixtures.flatMap((f) => f.zones), ...previous.zones.filter((z) => !prev.has(z.ownerId))],
    parts: list.flatMap((r) => r.parts),
    hardware: list.flatMap((r) => r.hardware),
  };
}

function groupBy<T>(items: readonly T[], key: (t: T) => string): Map<string, T[]> {
  const m = new Map<string, T[]>();
  for (const it of items) {
    const k = key(it);
    const list = m.get(k);
    if (list) list.push(it);
    else m.set(k, [it]);
  }
  return m;
}
