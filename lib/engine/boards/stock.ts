import { feet, inches } from "../units/length";

/** Board lengths commonly stocked: 6, 8, 10, 12 ft (common practice; editable). */
export const DEFAULT_BOARD_LENGTHS_MM: number[] = [6, 8, 10, 12].map((f) => feet(f));

/**
 * Dressed widths of nominal 1x2, 1x3, 1x4, 1x6, 1x8, 1x10, 1x12 boards: 1-1/2, 2-1/2, 3-1/2, 5-1/2,
 * 7-1/4, 9-1/4, 11-1/4 in (American Softwood Lumber Standard, PS 20, dry dressed sizes; values
 * from memory). Hardwood S4S stock is often sold in the same widths (common practice).
 */
export const DEFAULT_BOARD_WIDTHS_MM: number[] = [1.5, 2.5, 3.5, 5.5, 7.25, 9.25, 11.25].map((w) => inches(w));

/** End trim per end: 1/2 in, our default (common practice trims checked or sniped ends). */
export const DEFAULT_END_TRIM_MM = inches(0.5);

/**
 * Nominal name of a dressed size, for labels ("1x4", "2x4"); undefined for widths not in the
 * table. Stock dressed to 1-1/2 in thick is nominal 2x, thinner stock 1x (PS 20, from memory).
 */
export function nominalWidthName(widthMm: number, thicknessMm = 19): string | undefined {
  const names = ["2", "3", "4", "6", "8", "10", "12"];
  const i = DEFAULT_BOARD_WIDTHS_MM.findIndex((w) => Math.abs(w - widthMm) < 0.01);
  const t = Math.abs(thicknessMm - inches(1.5)) < 1 ? "2" : thicknessMm < inches(1.25) ? "1" : undefined;
  return i >= 0 && t ? `${t}x${names[i]}` : undefined;
}
