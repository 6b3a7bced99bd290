import { formatLength } from "../units/format-length";
import { MM_PER_FOOT, type InchPrecision, type LengthUnits } from "../units/length";
import type { Drawing, SheetPoint } from "./types";

/** A scale bar under a drawing: alternate filled and empty segments from `at`, its length written in the plan's units (sheet mm). */
export interface ScaleBar {
  at: SheetPoint;
  /** Whole bar, mm (room and sheet alike: drawings are 1:1 in sheet mm). */
  lengthMm: number;
  segments: number;
  heightMm: number;
  text: string;
  textAt: SheetPoint;
  sizeMm: number;
  /** The drawing's bounds grown to hold the bar. */
  bounds: Drawing["bounds"];
}

/** Round bar lengths a person reads at a glance: feet for inch plans, millimetres for metric ones. */
const FEET = [1, 2, 4, 5, 10, 20, 50, 100].map((f) => f * MM_PER_FOOT);
const METRES = [250, 500, 1000, 2000, 5000, 10_000, 20_000, 50_000];

/** A scale bar about a fifth of the drawing's width, below its lower left corner, in the plan's units. */
export function scaleBar(d: Drawing, opts: { units: LengthUnits; precision?: InchPrecision }): ScaleBar {
  const width = d.bounds.maxX - d.bounds.minX;
  const steps = opts.units === "mm" ? METRES : FEET;
  const lengthMm = [...steps].reverse().find((s) => s <= width / 4) ?? steps[0];
  const size = d.textSizeMm;
  const at = { x: d.bounds.minX + size, y: d.bounds.maxY + size };
  const heightMm = size * 0.5;
  return {
    at,
    lengthMm,
    segments: 4,
    heightMm,
    text: formatLength(lengthMm, { units: opts.units, precision: opts.precision }),
    textAt: { x: at.x + lengthMm + size * 0.6, y: at.y + heightMm / 2 },
    sizeMm: size,
    bounds: { ...d.bounds, maxY: d.bounds.maxY + size * 2.5 },
  };
}
