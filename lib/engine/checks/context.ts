import type { Derived, PlacedObstacle } from "../derive-types";
import type { PlacedFixture, WorldZone } from "../fixtures/types";
import type { Bounds2, Prism, Vec2 } from "../geometry/types";
import type { PlanDocument } from "../plan/schema";
import { formatLengthFor } from "./format";
import { polygonBounds } from "./geom/polygon";
import { presetKeys, resolveNumbers, type RuleNumbers } from "./numbers";
import { GridIndex } from "./spatial/grid-index";

/** Something solid in the room: a fixture's body or an obstacle's. */
export interface SolidItem {
  id: string;
  source: "fixture" | "obstacle";
  kind: string;
  label: string;
  prism: Prism;
  bounds: Bounds2;
  fixture?: PlacedFixture;
  obstacle?: PlacedObstacle;
}

/** A keep-clear zone with its floor bounds. */
export interface ZoneItem {
  zone: WorldZone;
  bounds: Bounds2;
}

/** Options for one evaluation. */
export interface EvaluateOptions {
  /** An instructor's preset: any rule number it sets wins over defaults and settings. */
  preset?: Partial<RuleNumbers>;
  /** Label used in messages for numbers a preset set. */
  presetLabel?: string;
  /** Grid cell edge, mm (1000 by default). A huge cell makes every query scan everything: the all-pairs baseline in benchmarks. */
  cellMm?: number;
}

/** What every rule reads: the derived plan, the numbers in force, spatial indexes and a length formatter. */
export interface CheckContext extends Derived {
  plan: PlanDocument;
  numbers: RuleNumbers;
  presetSet: ReadonlySet<keyof RuleNumbers>;
  presetLabel: string;
  solids: GridIndex<SolidItem>;
  zoneIndex: GridIndex<ZoneItem>;
  fixtureById: Map<string, PlacedFixture>;
  roomPolygon: Vec2[];
  /** Length in the plan's units, e.g. `36"`. */
  len(mmValue: number): string;
  /** Small lengths (tolerances, sag) to 1/32 in whatever the plan's precision. */
  lenFine(mmValue: number): string;
  /** " (class preset)" when any of these numbers came from the preset, else "". */
  presetNote(...keys: (keyof RuleNumbers)[]): string;
}

const SOLIDS = new WeakMap<PlacedFixture, SolidItem>();

/** The index entry for a fixture's body (one per placed fixture object: unchanged fixtures keep theirs across re-derives). */
export function fixtureSolid(f: PlacedFixture): SolidItem {
  let s = SOLIDS.get(f);
  if (!s) {
    s = { id: f.id, source: "fixture", kind: f.kind, label: f.label || f.kind, prism: f.body, bounds: polygonBounds(f.body.polygon), fixture: f };
    SOLIDS.set(f, s);
  }
  return s;
}

export function obstacleSolid(o: PlacedObstacle): SolidItem {
  return { id: o.id, source: "obstacle", kind: o.kind, label: o.kind.replace(/-/g, " "), prism: o.body, bounds: polygonBounds(o.body.polygon), obstacle: o };
}

const NOT_SOLID = new Set(["parking-bay", "outlet"]);

export const solidKey = (s: { id: string; source: string }) => `${s.source}:${s.id}`;
export const zoneItem = (z: WorldZone): ZoneItem => ({ zone: z, bounds: polygonBounds(z.prism.polygon) });

/** Length formatter with a small cache: the same few lengths (36 in, 8 ft...) recur in hundreds of messages. */
function memoLen(settings: PlanDocument["settings"]): (v: number) => string {
  const cache = new Map<number, string>();
  return (v) => {
    const k = Math.round(v * 100);
    let t = cache.get(k);
    if (t === undefined) {
      t = formatLengthFor(v, settings);
      if (cache.size < 4096) cache.set(k, t);
    }
    return t;
  };
}

/** Builds the context: resolves numbers and indexes every body and zone on a uniform grid. */
export function buildContext(plan: PlanDocument, derived: Derived, opts: EvaluateOptions = {}): CheckContext {
  const numbers = resolveNumbers(plan, opts.preset);
  const presetSet = presetKeys(opts.preset);
  const presetLabel = opts.presetLabel ?? "class preset";
  const solids = new GridIndex<SolidItem>(opts.cellMm ?? 1000);
  const zoneIndex = new GridIndex<ZoneItem>(opts.cellMm ?? 1000);
  const fixtureById = new Map<string, PlacedFixture>();
  for (const f of derived.fixtures) {
    fixtureById.set(f.id, f);
    const s = fixtureSolid(f);
    solids.insert(solidKey(s), s.bounds, s);
  }
  for (const o of derived.obstacles) {
    // A parking bay is its zones (vehicle, doors); an outlet sits in the wall. Neither is a solid.
    if (NOT_SOLID.has(o.kind)) continue;
    const s = obstacleSolid(o);
    solids.insert(solidKey(s), s.bounds, s);
  }
  for (const z of derived.zones) zoneIndex.insert(z.id, polygonBounds(z.prism.polygon), zoneItem(z));
  const settings = plan.settings;
  return {
    ...derived,
    plan,
    numbers,
    presetSet,
    presetLabel,
    solids,
    zoneIndex,
    fixtureById,
    roomPolygon: derived.room.corners,
    len: memoLen(settings),
    lenFine: memoLen({ ...settings, precision: 32 }),
    presetNote: (...keys) => (keys.some((k) => presetSet.has(k)) ? ` (${presetLabel})` : ""),
  };
}
