import { describe, it, expect } from "vitest";
import { PlanVersionError, readPlanDocument, UPGRADE_STEPS, upgradePlan } from "@/lib/engine/plan/upgrade";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "@/lib/engine/plan/schema";
import { newPlanDocument } from "@/lib/engine/plan/defaults";

/** A document in the pre-release shape: inches under room.wallsIn. */
const v0 = () => ({
  schemaVersion: 0,
  units: "ft-in",
  room: { wallsIn: [240, 264, 240, 264], ceilingIn: 108 },
  fixtures: [{ id: "bench", kind: "workbench", wallIndex: 2, offsetIn: 24, params: { topThicknessIn: 1.5 } }],
});

describe("upgradePlan", () => {
  it("has a step for every version below the current one", () => {
    for (let v = 0; v < PLAN_SCHEMA_VERSION; v++) expect(UPGRADE_STEPS[v]?.from).toBe(v);
  });

  it("brings version 0 to the current version, inches to mm (1 in = 25.4 mm, NIST SP 811 App. B)", () => {
    const input = v0();
    const before = JSON.stringify(input);
    const doc = readPlanDocument(input);
    expect(JSON.stringify(input)).toBe(before); // input untouched
    expect(doc.schemaVersion).toBe(PLAN_SCHEMA_VERSION);
    // 240 in = 6096 mm; 264 in = 6705.6 mm; 108 in = 2743.2 mm; 24 in = 609.6 mm.
    expect(doc.room.walls.map((w) => w.lengthMm)).toEqual([6096, 6705.6, 6096, 6705.6]);
    expect(doc.room.walls.map((w) => w.id)).toEqual(["w1", "w2", "w3", "w4"]);
    expect(doc.room.ceilingHeightMm).toBeCloseTo(2743.2, 9);
    expect(doc.settings.units).toBe("ft-in");
    expect(doc.fixtures[0].placement).toEqual({ mode: "wall", wallId: "w3", offsetMm: 609.6, elevationMm: 0 });
    expect(doc.fixtures[0].params).toEqual({ topThicknessIn: 1.5 });
  });

  it("versions 1 and 2 to 3: a base cabinet without a carcass height keeps the earlier 34-1/2 in (876.3 mm); given heights and other kinds stay", () => {
    const v1 = {
      schemaVersion: 1,
      room: { walls: [{ id: "a", lengthMm: 5000 }, { id: "b", lengthMm: 4000 }, { id: "c", lengthMm: 5000 }, { id: "d", lengthMm: 4000 }] },
      fixtures: [
        { id: "run", kind: "base-cabinet", placement: { mode: "wall", wallId: "a", offsetMm: 0 }, params: {} },
        { id: "tall", kind: "base-cabinet", placement: { mode: "wall", wallId: "a", offsetMm: 900 }, params: { carcassHeightMm: 900 } },
        { id: "bench", kind: "workbench", placement: { mode: "wall", wallId: "c", offsetMm: 0 }, params: {} },
      ],
    };
    const before = JSON.stringify(v1);
    const doc = readPlanDocument(v1);
    expect(JSON.stringify(v1)).toBe(before);
    expect(doc.schemaVersion).toBe(PLAN_SCHEMA_VERSION);
    expect(doc.fixtures.map((f) => f.params.carcassHeightMm)).toEqual([876.3, 900, undefined]);
    // The counter height the earlier workbench (36 in) now follows: 36 in = 914.4 mm.
    expect(doc.settings.counterHeightMm).toBeCloseTo(914.4, 9);
  });

  it("leaves a current document as it is", () => {
    const doc = newPlanDocument();
    expect(planDocumentSchema.parse(upgradePlan(doc))).toEqual(doc);
    expect(upgradePlan(doc)).not.toBe(doc);
  });

  it("refuses newer, unknown and non-plan documents with clear messages", () => {
    const err = (raw: unknown) => {
      try {
        upgradePlan(raw);
      } catch (e) {
        expect(e).toBeInstanceOf(PlanVersionError);
        return e as PlanVersionError;
      }
      throw new Error("expected a PlanVersionError");
    };
    const next = PLAN_SCHEMA_VERSION + 1;
    expect(err({ schemaVersion: next, room: {} }).code).toBe("newer-version");
    expect(err({ schemaVersion: next, room: {} }).message).toMatch(new RegExp(`newer version.*version ${next}.*up to version ${PLAN_SCHEMA_VERSION}`));
    expect(err({ schemaVersion: -1 }).code).toBe("unknown-version");
    expect(err({ schemaVersion: 1.5 }).code).toBe("unknown-version");
    expect(err({ schemaVersion: "1" }).code).toBe("unknown-version");
    expect(err({ room: {} }).code).toBe("not-a-plan");
    expect(err(null).code).toBe("not-a-plan");
    expect(err([1, 2]).code).toBe("not-a-plan");
    expect(err({ schemaVersion: 0, room: { walls: [] } }).code).toBe("bad-old-document");
    expect(err({ schemaVersion: 0, room: { wallsIn: [100, 100, 100] }, fixtures: [{ kind: "x" }] }).message).toMatch(/Fixture 1/);
  });

  it("lets zod report what is wrong after upgrading", () => {
    expect(() => readPlanDocument({ schemaVersion: 0, room: { wallsIn: [100, 100] } })).toThrow(/at least three walls/);
  });
});
