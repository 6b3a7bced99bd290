/** Two points marked on a photo (pixels of the clean copy) and the known distance between them. */
export interface PhotoScale {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  distanceMm: number;
}

/** Millimetres per pixel of the clean copy, from two marked points a known distance apart. */
export function mmPerPx(s: PhotoScale): number {
  return s.distanceMm / Math.hypot(s.bx - s.ax, s.by - s.ay);
}
