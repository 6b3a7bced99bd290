import type { PlacedFixture } from "../fixtures/types";

/** Kind names and zone purposes the rules look for (fixture kinds live in lib/engine/fixtures). */
export const KIND = {
  toolShelf: "tool-shelf",
  tableSaw: "table-saw",
  stopTrack: "stop-track",
  wallCabinet: "wall-cabinet",
  baseCabinet: "base-cabinet",
  workbench: "workbench",
  shelfRun: "shelf-run",
  lumberRack: "lumber-rack",
  cleatWall: "cleat-wall",
  pegboard: "pegboard",
} as const;

export const PURPOSE = {
  stockPathLeft: "stock-path-left",
  stockPathRight: "stock-path-right",
  miterHead: "miter-head",
  infeed: "infeed",
  outfeed: "outfeed",
  sideClearance: "side-clearance",
  drawerPull: "drawer-pull",
  doorSwing: "door-swing",
} as const;

/** Height above the floor below which a body counts as standing on the floor, mm (our own tolerance). */
export const FLOOR_SLACK_MM = 50;

export const worldWorkSurface = (f: PlacedFixture): number | undefined =>
  f.workSurfaceMm === undefined ? undefined : f.origin.z + f.workSurfaceMm;

export const hasZone = (f: PlacedFixture, ...purposes: string[]) => f.zones.some((z) => purposes.includes(z.purpose));

/** What the rules ask of a fixture again and again, worked out once per placed fixture object. */
interface FixtureInfo {
  miter: boolean;
  tableSaw: boolean;
  counter: boolean;
  shelves: boolean;
  /** Highest shelf top above the fixture's base, mm; undefined when it has no shelf boxes. */
  shelfTopMm?: number;
}

const INFO = new WeakMap<PlacedFixture, FixtureInfo>();

export function fixtureInfo(f: PlacedFixture): FixtureInfo {
  let i = INFO.get(f);
  if (i) return i;
  let miterZone = false;
  let sawZone = false;
  for (const z of f.zones) {
    if (z.purpose === PURPOSE.stockPathLeft || z.purpose === PURPOSE.stockPathRight) miterZone = true;
    if (z.purpose === PURPOSE.infeed || z.purpose === PURPOSE.outfeed) sawZone = true;
  }
  let shelfTop = -Infinity;
  for (const b of f.boxes) if (b.role === "shelf" && b.z + b.h > shelfTop) shelfTop = b.z + b.h;
  const miter = f.kind === KIND.toolShelf || miterZone;
  const tableSaw = f.kind === KIND.tableSaw || sawZone;
  i = {
    miter,
    tableSaw,
    counter: f.workSurfaceMm !== undefined && !miter && !tableSaw && f.kind !== KIND.stopTrack,
    shelves: f.kind === KIND.wallCabinet || f.kind === KIND.shelfRun || f.kind === KIND.lumberRack || shelfTop > -Infinity,
    shelfTopMm: shelfTop > -Infinity ? shelfTop : undefined,
  };
  INFO.set(f, i);
  return i;
}

/** A benchtop saw on a tool shelf: it has stock-path zones, or is a tool shelf. */
export const isMiterStation = (f: PlacedFixture) => fixtureInfo(f).miter;

export const isTableSaw = (f: PlacedFixture) => fixtureInfo(f).tableSaw;

export const isSaw = (f: PlacedFixture) => isMiterStation(f) || isTableSaw(f);

export const isWallHung = (f: PlacedFixture) => f.body.zMin > FLOOR_SLACK_MM;

export const isFloorStanding = (f: PlacedFixture) => f.body.zMin <= FLOOR_SLACK_MM;

/** Counters and benches: a work surface, and not a tool table (the flush rule covers those). */
export const isCounter = (f: PlacedFixture) => fixtureInfo(f).counter;

/** Fixtures with shelves someone reaches up to. */
export const hasShelves = (f: PlacedFixture) => fixtureInfo(f).shelves;
