import type { Bounds2 } from "../../geometry/types";

interface Entry<T> {
  key: string;
  bounds: Bounds2;
  item: T;
  stamp: number;
}

/** Cell coordinates are clamped to +/-2^13 so a cell key stays a small integer (no heap numbers, no garbage). */
const HALF = 1 << 13;
const SPAN = HALF * 2;
const clampCell = (i: number) => (i < -HALF ? -HALF : i >= HALF ? HALF - 1 : i);

/**
 * A uniform grid over floor bounds (mm). Each item sits in every cell its bounds touch; a query
 * visits only the cells it touches and reports each item once. Insert, remove and move are
 * O(cells touched), so one fixture can move without rebuilding.
 */
export class DynamicGrid<T> {
  private readonly cells = new Map<number, Entry<T>[]>();
  private readonly entries = new Map<string, Entry<T>>();
  private stamp = 0;

  /** `cellMm`: cell edge, mm; about the size of a typical item works best. */
  constructor(readonly cellMm = 600) {}

  get size(): number {
    return this.entries.size;
  }

  private cellRange(b: Bounds2): [number, number, number, number] {
    const c = this.cellMm;
    return [clampCell(Math.floor(b.minX / c)), clampCell(Math.floor(b.minY / c)), clampCell(Math.floor(b.maxX / c)), clampCell(Math.floor(b.maxY / c))];
  }

  private static cellKey(ix: number, iy: number): number {
    return (ix + HALF) * SPAN + (iy + HALF);
  }

  /** Adds an item under a unique key (replacing any item with that key). */
  insert(key: string, bounds: Bounds2, item: T): void {
    if (this.entries.has(key)) this.remove(key);
    const e: Entry<T> = { key, bounds, item, stamp: -1 };
    const [x0, y0, x1, y1] = this.cellRange(bounds);
    for (let ix = x0; ix <= x1; ix++) {
      for (let iy = y0; iy <= y1; iy++) {
        const k = DynamicGrid.cellKey(ix, iy);
        let list = this.cells.get(k);
        if (!list) {
          list = [];
          this.cells.set(k, list);
        }
        list.push(e);
      }
    }
    this.entries.set(key, e);
  }

  /** Removes an item; returns false when the key was not there. */
  remove(key: string): boolean {
    const e = this.entries.get(key);
    if (!e) return false;
    // The cells are those its bounds touched at insert (bounds are not changed after).
    const [x0, y0, x1, y1] = this.cellRange(e.bounds);
    for (let ix = x0; ix <= x1; ix++) {
      for (let iy = y0; iy <= y1; iy++) {
        const k = DynamicGrid.cellKey(ix, iy);
        const list = this.cells.get(k);
        if (!list) continue;
        const i = list.indexOf(e);
        if (i >= 0) list.splice(i, 1);
        if (!list.length) this.cells.delete(k);
      }
    }
    this.entries.delete(key);
    return true;
  }

  get(key: string): T | undefined {
    return this.entries.get(key)?.item;
  }

  /** Every item whose bounds overlap `b` (bounds test only; callers do the exact test). */
  query(b: Bounds2): T[] {
    const out: T[] = [];
    const s = ++this.stamp;
    // Inlined cell range: queries run thousands of times per evaluation.
    const c = this.cellMm;
    const x0 = clampCell(Math.floor(b.minX / c));
    const y0 = clampCell(Math.floor(b.minY / c));
    const x1 = clampCell(Math.floor(b.maxX / c));
    const y1 = clampCell(Math.floor(b.maxY / c));
    for (let ix = x0; ix <= x1; ix++) {
      for (let iy = y0; iy <= y1; iy++) {
        const list = this.cells.get(DynamicGrid.cellKey(ix, iy));
        if (!list) continue;
        for (const e of list) {
          if (e.stamp === s) continue;
          e.stamp = s;
          const eb = e.bounds;
          if (eb.minX <= b.maxX && b.minX <= eb.maxX && eb.minY <= b.maxY && b.minY <= eb.maxY) out.push(e.item);
        }
      }
    }
    return out;
  }
}
