import { describe, it, expect } from "vitest";
import { parsePlan } from "@/lib/engine/plan/parse";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { IN } from "./helpers";

const withFixtures = (fixtures: unknown[]) => ({ ...JSON.parse(JSON.stringify(newPlanDocument())), fixtures });
const wall = (offsetMm = 0) => ({ mode: "wall", wallId: "w1", offsetMm });

describe("parsePlan", () => {
  it("accepts a plan and fills each fixture's parameter defaults", () => {
    const r = parsePlan(withFixtures([{ id: "c1", kind: "base-cabinet", placement: wall(), params: { widthMm: 24 * IN } }]));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const p = r.plan.fixtures[0].params as { widthMm: number; depthMm: number; carcassHeightMm?: number };
    expect(p.widthMm).toBeCloseTo(24 * IN, 6);
    // Kitchen convention (practice): 24 in deep; no carcass height of its own, so it follows the plan's counter height.
    expect(p.depthMm).toBeCloseTo(24 * IN, 6);
    expect(p.carcassHeightMm).toBeUndefined();
  });

  it("reports parameter problems at fixtures.N.params.field", () => {
    const r = parsePlan(withFixtures([{ id: "a", kind: "workbench", placement: wall() }, { id: "b", kind: "base-cabinet", placement: wall(), params: { widthMm: -10, sections: [{ drawerCount: 99 }] } }]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const paths = r.issues.map((i) => i.path);
    expect(paths).toContain("fixtures.1.params.widthMm");
    expect(paths).toContain("fixtures.1.params.sections.0.drawerCount");
    expect(r.issues.find((i) => i.path === "fixtures.1.params.widthMm")!.message).toMatch(/^At least 6 in \(152.4 mm\): /);
  });

  it("reports document problems with their paths", () => {
    const doc = withFixtures([]);
    doc.room.walls[0].lengthMm = -1;
    const r = parsePlan(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe("room.walls.0.lengthMm");
  });

  it("rejects unknown kinds, missing walls and duplicate ids", () => {
    const r = parsePlan(withFixtures([
      { id: "a", kind: "hovercraft", placement: wall() },
      { id: "a", kind: "workbench", placement: { mode: "wall", wallId: "w9", offsetMm: 0 } },
    ]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path).sort()).toEqual(["fixtures.0.kind", "fixtures.1.id", "fixtures.1.placement.wallId"]);
  });

  it("reports a newer or missing version at schemaVersion, and non-objects", () => {
    const newer = parsePlan({ ...withFixtures([]), schemaVersion: 99 });
    expect(newer.ok).toBe(false);
    if (!newer.ok) expect(newer.issues[0].path).toBe("schemaVersion");
    expect(parsePlan("hello").ok).toBe(false);
    expect(parsePlan(null).ok).toBe(false);
  });

  it("does not change its input", () => {
    const doc = withFixtures([{ id: "c1", kind: "base-cabinet", placement: wall() }]);
    const before = JSON.stringify(doc);
    parsePlan(doc);
    expect(JSON.stringify(doc)).toBe(before);
  });
});
