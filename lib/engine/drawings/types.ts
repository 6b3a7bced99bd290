/**
 * Drawings as plain data: what a plan view or a wall elevation shows, laid out in sheet
 * millimetres (x to the right, y down, 1 mm of sheet = 1 mm of room). Renderers (SVG on the
 * pages, the build packet) map these objects to marks one to one; they compute no geometry.
 */

/** A point on the sheet, mm (x right, y down). */
export interface SheetPoint {
  x: number;
  y: number;
}

/** What a mark is, for its fill and line style: one palette per renderer, keyed by these roles. */
export type FillRole =
  | "floor"
  | "wall"
  | "wall-face"
  | "opening"
  | "door-swing"
  | "fixture"
  | "fixture-above"
  | "carcass"
  | "front"
  | "counter"
  | "shelf"
  | "tool"
  | "track"
  | "rack"
  | "keep-clear"
  | "obstacle"
  | "leader";

/** Layers a viewer may hide; marks without a layer are always drawn. */
export type DrawingLayer = "keep-clear";

/** A closed polygon or an open polyline. */
export interface DrawingShape {
  type: "polygon" | "polyline";
  points: SheetPoint[];
  role: FillRole;
  /** The plan object it draws (fixture, opening, obstacle, wall or zone id), for highlighting. */
  ref?: string;
  layer?: DrawingLayer;
}

/** Text placed by the engine: one or more lines, each with its own baseline-centre point. */
export interface DrawingLabel {
  /** The whole text, in words (a fixture's label or its kind's name, never a raw kind id). */
  text: string;
  /** The text broken into the lines drawn, and where each line's centre sits (middle of the line box). */
  lines: { text: string; at: SheetPoint }[];
  sizeMm: number;
  /** Turn of the text, degrees clockwise on the sheet; kept between -90 and 90 so it reads upright. */
  angleDeg: number;
  kind: "name" | "tag" | "legend" | "wall-name" | "title";
  ref?: string;
  layer?: DrawingLayer;
}

/** A dimension: the measured points, the drawn line and its witness lines, and the text made with the plan's length formatter. */
export interface DimensionLine {
  from: SheetPoint;
  to: SheetPoint;
  /** How far the dimension line stands off the measured points, mm (sheet). */
  offsetMm: number;
  /** The measured length, mm (room). */
  valueMm: number;
  text: string;
  line: [SheetPoint, SheetPoint];
  extensions: [SheetPoint, SheetPoint][];
  textAt: SheetPoint;
  textAngleDeg: number;
  /** Which chain it belongs to ("overall", "fixtures", "wall-hung", "openings", "heights") and what it measures. */
  chain: string;
  ref?: string;
  /** What it measures, in words ("Counter height", "Upper cabinet: clear gap"), for a hover card or a screen reader. */
  note?: string;
}

/** A tagged item listed under the drawing (its label did not fit its box). */
export interface LegendEntry {
  tag: string;
  text: string;
  ref?: string;
}

/** One drawing: its marks, text and dimensions, with the sheet bounds that hold them all. */
export interface Drawing {
  kind: "plan" | "elevation";
  /** Accessible title ("Floor plan of the room", "Elevation of Back wall"). */
  title: string;
  /** A sentence or two saying what is drawn, for screen readers. */
  description: string;
  /** The wall an elevation shows, and its name in words. */
  wallId?: string;
  wallName?: string;
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  /** The text height the drawing was laid out with, mm (sheet). */
  textSizeMm: number;
  shapes: DrawingShape[];
  labels: DrawingLabel[];
  dimensions: DimensionLine[];
  legend: LegendEntry[];
  /** For an elevation: where a reference photo of the wall goes (from the viewer's left corner at the floor), sheet mm. */
  photoAnchor?: SheetPoint;
}
