/** Independent checks of a sheet layout, written apart from the nester so they can catch its bugs. */
import type { SheetLayout } from "@/lib/engine/nesting/types";

const EPS = 1e-6;

interface R {
  x: number;
  y: number;
  w: number;
  h: number;
}

export function rects(s: SheetLayout): R[] {
  return s.placements.map((p) => ({ x: p.xMm, y: p.yMm, w: p.lenMm, h: p.widMm }));
}

/** Problems found: pieces outside the usable area, or closer than a kerf to each other. */
export function layoutProblems(s: SheetLayout, kerf: number): string[] {
  const out: string[] = [];
  const u = s.usable;
  if (u.xMm < -EPS || u.yMm < -EPS || u.xMm + u.lenMm > s.lengthMm + EPS || u.yMm + u.widMm > s.widthMm + EPS) out.push("usable area outside the sheet");
  for (const p of s.placements) {
    if (p.xMm < u.xMm - EPS || p.yMm < u.yMm - EPS || p.xMm + p.lenMm > u.xMm + u.lenMm + EPS || p.yMm + p.widMm > u.yMm + u.widMm + EPS) out.push(`${p.pieceKey} outside usable area`);
  }
  const rs = rects(s);
  for (let i = 0; i < rs.length; i++)
    for (let j = i + 1; j < rs.length; j++) {
      const a = rs[i];
      const b = rs[j];
      const apart = a.x + a.w + kerf <= b.x + EPS || b.x + b.w + kerf <= a.x + EPS || a.y + a.h + kerf <= b.y + EPS || b.y + b.h + kerf <= a.y + EPS;
      if (!apart) out.push(`${s.placements[i].pieceKey} and ${s.placements[j].pieceKey} closer than a kerf`);
    }
  return out;
}

/** True when the pieces in the box can be freed by edge-to-edge cuts, tried at every piece edge. */
export function isGuillotine(box: R, items: R[], kerf: number): boolean {
  if (items.length <= 1) return true;
  for (const vertical of [false, true]) {
    const edges = new Set(items.map((r) => (vertical ? r.x + r.w : r.y + r.h)));
    for (const c of edges) {
      const before = items.filter((r) => (vertical ? r.x + r.w : r.y + r.h) <= c + EPS);
      const after = items.filter((r) => (vertical ? r.x : r.y) >= c + kerf - EPS);
      if (before.length === 0 || after.length === 0 || before.length + after.length !== items.length) continue;
      const b1: R = vertical ? { ...box, w: c - box.x } : { ...box, h: c - box.y };
      const b2: R = vertical ? { ...box, x: c + kerf, w: box.x + box.w - c - kerf } : { ...box, y: c + kerf, h: box.y + box.h - c - kerf };
      return isGuillotine(b1, before, kerf) && isGuillotine(b2, after, kerf);
    }
  }
  return false;
}
