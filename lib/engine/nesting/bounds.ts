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

/** A piece for the conflict bound: extents along the sheet's length and width, and whether it may turn. */
export interface BoundPiece {
  len: number;
  wid: number;
  /** 0: fixed as given; 1: fixed turned; 2: either way. */
  mode: 0 | 1 | 2;
}

function orientations(p: BoundPiece): [number, number][] {
  if (p.mode === 0) return [[p.len, p.wid]];
  if (p.mode === 1) return [[p.wid, p.len]];
  return [
    [p.len, p.wid],
    [p.wid, p.len],
  ];
}

/** Two pieces can share a sheet only if, in some orientation, they sit side by side along one axis with a kerf between. */
function canShare(a: BoundPiece, b: BoundPiece, L: number, W: number, k: number): boolean {
  for (const [ax, ay] of orientations(a))
    for (const [bx, by] of orientations(b)) {
      if (ax + k + bx <= L + 1e-9 && Math.max(ay, by) <= W + 1e-9) return true;
      if (ay + k + by <= W + 1e-9 && Math.max(ax, bx) <= L + 1e-9) return true;
    }
  return false;
}

/**
 * Fewest sheets from pieces that cannot share a sheet with each other (a clique of such pieces,
 * found greedily from the largest): each needs a sheet of its own. A count; usable sizes in mm.
 * Complements the area bound when long or deep pieces leave unusable space beside them.
 */
export function conflictLowerBound(pieces: readonly BoundPiece[], usableLengthMm: number, usableWidthMm: number, kerfMm: number): number {
  const sorted = [...pieces].sort((a, b) => b.len * b.wid - a.len * a.wid);
  const clique: BoundPiece[] = [];
  for (const p of sorted) {
    if (clique.every((q) => !canShare(p, q, usableLengthMm, usableWidthMm, kerfMm))) clique.push(p);
  }
  return clique.length;
}
