import type { Bounds2 } from "../../geometry/types";
import { DynamicGrid } from "./dynamic-grid";

const finite = (b: Bounds2) => Number.isFinite(b.minX) && Number.isFinite(b.minY) && Number.isFinite(b.maxX) && Number.isFinite(b.maxY);

/**
 * A uniform grid over floor bounds (mm). A bulk build packs every item into flat typed arrays
 * (cell -> item numbers, counted then filled), which costs a few small allocations however many
 * items there are; items inserted later go to a small map-based grid beside it, and removed ones
 * are flagged. A query visits only the cells it touches and reports each item once. Callers do
 * the exact geometric test.
 */
export class GridIndex<T> {
  // The packed part, from build().
  private keys: string[] = [];
  private items: T[] = [];
  private bounds: Bounds2[] = [];
  private gone = new Uint8Array(0);
  private seen = new Int32Array(0);
  private cellStart = new Int32Array(1);
  private cellItems = new Int32Array(0);
  /** Cell edge of the packed part, mm: `cellMm`, doubled until a huge sparse extent stays a modest array. */
  private pc = 1;
  private x0 = 0;
  private y0 = 0;
  private nx = 0;
  private ny = 0;
  /** Key -> packed item number; made on the first get or remove (full evaluations never need it). */
  private keyIndex: Map<string, number> | undefined;
  private removedCount = 0;
  private stamp = 0;
  // Items inserted after the build.
  private extra: DynamicGrid<T>;

  /** `cellMm`: cell edge, mm; about the size of a typical item works best. */
  constructor(readonly cellMm = 600) {
    this.extra = new DynamicGrid<T>(cellMm);
  }

  /** A grid holding `items` under `keys` (unique) with floor `bounds`, packed in one pass; the arrays are kept, not copied. */
  static build<T>(keys: string[], bounds: Bounds2[], items: T[], cellMm = 600): GridIndex<T> {
    const g = new GridIndex<T>(cellMm);
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    let allFinite = true;
    for (const b of bounds) {
      if (!finite(b)) {
        allFinite = false;
        continue;
      }
      if (b.minX < minX) minX = b.minX;
      if (b.minY < minY) minY = b.minY;
      if (b.maxX > maxX) maxX = b.maxX;
      if (b.maxY > maxY) maxY = b.maxY;
    }
    if (!allFinite) {
      // Rare (an empty outline): those items go to the map-based grid, the rest are packed.
      const keep = bounds.map((b) => finite(b));
      bounds.forEach((b, i) => !keep[i] && g.extra.insert(keys[i], b, items[i]));
      return GridIndex.build(keys.filter((_, i) => keep[i]), bounds.filter((_, i) => keep[i]), items.filter((_, i) => keep[i]), cellMm).withExtra(g.extra);
    }
    const n = bounds.length;
    if (!n) return g;
    let c = cellMm;
    while (((maxX - minX) / c + 2) * ((maxY - minY) / c + 2) > 8 * n + 65536) c *= 2;
    g.pc = c;
    g.x0 = Math.floor(minX / c);
    g.y0 = Math.floor(minY / c);
    g.nx = Math.floor(maxX / c) - g.x0 + 1;
    g.ny = Math.floor(maxY / c) - g.y0 + 1;
    const cells = g.nx * g.ny;
    const start = new Int32Array(cells + 1);
    // Count, then prefix sums, then fill: two passes over each item's cells.
    for (let i = 0; i < n; i++) g.eachCell(bounds[i], -1, start, null);
    for (let k = 0; k < cells; k++) start[k + 1] += start[k];
    const fill = start.slice(0, cells);
    const out = new Int32Array(start[cells]);
    for (let i = 0; i < n; i++) g.eachCell(bounds[i], i, fill, out);
    g.cellStart = start;
    g.cellItems = out;
    g.keys = keys;
    g.items = items;
    g.bounds = bounds;
    g.gone = new Uint8Array(n);
    g.seen = new Int32Array(n);
    return g;
  }

  private withExtra(extra: DynamicGrid<T>): GridIndex<T> {
    this.extra = extra;
    return this;
  }

  get size(): number {
    return this.keys.length - this.removedCount + this.extra.size;
  }

  /** Walks an item's cells: counts it (`item` < 0: `at[cell + 1]++`) or files it (`out[at[cell]++] = item`). */
  private eachCell(b: Bounds2, item: number, at: Int32Array, out: Int32Array | null): void {
    const c = this.pc;
    const ix0 = Math.max(0, Math.floor(b.minX / c) - this.x0);
    const iy0 = Math.max(0, Math.floor(b.minY / c) - this.y0);
    const ix1 = Math.min(this.nx - 1, Math.floor(b.maxX / c) - this.x0);
    const iy1 = Math.min(this.ny - 1, Math.floor(b.maxY / c) - this.y0);
    for (let ix = ix0; ix <= ix1; ix++) {
      for (let iy = iy0; iy <= iy1; iy++) {
        const k = ix * this.ny + iy;
        if (out) out[at[k]++] = item;
        else at[k + 1]++;
      }
    }
  }

  private packedIndex(key: string): number | undefined {
    if (!this.keyIndex) {
      this.keyIndex = new Map();
      for (let i = 0; i < this.keys.length; i++) if (!this.gone[i]) this.keyIndex.set(this.keys[i], i);
    }
    return this.keyIndex.get(key);
  }

  /** Adds an item under a unique key (replacing any item with that key). */
  insert(key: string, bounds: Bounds2, item: T): void {
    this.remove(key);
    this.extra.insert(key, bounds, item);
  }

  /** Removes an item; returns false when the key was not there. */
  remove(key: string): boolean {
    const i = this.keys.length ? this.packedIndex(key) : undefined;
    if (i !== undefined) {
      this.gone[i] = 1;
      this.removedCount++;
      this.keyIndex!.delete(key);
      return true;
    }
    return this.extra.remove(key);
  }

  get(key: string): T | undefined {
    const i = this.keys.length ? this.packedIndex(key) : undefined;
    return i !== undefined ? this.items[i] : this.extra.get(key);
  }

  /** Every item whose bounds overlap `b` (bounds test only; callers do the exact test). */
  query(b: Bounds2): T[] {
    const out: T[] = [];
    if (this.keys.length) {
      const s = ++this.stamp;
      const c = this.pc;
      // Inlined cell walk: queries run thousands of times per evaluation.
      const ix0 = Math.max(0, Math.floor(b.minX / c) - this.x0);
      const iy0 = Math.max(0, Math.floor(b.minY / c) - this.y0);
      const ix1 = Math.min(this.nx - 1, Math.floor(b.maxX / c) - this.x0);
      const iy1 = Math.min(this.ny - 1, Math.floor(b.maxY / c) - this.y0);
      const { cellStart, cellItems, seen, gone, bounds } = this;
      for (let ix = ix0; ix <= ix1; ix++) {
        for (let iy = iy0; iy <= iy1; iy++) {
          const k = ix * this.ny + iy;
          for (let j = cellStart[k], end = cellStart[k + 1]; j < end; j++) {
            const i = cellItems[j];
            if (seen[i] === s || gone[i]) continue;
            seen[i] = s;
            const eb = bounds[i];
            if (eb.minX <= b.maxX && b.minX <= eb.maxX && eb.minY <= b.maxY && b.minY <= eb.maxY) out.push(this.items[i]);
          }
        }
      }
    }
    if (this.extra.size) for (const it of this.extra.query(b)) out.push(it);
    return out;
  }
}
