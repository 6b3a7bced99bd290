import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { derivePlan } from "@/lib/engine/derive";
import { toolPlacement, toolShelfParamsSchema } from "@/lib/engine/fixtures/tool-shelf/params";
import { readPlanDocument, upgradePlan } from "@/lib/engine/plan/upgrade";
import { wallFrame, worldToWall } from "@/lib/engine/room/wall-frame";

const IN = 25.4;
const walls = [{ id: "w1", lengthMm: 6000 }, { id: "w2", lengthMm: 5000 }, { id: "w3", lengthMm: 6000 }, { id: "w4", lengthMm: 5000 }];
const onWall = (wallId: string, offsetMm: number, elevationMm = 0) => ({ mode: "wall", wallId, offsetMm, elevationMm });

/** A version 1 document: "left" then meant toward the wall's start corner. */
function v1(fixtures: unknown[], openings: unknown[] = []) {
  return { schemaVersion: 1, room: { walls, openings }, fixtures };
}

describe("plan version 1 to 2: left and right as seen facing the wall", () => {
  it("flips a door's hinge so its swing turns about the same jamb (absent meant left)", () => {
    const old = v1([], [
      { id: "d1", kind: "entry-door", wallId: "w1", offsetMm: 1000, widthMm: 900, hinge: "left", swing: "in" },
      { id: "d2", kind: "entry-door", wallId: "w1", offsetMm: 3000, widthMm: 900 },
      { id: "d3", kind: "entry-door", wallId: "w1", offsetMm: 4500, widthMm: 900, hinge: "right" },
    ]);
    const doc = readPlanDocument(old);
    expect(doc.room.openings.map((o) => (o.kind === "entry-door" ? o.hinge : null))).toEqual(["right", "right", "left"]);
    // In version 1 a left hinge stood at the door's start-corner jamb: the swing's first point is that jamb.
    const d = derivePlan(doc);
    const frame = wallFrame(d.room, "w1")!;
    const jamb = (id: string) => worldToWall(frame, d.zones.find((z) => z.id === `${id}:swing`)!.prism.polygon[0]).offsetAlongMm;
    expect(jamb("d1")).toBeCloseTo(1000, 6);
    expect(jamb("d2")).toBeCloseTo(3000, 6);
    expect(jamb("d3")).toBeCloseTo(4500 + 900, 6);
  });

  it("attaches a track to the one saw on its wall, on the side where it stands, and keeps it there", () => {
    // The version 1 demo layout: saw bay at 1362 mm, the track from the bay's far end with its start typed.
    const sawAt = 600 + 30 * IN;
    const shelf = toolShelfParamsSchema.parse({ preset: "compact-miter-saw", widthMm: 32 * IN });
    const bladeAt = sawAt + toolPlacement(shelf).bladeX;
    const rightAt = sawAt + 32 * IN;
    const old = v1([
      { id: "c1", kind: "base-cabinet", placement: onWall("w3", 600), params: {} },
      { id: "saw", kind: "tool-shelf", placement: onWall("w3", sawAt), params: { preset: "compact-miter-saw", widthMm: 32 * IN } },
      { id: "c2", kind: "base-cabinet", placement: onWall("w3", rightAt), params: {} },
      { id: "c3", kind: "base-cabinet", placement: onWall("w3", rightAt + 30 * IN), params: {} },
      { id: "t", kind: "stop-track", placement: onWall("w3", rightAt, 909.25), params: { side: "right", startFromBladeMm: rightAt - bladeAt, cutLengthsMm: [24 * IN] } },
    ]);
    const doc = readPlanDocument(old);
    const t = doc.fixtures.find((f) => f.id === "t")!;
    expect(t.params).toMatchObject({ sawId: "saw", side: "left", startFromBladeMm: rightAt - bladeAt });
    const d = derivePlan(doc);
    const placed = d.fixtures.find((f) => f.id === "t")!;
    expect(placed.track!.attached).toBe(true);
    const p = placed.track!.placement;
    expect(p.mode === "wall" && p.offsetMm).toBeCloseTo(rightAt, 6);
    expect(evaluatePlan(doc, d).find((f) => f.ruleId === "stop-track-attached")!.pass).toBe(true);
  });

  it("flips an absent side (it meant right) and keeps the old default start of 2 in", () => {
    const doc = upgradePlan(v1([{ id: "t", kind: "stop-track", placement: { mode: "free", xMm: 100, yMm: 100 }, params: {} }]));
    expect((doc.fixtures as { params: Record<string, unknown> }[])[0].params).toEqual({ side: "left", startFromBladeMm: 2 * IN, sawId: null });
  });

  it("leaves a track detached when two saws on its wall are equally near, or none is on its wall", () => {
    const old = v1([
      { id: "a", kind: "tool-shelf", placement: onWall("w1", 500), params: { widthMm: 800 } },
      { id: "b", kind: "tool-shelf", placement: onWall("w1", 3700), params: { widthMm: 800 } },
      { id: "t", kind: "stop-track", placement: onWall("w1", 2000), params: { lengthMm: 1000 } },
      { id: "u", kind: "stop-track", placement: onWall("w2", 1000), params: {} },
    ]);
    const doc = readPlanDocument(old);
    for (const id of ["t", "u"]) expect(doc.fixtures.find((f) => f.id === id)!.params.sawId).toBeNull();
    const f = evaluatePlan(doc, derivePlan(doc)).filter((x) => x.ruleId === "stop-track-attached");
    expect(f.map((x) => x.pass)).toEqual([false, false]);
  });

  it("keeps a tool's blade and offset where they were: both now count from the left as you face the tool", () => {
    // A 20 in compact saw, blade 7 in from its start-corner edge, its edge 2 in from the bay's start end, 32 in bay.
    const old = v1([{ id: "s", kind: "tool-shelf", placement: onWall("w1", 1000), params: { preset: "compact-miter-saw", widthMm: 32 * IN, toolOffsetXMm: 2 * IN, tool: { bladeXMm: 7 * IN } } }]);
    const doc = readPlanDocument(old);
    const p = toolShelfParamsSchema.parse(doc.fixtures[0].params);
    expect(p.tool.bladeXMm).toBeCloseTo(13 * IN, 9);
    expect(p.toolOffsetXMm).toBeCloseTo(10 * IN, 9);
    const pos = toolPlacement(p);
    expect(pos.x).toBeCloseTo(2 * IN, 9);
    expect(pos.bladeX).toBeCloseTo(9 * IN, 9);
  });

  it("keeps a table saw's blade where it was", () => {
    const doc = readPlanDocument(v1([{ id: "m", kind: "mobile-base", placement: { mode: "free", xMm: 2000, yMm: 2000 }, params: { bladeFromLeftMm: 10 * IN } }]));
    // 40 in table (the default): 10 in from the start-corner edge is 30 in from the left edge.
    expect(doc.fixtures[0].params.bladeFromLeftMm).toBeCloseTo(30 * IN, 9);
  });
});
