/**
 * One guillotine packing pass. Free space is kept as disjoint rectangles; placing a piece at the
 * corner of a free rectangle splits the rest with one edge-to-edge cut, so every layout this
 * produces can be cut on a table saw. Kerf is left between a piece and the space beside it.
 * Coordinates are in the usable area of the stock (trim already removed), mm.
 */

export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A piece for the packer: `len` along the sheet's length when not rotated. */
export interface PackItem {
  id: number;
  len: number;
  wid: number;
  /** 0: must lie with its length along x; 1: must lie rotated; 2: either way. */
  mode: 0 | 1 | 2;
}

/** Usable size of a kind of stock and how many may be used. */
export interface PackStock {
  len: number;
  wid: number;
  qty: number;
}

export interface PackedItem extends Rect {
  id: number;
  rotated: boolean;
}

export interface PackedSheet {
  stock: number;
  items: PackedItem[];
  free: Rect[];
  area: number;
}

export type ScoreRule = "area" | "short" | "long" | "corner";
export type SplitRule = "shorter-leftover" | "longer-leftover" | "min-area" | "max-area" | "rip" | "crosscut";

export interface PackOutcome {
  sheets: PackedSheet[];
  /** Items that fit no stock left. */
  leftover: number[];
}

const EPS = 1e-6;

/** Steps charged to a packing pass: one per free rectangle tested. Returning false aborts the pass. */
export type Charge = (steps: number) => boolean;
const FREE: Charge = () => true;

function score(rule: ScoreRule, f: Rect, w: number, h: number): number {
  switch (rule) {
    case "area":
      return f.w * f.h - w * h + Math.min(f.w - w, f.h - h) * 1e-6;
    case "short":
      return Math.min(f.w - w, f.h - h) * 1e6 + Math.max(f.w - w, f.h - h);
    case "long":
      return Math.max(f.w - w, f.h - h) * 1e6 + Math.min(f.w - w, f.h - h);
    case "corner":
      return f.y * 1e6 + f.x;
  }
}

function splitsAlongLength(rule: SplitRule, f: Rect, w: number, h: number): boolean {
  const lw = f.w - w;
  const lh = f.h - h;
  switch (rule) {
    case "shorter-leftover":
      return lw <= lh;
    case "longer-leftover":
      return lw > lh;
    case "min-area":
      return w * lh > lw * h;
    case "max-area":
      return w * lh <= lw * h;
    case "rip":
      return true;
    case "crosscut":
      return false;
  }
}

/** Place w x h at the corner of free rect `fi` of the sheet and split the rest of that rect. */
function place(sheet: PackedSheet, fi: number, item: PackItem, rotated: boolean, kerf: number, split: SplitRule, minSide: number): void {
  const f = sheet.free[fi];
  const w = rotated ? item.wid : item.len;
  const h = rotated ? item.len : item.wid;
  sheet.items.push({ id: item.id, x: f.x, y: f.y, w, h, rotated });
  sheet.area += w * h;
  const rw = f.w - w - kerf;
  const th = f.h - h - kerf;
  // A rip across the whole free rect leaves a strip beside the piece and a full-length rect above it.
  const along = splitsAlongLength(split, f, w, h);
  const right: Rect = { x: f.x + w + kerf, y: f.y, w: rw, h: along ? h : f.h };
  const top: Rect = { x: f.x, y: f.y + h + kerf, w: along ? f.w : w, h: th };
  sheet.free.splice(fi, 1);
  if (right.w >= minSide - EPS && right.h >= minSide - EPS) sheet.free.push(right);
  if (top.w >= minSide - EPS && top.h >= minSide - EPS) sheet.free.push(top);
}

function fitsStock(item: PackItem, s: PackStock): boolean {
  const a = item.mode !== 1 && item.len <= s.len + EPS && item.wid <= s.wid + EPS;
  const b = item.mode !== 0 && item.wid <= s.len + EPS && item.len <= s.wid + EPS;
  return a || b;
}

function openSheet(stocks: PackStock[], used: number[], fits: (s: PackStock) => boolean): PackedSheet | null {
  for (let i = 0; i < stocks.length; i++) {
    if (used[i] < stocks[i].qty && fits(stocks[i])) {
      used[i]++;
      return { stock: i, items: [], free: [{ x: 0, y: 0, w: stocks[i].len, h: stocks[i].wid }], area: 0 };
    }
  }
  return null;
}

interface Best {
  fi: number;
  rotated: boolean;
  s: number;
}

function bestRect(sheet: PackedSheet, item: PackItem, rule: ScoreRule, into: Best): boolean {
  let found = false;
  for (let fi = 0; fi < sheet.free.length; fi++) {
    const f = sheet.free[fi];
    if (item.mode !== 1 && item.len <= f.w + EPS && item.wid <= f.h + EPS) {
      const s = score(rule, f, item.len, item.wid);
      if (s < into.s) {
        into.s = s;
        into.fi = fi;
        into.rotated = false;
        found = true;
      }
    }
    if (item.mode !== 0 && item.wid <= f.w + EPS && item.len <= f.h + EPS) {
      const s = score(rule, f, item.wid, item.len);
      if (s < into.s) {
        into.s = s;
        into.fi = fi;
        into.rotated = true;
        found = true;
      }
    }
  }
  return found;
}

/**
 * Items in the given order, each into the best free rect of the open sheets (the last `window` of
 * them; all by default); a new sheet when none fits. Null when `charge` aborts the pass.
 */
export function packOrdered(items: PackItem[], stocks: PackStock[], kerf: number, rule: ScoreRule, split: SplitRule, charge: Charge = FREE, window = Infinity): PackOutcome | null {
  const minSide = items.reduce((m, it) => Math.min(m, it.len, it.wid), Infinity);
  const used = stocks.map(() => 0);
  const sheets: PackedSheet[] = [];
  const leftover: number[] = [];
  const best: Best = { fi: -1, rotated: false, s: Infinity };
  for (const item of items) {
    let target: PackedSheet | null = null;
    best.s = Infinity;
    for (let k = Math.max(0, sheets.length - window); k < sheets.length; k++) {
      const sh = sheets[k];
      if (!charge(sh.free.length + 1)) return null;
      const prev = best.s;
      if (bestRect(sh, item, rule, best) && best.s < prev) target = sh;
    }
    if (!target) {
      target = openSheet(stocks, used, (s) => fitsStock(item, s));
      if (!target) {
        leftover.push(item.id);
        continue;
      }
      sheets.push(target);
      best.s = Infinity;
      bestRect(target, item, rule, best);
    }
    place(target, best.fi, item, best.rotated, kerf, split, minSide);
  }
  return { sheets, leftover };
}

/**
 * One sheet at a time: repeatedly place the (piece, free rect) pair that fits best, until nothing
 * fits, then open the next sheet. Identical pieces are grouped so the scan stays cheap. Null when
 * `charge` aborts the pass.
 */
export function packGlobal(items: PackItem[], stocks: PackStock[], kerf: number, rule: ScoreRule, split: SplitRule, charge: Charge = FREE): PackOutcome | null {
  const minSide = items.reduce((m, it) => Math.min(m, it.len, it.wid), Infinity);
  const groups: { item: PackItem; ids: number[] }[] = [];
  const byKey = new Map<string, number>();
  for (const it of items) {
    const key = `${it.len}|${it.wid}|${it.mode}`;
    const g = byKey.get(key);
    if (g === undefined) {
      byKey.set(key, groups.length);
      groups.push({ item: it, ids: [it.id] });
    } else groups[g].ids.push(it.id);
  }
  for (const g of groups) g.ids.reverse(); // pop() then yields ids in input order
  let remaining = items.length;
  const used = stocks.map(() => 0);
  const sheets: PackedSheet[] = [];
  const leftover: number[] = [];
  const best: Best = { fi: -1, rotated: false, s: Infinity };
  while (remaining > 0) {
    if (!charge(groups.length)) return null;
    const sheet = openSheet(stocks, used, (s) => groups.some((g) => g.ids.length > 0 && fitsStock(g.item, s)));
    if (!sheet) break;
    sheets.push(sheet);
    for (;;) {
      let bestGroup = -1;
      let bf = -1;
      let br = false;
      best.s = Infinity;
      for (let gi = 0; gi < groups.length; gi++) {
        const g = groups[gi];
        if (g.ids.length === 0) continue;
        if (!charge(sheet.free.length + 1)) return null;
        const prev = best.s;
        if (bestRect(sheet, g.item, rule, best) && best.s < prev) {
          bestGroup = gi;
          bf = best.fi;
          br = best.rotated;
        }
      }
      if (bestGroup < 0) break;
      const g = groups[bestGroup];
      const id = g.ids.pop() as number;
      place(sheet, bf, { ...g.item, id }, br, kerf, split, minSide);
      remaining--;
    }
    if (sheet.items.length === 0) {
      sheets.pop();
      break;
    }
  }
  for (const g of groups) leftover.push(...g.ids);
  return { sheets, leftover };
}
