import { ExtrudeGeometry, Shape, type BufferGeometry } from "three";
import type { Prism } from "@/lib/engine/geometry/types";

/** A key that is equal for equal prisms, so geometry can be cached across re-derives. */
export function prismKey(p: Prism): string {
  let s = `${Math.round(p.zMin)}:${Math.round(p.zMax)}`;
  for (const v of p.polygon) s += `|${Math.round(v.x)},${Math.round(v.y)}`;
  return s;
}

const cache = new Map<string, BufferGeometry>();

/** Extruded geometry of an upright prism in mm (world space), cached by shape. */
export function prismGeometry(p: Prism): BufferGeometry {
  const key = prismKey(p);
  let g = cache.get(key);
  if (!g) {
    const shape = new Shape();
    p.polygon.forEach((v, i) => (i === 0 ? shape.moveTo(v.x, v.y) : shape.lineTo(v.x, v.y)));
    shape.closePath();
    g = new ExtrudeGeometry(shape, { depth: Math.max(1, p.zMax - p.zMin), bevelEnabled: false });
    g.translate(0, 0, p.zMin);
    // Bound the cache: shapes seen during a long drag are not needed again.
    if (cache.size > 4000) {
      for (const [k, old] of cache) {
        old.dispose();
        cache.delete(k);
        if (cache.size < 3000) break;
      }
    }
    cache.set(key, g);
  }
  return g;
}
