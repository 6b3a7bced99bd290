import type { PlacedFixture } from "../fixtures/types";
import { DRAWN_WALL_THICKNESS_MM } from "../room/wall-frame";
import { breakpoints, chainAlong, dimension, type DimensionStyle } from "./dimensions";
import type { SheetRect } from "./text-fit";
import type { DimensionLine } from "./types";

/** A fixture on an elevation: its placed body and the sheet box of its front faces (mm, y down, floor at 0). */
export interface ElevationFixture {
  placed: PlacedFixture;
  rect: SheetRect;
}

/** Levels closer than this are one, mm (the formatter would print the same number). */
const SAME_LEVEL_MM = 0.5;
/** A fixture whose lowest box is this far above the floor hangs on the wall, mm (as the elevation's own rows). */
const OFF_FLOOR_MM = 1;
/** Box roles whose tops a person sets things on (shelf-run shelves, lumber-rack arms). */
const SURFACE_ROLES: Record<string, string> = { "shelf-run": "shelf", "lumber-rack": "arm" };
const SURFACE_WORDS: Record<string, string> = { shelf: "Shelf", arm: "Arm" };

const withNote = (d: DimensionLine, note: string): DimensionLine => ({ ...d, note });
const counterWord = (kind: string) => (kind === "workbench" ? "Bench top" : "Counter");

/** Work surfaces above the floor of fixtures standing on it (counters, benches), world mm, with the word for each. */
function counterLevels(fixtures: readonly ElevationFixture[]): { z: number; note: string }[] {
  const out: { z: number; note: string }[] = [];
  for (const f of fixtures) {
    const p = f.placed;
    if (p.kind === "tool-shelf" || p.workSurfaceMm === undefined || -f.rect.y1 > OFF_FLOOR_MM) continue;
    const z = p.origin.z + p.workSurfaceMm;
    const same = out.find((l) => Math.abs(l.z - z) < SAME_LEVEL_MM);
    const word = counterWord(p.kind);
    if (!same) out.push({ z, note: word });
    else if (!same.note.split(", ").includes(word)) same.note += `, ${word.toLowerCase()}`;
  }
  return out.sort((a, b) => a.z - b.z);
}

/** Tops of the boxes of one role, world mm, ascending and de-duplicated. */
function topsOf(p: PlacedFixture, role: string): number[] {
  const zs = p.boxes.filter((b) => b.role === role).map((b) => p.origin.z + b.z + b.h);
  return breakpoints(zs, -1, Infinity).filter((z) => Number.isFinite(z) && z > 0);
}

/**
 * The detail an elevation adds for a woodworker checking it with a tape (sheet mm): counter and
 * bench heights from the floor at the viewer's left ("levels"); a tool shelf's top and its tool's
 * table ("fixture-heights", in the bay); shelf and rack-arm heights from the floor; and the gap from
 * the counter below to each wall-hung fixture ("gaps"). Each dimension names what it measures in `note`.
 */
export function elevationLevelDimensions(fixtures: readonly ElevationFixture[], base: DimensionStyle): DimensionLine[] {
  const size = base.sizeMm;
  const out: DimensionLine[] = [];
  const left = { x: -1, y: 0 };
  const right = { x: 1, y: 0 };
  const up = { x: 0, y: -1 };
  counterLevels(fixtures).forEach((l, k) => {
    const d = dimension({ x: 0, y: 0 }, { x: 0, y: -l.z }, left, DRAWN_WALL_THICKNESS_MM + size * (1.5 + 1.6 * k), l.z, { ...base, chain: "levels" });
    // The level's name goes with its number: it stands apart from the running chains at the side.
    out.push({ ...withNote(d, `${l.note} height`), text: `${l.note} ${d.text}` });
  });

  const counters = fixtures.filter((f) => f.placed.workSurfaceMm !== undefined && -f.rect.y1 <= OFF_FLOOR_MM);
  for (const f of fixtures) {
    const p = f.placed;
    const x = f.rect.x0 + (f.rect.x1 - f.rect.x0) * 0.2;
    const style = { ...base, chain: "fixture-heights", ref: p.id };
    if (p.kind === "tool-shelf" && p.workSurfaceMm !== undefined) {
      const tool = p.boxes.find((b) => b.role === "tool");
      if (!tool) continue;
      const shelfTop = p.origin.z + tool.z;
      const table = p.origin.z + p.workSurfaceMm;
      const dims = chainAlong({ x, y: 0 }, up, right, [0, shelfTop, table], 0, style);
      out.push(withNote(dims[0], `${p.label}: shelf top from the floor`));
      if (dims[1]) out.push(withNote(dims[1], `${p.label}: ${(tool.label ?? "tool").toLowerCase()} table above the shelf`));
      continue;
    }
    const role = SURFACE_ROLES[p.kind];
    if (role) {
      const tops = topsOf(p, role);
      if (!tops.length) continue;
      const dims = chainAlong({ x, y: 0 }, up, right, [0, ...tops], 0, style);
      const word = SURFACE_WORDS[role].toLowerCase();
      dims.forEach((d, i) => out.push(withNote(d, `${p.label}: ${word} ${i + 1}, ${base.format(tops[i])} from the floor${i === 0 ? "" : ` (${d.text} above ${word} ${i})`}`)));
      continue;
    }
    const bottom = -f.rect.y1;
    if (bottom <= OFF_FLOOR_MM) continue;
    // Wall-hung: the clear gap down to the highest counter under it, else to the floor.
    let below = 0;
    let under: PlacedFixture | undefined;
    let resting = false;
    let at = (f.rect.x0 + f.rect.x1) / 2;
    for (const c of counters) {
      const lo = Math.max(c.rect.x0, f.rect.x0);
      const hi = Math.min(c.rect.x1, f.rect.x1);
      const top = c.placed.origin.z + (c.placed.workSurfaceMm ?? 0);
      if (hi - lo > 1 && Math.abs(top - bottom) <= OFF_FLOOR_MM) resting = true;
      if (hi - lo > 1 && top < bottom && top > below) {
        below = top;
        under = c.placed;
        at = (lo + hi) / 2;
      }
    }
    // What sits on a counter (a stop track) has no gap to show.
    if (resting) continue;
    const d = dimension({ x: at, y: -below }, { x: at, y: -bottom }, right, 0, bottom - below, { ...base, chain: "gaps", ref: p.id });
    out.push(withNote(d, under ? `${counterWord(under.kind)} to ${p.label}: clear gap` : `${p.label}: bottom above the floor`));
  }
  return out;
}
