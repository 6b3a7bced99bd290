import type { Grain } from "../fixtures/types";
import type { StopTable } from "../fixtures/stop-track/stop-table";

/** A fixture's letter in the part labels (A, B, ... Z, AA, AB ...), from its place in the plan's stored order. */
export interface FixtureLetter {
  fixtureId: string;
  letter: string;
  kind: string;
  /** The fixture's own label, or its id when it has none. */
  name: string;
}

/** One row of the labelled cut list: identical parts from every fixture, one label to pencil on each piece (mm). */
export interface CutRow {
  /** Short label: the letter of the first fixture that uses the part and the part's number in that fixture ("B4"). */
  label: string;
  /** The parts list's grouping key (name, material, stock, grain, size, edges, joinery). */
  key: string;
  name: string;
  /** Finished parts. */
  qty: number;
  /** Pieces to saw: qty times the layers a thick part is glued up from (a doubled fence is two pieces). */
  pieces: number;
  /** Layers of stock per part (1 unless glued up). */
  layers: number;
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  materialId: string;
  materialName: string;
  stock: "sheet" | "board";
  grain: Grain;
  edges: string[];
  joinery: string[];
  /** Where the parts go, per fixture, in plan order. */
  fixtures: { fixtureId: string; letter: string; qty: number }[];
  /** Part ids (fixtureId:key) in the row. */
  partIds: string[];
  /** Setups this row is cut or machined at, in run order. */
  setupIds: string[];
}

export type SetupKind = "rip" | "crosscut" | "dado" | "rabbet" | "groove" | "pocket-screw";

/** Where a setup is made. */
export type Station = "table-saw-fence" | "table-saw-sled" | "miter-saw-stop-track" | "miter-saw" | "panel-cut" | "dado-stack" | "pocket-hole-jig";

/** One entry of a setup: a row of the cut list and how many pieces get this setting. */
export interface SetupItem {
  label: string;
  qty: number;
  materialId: string;
  /** Which edge or face, for joinery ("along the bottom inside edge"). */
  where?: string;
}

/** A machine setting made once, with every piece cut at it (mm). */
export interface Setup {
  /** Stable within one result: "rip-1", "crosscut-3", "dado-1". */
  id: string;
  /** 1-based run order over all setups. */
  order: number;
  kind: SetupKind;
  station: Station;
  /** What to set, in words with the plan's units ("Rip fence at 23 1/64\" from the blade"). */
  title: string;
  /** The numbers of the setting, mm (only those the kind uses). */
  setting: {
    /** Rip: fence to the near side of the blade; crosscut: stop to the blade's near side. */
    fenceMm?: number;
    lengthMm?: number;
    widthMm?: number;
    depthMm?: number;
    /** Joinery: fence to the near edge of the cut. */
    fenceDistanceMm?: number;
    /** Pocket screws: stock thickness the jig is set for. */
    stockThicknessMm?: number;
  };
  /** Which side of the line the kerf falls, in words. */
  kerfSide?: string;
  items: SetupItem[];
  /** Sum of the items' qty. */
  totalQty: number;
  tools: string[];
  cautions: string[];
  /** Where to make the test cut first. */
  testCut: string;
  /** The stop track this setup's lengths are set on, for stop-track crosscuts. */
  stopTrackId?: string;
}

/** A stop table row with where its length comes from. */
export interface BuildStopRow {
  cutLengthMm: number;
  fromBladeMm: number;
  fromTrackStartMm: number;
  tapeReadingMm: number;
  inReach: boolean;
  /** "plan": a repeat crosscut of the plan's parts; "typed": a length the user entered on the track. */
  source: "plan" | "typed";
  labels: string[];
  qty: number;
  /** The crosscut setup the row sets, for plan rows. */
  setupId?: string;
}

/** The stop table of one stop track, filled from the plan's repeat crosscuts and the lengths typed on it. */
export interface BuildStopTable {
  fixtureId: string;
  letter: string;
  name: string;
  side: "left" | "right";
  kerfSide: "away" | "toward";
  kerfMm: number;
  tapeOffsetMm: number;
  minCutMm: number;
  maxCutMm: number;
  rows: BuildStopRow[];
  /** Things to know, in words (no saw in the plan, rows out of reach). */
  notes: string[];
}

/** A timed wait in a step (glue open time, cement flash-off, cure before load), with where the number comes from. */
export interface TimeNote {
  text: string;
  source: string;
}

/** One step of the build order. */
export interface BuildStep {
  /** Stable within one result: "room-kicks", "cab-1-carcass". */
  id: string;
  order: number;
  /** Room-wide steps cover every fixture; fixture steps one fixture. */
  scope: "room" | "fixture";
  fixtureId?: string;
  title: string;
  /** What to do, briefly. */
  detail: string;
  /** Labels of the rows this step uses, with the quantity this step takes. */
  parts: { label: string; qty: number }[];
  /** Setups used, by id (not copies). */
  setupIds: string[];
  timeNotes: TimeNote[];
  cautions: string[];
}

/** Everything the day at the saw needs: labelled cut list, setups, stop tables and build steps. */
export interface BuildResult {
  kerfMm: number;
  fixtures: FixtureLetter[];
  rows: CutRow[];
  setups: Setup[];
  stopTables: BuildStopTable[];
  steps: BuildStep[];
  /** Problems in words (no parts, a part thinner than its stock, a stop track with no saw); never thrown. */
  notes: string[];
  /** Label of every part id, for sheet maps and board plans (which carry part ids). */
  labelOf: Record<string, string>;
}

export type { StopTable };
