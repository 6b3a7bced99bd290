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

/** A benchtop saw on a tool shelf: it has stock-path zones, or is a tool shelf. */
export const isMiterStation = (f: PlacedFixture) => f.kind === KIND.toolShelf || hasZone(f, PURPOSE.stockPathLeft, PURPOSE.stockPathRight);

export const isTableSaw = (f: PlacedFixture) => f.kind === KIND.tableSaw || hasZone(f, PURPOSE.infeed, PURPOSE.outfeed);

export const isSaw = (f: PlacedFixture) => isMiterStation(f) || isTableSaw(f);

export const isWallHung = (f: PlacedFixture) => f.body.zMin > FLOOR_SLACK_MM;

export const isFloorStanding = (f: PlacedFixture) => f.body.zMin <= FLOOR_SLACK_MM;

/** Counters and benches: a work surface, and not a tool table (the flush rule covers those). */
export const isCounter = (f: PlacedFixture) => f.workSurfaceMm !== undefined && !isMiterStation(f) && !isTableSaw(f) && f.kind !== KIND.stopTrack;

/** Fixtures with shelves someone reaches up to. */
export const hasShelves = (f: PlacedFixture) =>
  f.kind === KIND.wallCabinet || f.kind === KIND.shelfRun || f.kind === KIND.lumberRack || f.boxes.some((b) => b.role === "shelf");
