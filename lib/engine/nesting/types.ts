import type { Grain } from "../fixtures/types";

/** An axis-aligned rectangle on a sheet, mm. x runs along the sheet's length (its long side, the grain), y across its width. */
export interface SheetRect {
  xMm: number;
  yMm: number;
  /** Extent along the sheet's length (x), mm. */
  lenMm: number;
  /** Extent across the sheet's width (y), mm. */
  widMm: number;
}

/** Stock to nest on: bought sheets (unlimited) or the user's offcuts (counted). */
export interface SheetStock {
  id: string;
  materialId: string;
  /** Long side, mm. */
  lengthMm: number;
  /** Short side, mm. */
  widthMm: number;
  /** How many are on hand; Infinity for sheets still to buy. */
  qty: number;
  source: "new" | "offcut";
  /** Margin trimmed off each end (along the length), mm (factory edges are often bruised; sawn offcut edges need none). */
  trimLengthMm: number;
  /** Margin trimmed off each long edge, mm. */
  trimWidthMm: number;
}

/** A user offcut offered as extra stock. */
export interface OffcutInput {
  id: string;
  materialId: string;
  lengthMm: number;
  widthMm: number;
  qty: number;
}

/** One piece to cut: one unit of a parts-list line. */
export interface NestPiece {
  /** `${partId}#${n}`, unique. */
  key: string;
  partId: string;
  name: string;
  lengthMm: number;
  widthMm: number;
  grain: Grain;
}

/** Where a piece sits on a sheet. `rotated` is true when the part's length runs across the sheet (y). */
export interface Placement extends SheetRect {
  pieceKey: string;
  partId: string;
  name: string;
  rotated: boolean;
  grain: Grain;
}

/** A guillotine cut, edge to edge of the panel it splits. The kerf occupies [at, at + kerf] on the cut's axis. */
export interface Cut {
  /** 1-based order on the saw: rips of the sheet first, then crosscuts of each strip, and so on. */
  seq: number;
  /** Depth in the cut tree: 1 for cuts of the whole sheet. */
  level: number;
  /** A rip runs along the sheet's length (a line of constant y); a crosscut runs across it. */
  kind: "rip" | "crosscut";
  /** The segment on the sheet, mm: the near edge of the kerf. */
  x1Mm: number;
  y1Mm: number;
  x2Mm: number;
  y2Mm: number;
}

/** A leftover piece of a sheet after all cuts. */
export interface Offcut extends SheetRect {
  /** Large enough to keep for later work. */
  reusable: boolean;
}

/** One sheet and everything cut from it. */
export interface SheetLayout {
  /** 1-based within its material. */
  index: number;
  stockId: string;
  source: "new" | "offcut";
  lengthMm: number;
  widthMm: number;
  /** What is left after trimming the edges; all pieces lie inside it. */
  usable: SheetRect;
  placements: Placement[];
  cuts: Cut[];
  offcuts: Offcut[];
  partAreaMm2: number;
  /** Part area / sheet area, percent. */
  yieldPct: number;
}

/** A part that could not be nested, with the reason in words. */
export interface UnplacedPart {
  partId: string;
  name: string;
  qty: number;
  reason: string;
}

/** The nest of one sheet material (one material id at one thickness). */
export interface MaterialNest {
  materialId: string;
  materialName: string;
  thicknessMm: number;
  sheetLengthMm: number;
  sheetWidthMm: number;
  sheets: SheetLayout[];
  /** New sheets to buy. */
  sheetsUsed: number;
  /** User offcuts consumed. */
  offcutsUsed: number;
  /** Fewest new sheets physically possible: part area with kerf over usable sheet area, rounded up. */
  lowerBound: number;
  partAreaMm2: number;
  /** Area of all stock used (new sheets and offcuts), mm2. */
  stockAreaMm2: number;
  yieldPct: number;
  wasteMm2: number;
  unplaced: UnplacedPart[];
  /** Layouts tried. */
  attempts: number;
  /** Work steps spent on this material (free rectangles tested). */
  work: number;
  /** Things the user should know, in words (edge trim dropped for a full-length part...). */
  notes: string[];
  /** Name of the heuristic that won. */
  strategy: string;
}

export interface NestProgress {
  /** Fraction of the work budget spent, 0..1. */
  fraction: number;
  materialId: string;
  bestSheets: number;
  lowerBound: number;
  attempts: number;
}

export interface NestOptions {
  /** Saw kerf, mm (plan settings). */
  kerfMm: number;
  /** Trim off each factory edge, mm. Default 1/4 in. */
  trimMm?: number;
  /** Offcuts on hand, used before new sheets. */
  offcuts?: OffcutInput[];
  /** Leftovers at least this wide on their short side are marked reusable, mm. */
  reusableMinWidthMm?: number;
  /** ... and at least this long on their long side, mm. */
  reusableMinLengthMm?: number;
  /** Accepted from older callers and ignored: the work budget and attempt cap decide, never the clock. */
  timeBudgetMs?: number;
  /** Work steps (free rectangles tested) for the search over all materials; default DEFAULT_NEST_WORK. */
  maxWork?: number;
  /** Cap on layouts tried per material. */
  maxAttempts?: number;
  /** Seed for the randomised orderings. */
  seed?: number;
  /** Called now and then; return false to stop the search and keep the best so far. */
  onProgress?: (p: NestProgress) => boolean | void;
}

export interface NestResult {
  materials: MaterialNest[];
  unplaced: UnplacedPart[];
  elapsedMs: number;
  /** Work steps spent over all materials (at most `maxWork` plus one next-fit layout per material). */
  work: number;
  /** True when onProgress stopped the search early. */
  stopped: boolean;
}
