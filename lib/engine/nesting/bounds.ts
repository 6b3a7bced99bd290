/**
 * Fewest sheets physically possible, a count. Each piece owns its own area plus one kerf on two
 * adjacent sides, (l + k)(w + k); those padded areas never overlap and fit inside the usable area
 * grown by one kerf on each axis (the last piece on an edge needs no kerf past it). Total padded
 * area over that, rounded up, is the area bound (the physical limit named in TRADE.md's
 * reference-library notes). Offcut area on hand is taken off first.
 */
export function sheetLowerBound(
  pieces: readonly { lengthMm: number; widthMm: number }[],
  usableLengthMm: number,
  usableWidthMm: number,
  kerfMm: number,
  offcutAreaMm2 = 0,
): number {
  const need = pieces.reduce((s, p) => s + (p.lengthMm + kerfMm) * (p.widthMm + kerfMm), 0) - offcutAreaMm2;
  if (need <= 0) return 0;
  const per = (usableLengthMm + kerfMm) * (usableWidthMm + kerfMm);
  // A hair of tolerance so float noise on an exact fit does not add a sheet.
  return Math.ceil(need / per - 1e-9);
}
