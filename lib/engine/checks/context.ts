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
  /** Index key: source and id. */
  key: string;
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
    s = { id: f.id, key: `fixture:${f.id}`, source: "fixture", kind: f.kind, label: f.label || f.kind, prism: f.body, bounds: polygonBounds(f.body.polygon), fixture: f };
    SOLIDS.set(f, s);
  }
  return s;
}

export function obstacleSolid(o: PlacedObstacle): SolidItem {
  return { id: o.id, key: `obstacle:${o.id}`, source: "obstacle", kind: o.kind, label: o.kind.replace(/-/g, " "), prism: o.body, bounds: polygonBounds(o.body.polygon), obstacle: o };
}

const NOT_SOLID = new Set(["parking-bay", "outlet"]);

const ZONES = new WeakMap<WorldZone, ZoneItem>();

/** The index entry for a zone (one per zone object: unchanged fixtures keep their zones across re-derives). */
export function zoneItem(z: WorldZone): ZoneItem {
  let item = ZONES.get(z);
  if (!item) {
    item = { zone: z, bounds: polygonBounds(z.prism.polygon) };
    ZONES.set(z, item);
  }
  return item;
}

/** Formatted lengths per settings object: the same few lengths (36 in, 8 ft...) recur in hundreds of messages, and edits keep the settings object. */
const LENGTHS = new WeakMap<object, Map<number, string>>();
const FINE_LENGTHS = new WeakMap<object, Map<number, string>>();

/** Length formatter with a cache shared by every evaluation under the same settings object; `fine` writes to 1/32 in. */
function memoLen(settings: PlanDocument["settings"], fine: boolean): (v: number) => string {
  const caches = fine ? FINE_LENGTHS : LENGTHS;
  const fmt: PlanDocument["settings"] = fine ? { ...settings, precision: 32 } : settings;
  let cache = caches.get(settings);
  if (!cache) {
    cache = new Map();
    caches.set(settings, cache);
  }
  const c = cache;
  return (v) => {
    const k = Math.round(v * 100);
    let t = c.get(k);
    if (t === undefined) {
      t = formatLengthFor(v, fmt);
      if (c.size < 4096) c.set(k, t);
    }
    return t;
  };
}

/** Builds the context: resolves numbers and indexes every body and zone on a uniform grid. */
export function buildContext(plan: PlanDocument, derived: Derived, opts: EvaluateOptions = {}): CheckContext {
  const numbers = resolveNumbers(plan, opts.preset);
  const presetSet = presetKeys(opts.preset);
  const presetLabel = opts.presetLabel ?? "class preset";
  const fixtureById = new Map<string, PlacedFixture>();
  const solidKeys: string[] = [];
  const solidBounds: Bounds2[] = [];
  const solidItems: SolidItem[] = [];
  const addSolid = (s: SolidItem) => {
    solidKeys.push(s.key);
    solidBounds.push(s.bounds);
    solidItems.push(s);
  };
  for (const f of derived.fixtures) {
    fixtureById.set(f.id, f);
    addSolid(fixtureSolid(f));
  }
  // A parking bay is its zones (vehicle, doors); an outlet sits in the wall. Neither is a solid.
  for (const o of derived.obstacles) if (!NOT_SOLID.has(o.kind)) addSolid(obstacleSolid(o));
  const zoneKeys: string[] = [];
  const zoneBounds: Bounds2[] = [];
  const zoneItems: ZoneItem[] = [];
  for (const z of derived.zones) {
    const item = zoneItem(z);
    zoneKeys.push(z.id);
    zoneBounds.push(item.bounds);
    zoneItems.push(item);
  }
  const solids = GridIndex.build(solidKeys, solidBounds, solidItems, opts.cellMm ?? 1000);
  const zoneIndex = GridIndex.build(zoneKeys, zoneBounds, zoneItems, opts.cellMm ?? 1000);
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
    len: memoLen(settings, false),
    lenFine: memoLen(settings, true),
    presetNote: (...keys) => (keys.some((k) => presetSet.has(k)) ? ` (${presetLabel})` : ""),
  };
}
