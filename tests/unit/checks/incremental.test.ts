import { describe, expect, it } from "vitest";
import { createChecker, evaluatePlan } from "@/lib/engine/checks/evaluate";
import { GridIndex } from "@/lib/engine/checks/spatial/grid-index";
import type { Finding } from "@/lib/engine/checks/types";
import type { PlacedFixture } from "@/lib/engine/fixtures/types";
import { IN, derive, fixture, makePlan, rectRoom } from "./helpers";

/** A pseudo-random shop: counters, benches and racks scattered in a 12 x 9 m room (test data). */
function shop(n: number, seed: number): PlacedFixture[] {
  let s = seed;
  const rnd = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
  const out: PlacedFixture[] = [];
  for (let i = 0; i < n; i++) {
    const kind = ["base-cabinet", "workbench", "lumber-rack", "wall-cabinet"][i % 4];
    const wall = kind === "wall-cabinet";
    out.push(
      fixture(`f${i}`, {
        kind,
        x: rnd() * 11000,
        y: rnd() * 8000,
        z: wall ? 1371.6 : 0,
        w: 400 + rnd() * 800,
        d: 300 + rnd() * 400,
        h: wall ? 760 : 700 + rnd() * 1200,
        rot: rnd() < 0.2 ? rnd() * Math.PI * 2 : 0,
        work: kind === "base-cabinet" || kind === "workbench" ? 36 * IN : undefined,
        zones: kind === "base-cabinet" ? [{ purpose: "drawer-pull", x: 0, y: 610, z: 100, w: 400, d: 508, h: 600 }] : [],
      }),
    );
  }
  return out;
}

const key = (f: Finding) => `${f.ruleId}|${f.subjectId}|${f.pass}|${f.measured}|${f.message}`;
const keys = (fs: Finding[]) => fs.map(key).sort();

describe("incremental re-check after moving one fixture", () => {
  it("gives the same findings as a full evaluation, over many random moves", () => {
    const plan = makePlan(12000, 9000);
    const room = rectRoom(12000, 9000);
    let fx = shop(120, 7);
    const checker = createChecker(plan, derive(plan, room, fx));
    expect(keys(checker.findings())).toEqual(keys(evaluatePlan(plan, derive(plan, room, fx))));
    let s = 99;
    const rnd = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let step = 0; step < 25; step++) {
      const i = Math.floor(rnd() * fx.length);
      const f = fx[i];
      const moved = fixture(f.id, {
        kind: f.kind,
        x: f.origin.x + (rnd() - 0.5) * 2000,
        y: f.origin.y + (rnd() - 0.5) * 2000,
        z: f.origin.z,
        w: f.footprint.widthMm,
        d: f.footprint.depthMm,
        h: f.footprint.heightMm,
        rot: f.rotation,
        work: f.workSurfaceMm,
        zones: f.zones.length ? [{ purpose: "drawer-pull", x: 0, y: 610, z: 100, w: 400, d: 508, h: 600 }] : [],
      });
      fx = fx.map((x, j) => (j === i ? moved : x));
      const d = derive(plan, room, fx);
      const inc = checker.update(plan, d, [f.id]);
      const full = keys(evaluatePlan(plan, d));
      const got = keys(inc);
      if (process.env.DBG) console.log(step, got.filter((k) => !full.includes(k)), full.filter((k) => !got.includes(k)));
      expect(got).toEqual(full);
      // Only a neighbourhood is re-checked, not the whole shop.
      expect(checker.lastRechecked().size).toBeLessThan(fx.length);
    }
  });
});

describe("uniform grid index", () => {
  it("finds exactly the items whose bounds overlap a query, and forgets removed ones", () => {
    const g = new GridIndex<number>(500);
    const boxes: [number, number, number, number][] = [];
    let s = 3;
    const rnd = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let i = 0; i < 300; i++) {
      const x = rnd() * 10000 - 2000;
      const y = rnd() * 10000 - 2000;
      boxes.push([x, y, x + rnd() * 1500, y + rnd() * 1500]);
      g.insert(`b${i}`, { minX: boxes[i][0], minY: boxes[i][1], maxX: boxes[i][2], maxY: boxes[i][3] }, i);
    }
    for (let i = 0; i < 100; i += 3) g.remove(`b${i}`);
    for (let q = 0; q < 50; q++) {
      const x = rnd() * 10000 - 2000;
      const y = rnd() * 10000 - 2000;
      const qb = { minX: x, minY: y, maxX: x + 800, maxY: y + 800 };
      const brute = boxes
        .map((b, i) => [b, i] as const)
        .filter(([b, i]) => !(i < 100 && i % 3 === 0) && b[0] <= qb.maxX && qb.minX <= b[2] && b[1] <= qb.maxY && qb.minY <= b[3])
        .map(([, i]) => i)
        .sort((a, b) => a - b);
      expect(g.query(qb).sort((a, b) => a - b)).toEqual(brute);
    }
    expect(g.size).toBe(300 - 34);
  });

  it("a packed build answers like a brute-force scan, through removals, re-inserts and far-off items", () => {
    let s = 11;
    const rnd = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648);
    const boxes = new Map<string, { minX: number; minY: number; maxX: number; maxY: number }>();
    for (let i = 0; i < 400; i++) {
      const x = rnd() * 20000 - 5000;
      const y = rnd() * 20000 - 5000;
      boxes.set(`b${i}`, { minX: x, minY: y, maxX: x + rnd() * 2500, maxY: y + rnd() * 2500 });
    }
    // An item a kilometre away must not blow the packed arrays up, and still be found.
    boxes.set("far", { minX: 1e6, minY: 1e6, maxX: 1e6 + 500, maxY: 1e6 + 500 });
    const g = GridIndex.build([...boxes.keys()], [...boxes.values()], [...boxes.keys()], 1000);
    expect(g.size).toBe(401);
    expect(g.get("b7")).toBe("b7");
    for (let i = 0; i < 400; i += 5) {
      g.remove(`b${i}`);
      boxes.delete(`b${i}`);
    }
    // Moved items come back under the same key at new bounds.
    for (let i = 1; i < 400; i += 7) {
      const x = rnd() * 20000 - 5000;
      const b = { minX: x, minY: x, maxX: x + 900, maxY: x + 900 };
      g.insert(`b${i}`, b, `b${i}`);
      boxes.set(`b${i}`, b);
    }
    expect(g.size).toBe(boxes.size);
    const probes = [{ minX: 1e6 - 10, minY: 1e6 - 10, maxX: 1e6 + 10, maxY: 1e6 + 10 }];
    for (let q = 0; q < 80; q++) {
      const x = rnd() * 22000 - 6000;
      const y = rnd() * 22000 - 6000;
      probes.push({ minX: x, minY: y, maxX: x + rnd() * 3000, maxY: y + rnd() * 3000 });
    }
    for (const qb of probes) {
      const brute = [...boxes].filter(([, b]) => b.minX <= qb.maxX && qb.minX <= b.maxX && b.minY <= qb.maxY && qb.minY <= b.maxY).map(([k]) => k).sort();
      expect(g.query(qb).sort()).toEqual(brute);
    }
    expect(g.query(probes[0])).toEqual(["far"]);
  });

  it("items without finite bounds (an empty outline) are kept and do not break the packed grid", () => {
    const g = GridIndex.build(["a", "empty", "b"], [{ minX: 0, minY: 0, maxX: 10, maxY: 10 }, { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity }, { minX: 500, minY: 500, maxX: 600, maxY: 600 }], ["a", "empty", "b"], 100);
    expect(g.size).toBe(3);
    expect(g.query({ minX: -5, minY: -5, maxX: 550, maxY: 550 }).sort()).toEqual(["a", "b"]);
    expect(g.get("empty")).toBe("empty");
  });
});
