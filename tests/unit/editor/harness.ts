import type { Derived } from "@/lib/engine/derive-types";
import type { PlacedFixture } from "@/lib/engine/fixtures/types";
import { PLAN_SCHEMA_VERSION, type PlanDocument } from "@/lib/engine/plan/schema";
import type { SolvedWall } from "@/lib/engine/room/types";
import type { EnginePort } from "@/lib/client/engine-port";
import { Editor } from "@/lib/client/editor";
import type { PointerInput } from "@/lib/client/tools/types";

/**
 * A stand-in engine so the store and tools are tested on their own: the room is taken as square
 * (each wall turns 90 degrees counter-clockwise), a fixture is as wide as its `widthMm` param.
 */
function stubDerive(doc: PlanDocument): Derived {
  {
    const walls: SolvedWall[] = [];
    let at = { x: 0, y: 0 };
    let dir = { x: 1, y: 0 };
    doc.room.walls.forEach((w, index) => {
      const end = { x: at.x + dir.x * w.lengthMm, y: at.y + dir.y * w.lengthMm };
      walls.push({ id: w.id, index, start: at, end, dir, inward: { x: -dir.y, y: dir.x }, lengthMm: w.lengthMm });
      at = end;
      dir = { x: -dir.y, y: dir.x };
    });
    const fixtures: PlacedFixture[] = doc.fixtures.map((f) => {
      const widthMm = Number(f.params.widthMm ?? 600);
      return { id: f.id, kind: f.kind, label: f.label, footprint: { widthMm, depthMm: 600, heightMm: 900 }, origin: { x: 0, y: 0, z: 0 }, rotation: 0, body: { polygon: [], zMin: 0 as never, zMax: 0 as never }, boxes: [], zones: [] };
    });
    const derived: Derived = {
      room: { corners: walls.map((w) => w.start), walls, ceilingHeightMm: doc.room.ceilingHeightMm, report: { cornerAnglesDeg: [], offSquareDeg: [], diagonalDifferenceMm: null, closureErrorMm: 0, method: "assumed-square", notes: [] } },
      fixtures,
      obstacles: [],
      zones: [],
      parts: [],
      hardware: [],
    };
    return derived;
  }
}

export const stubEngine: EnginePort = {
  createAnalyser: () => (doc) => ({ derived: stubDerive(doc), findings: [] }),
  kinds: () => [
    { kind: "base", title: "Base", blurb: "A 600 mm box." },
    { kind: "wide", title: "Wide", blurb: "A 1200 mm box." },
  ],
  paramsSchema: () => undefined,
  defaultParams: (kind) => ({ widthMm: kind === "wide" ? 1200 : 600 }),
  footprint: (_kind, params) => ({ widthMm: Number(params.widthMm ?? 600), depthMm: 600, heightMm: 900 }),
  formatLength: (mm) => `${Math.round(mm * 10) / 10} mm`,
  parseLength: (text) => (Number.isFinite(Number(text)) ? { ok: true, mm: Number(text) } : { ok: false, message: "Not a number" }),
};

/** A 4 m x 3 m room, walls w1..w4. */
export function roomDoc(): PlanDocument {
  return {
    schemaVersion: PLAN_SCHEMA_VERSION,
    settings: { units: "mm", precision: 16, kerfMm: 3.175, longestStockMm: 2438.4, userHeightMm: 1755, counterHeightMm: 914.4, flushToleranceMm: 0.79375, defaultSheetMaterialId: "ply-18", presetId: null },
    room: {
      walls: [
        { id: "w1", label: "", lengthMm: 4000 },
        { id: "w2", label: "", lengthMm: 3000 },
        { id: "w3", label: "", lengthMm: 4000 },
        { id: "w4", label: "", lengthMm: 3000 },
      ],
      diagonals: [],
      cornerAnglesDeg: [],
      ceilingHeightMm: 2743,
      openings: [],
      obstacles: [],
    },
    materials: [],
    fixtures: [],
  };
}

export function makeEditor(doc = roomDoc(), engine: EnginePort = stubEngine): Editor {
  // A metric plan: grid steps 1 mm fine, 10 mm normal, 100 mm with Shift (grid-steps.ts).
  return new Editor({ doc, engine });
}

/** A pointer on wall w1 (along +x from the origin) at `x` mm, a little into the room. */
export const onW1 = (x: number): PointerInput => ({ point: { x, y: 5 }, hit: { type: "wall", wallId: "w1" } });
export const onFixture = (id: string, x: number, y = 300): PointerInput => ({ point: { x, y }, hit: { type: "fixture", id } });
export const onFloor = (x: number, y: number): PointerInput => ({ point: { x, y }, hit: { type: "floor" } });

export const key = (k: string, mods: Partial<{ ctrl: boolean; meta: boolean; shift: boolean; alt: boolean }> = {}) => ({
  key: k,
  ctrlKey: !!mods.ctrl,
  metaKey: !!mods.meta,
  shiftKey: !!mods.shift,
  altKey: !!mods.alt,
});
