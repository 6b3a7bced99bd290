import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DEFAULT_MATERIALS, newPlanDocument } from "@/lib/engine/plan/defaults";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "@/lib/engine/plan/schema";
import { planJsonSchema } from "@/lib/engine/plan/json-schema";
import { readPlanDocument } from "@/lib/engine/plan/upgrade";
import { solveRoom } from "@/lib/engine/room/solve";

describe("newPlanDocument", () => {
  it("is a valid empty 6.1 x 6.7 m garage with the default stock", () => {
    const doc = newPlanDocument();
    expect(planDocumentSchema.parse(doc)).toEqual(doc);
    expect(doc.room.walls.map((w) => w.lengthMm)).toEqual([6100, 6700, 6100, 6700]);
    expect(doc.fixtures).toEqual([]);
    expect(doc.materials.map((m) => m.id)).toEqual(["ply-18", "ply-12", "ply-6", "mdf-19", "poplar-19", "maple-19", "hardwood-19", "mdf-12", "pegboard-6", "lumber-2x"]);
    const room = solveRoom(doc.room);
    expect(room.report.closureErrorMm).toBeCloseTo(0, 9);
    expect(room.areaMm2).toBeCloseTo(6100 * 6700, 0);
  });

  it("returns a fresh copy each time", () => {
    const a = newPlanDocument();
    a.materials[0].thicknessMm = 1;
    expect(newPlanDocument().materials[0].thicknessMm).toBe(18);
    expect(DEFAULT_MATERIALS[0].thicknessMm).toBe(18);
  });

  it("uses the trade's actual thicknesses and sheet size", () => {
    const by = (id: string) => DEFAULT_MATERIALS.find((m) => m.id === id)!;
    // Nominal 3/4 in hardwood plywood is about 23/32 in = 18.26 mm, sold as 18 mm (HPVA HP-1; practice).
    expect(Math.abs(by("ply-18").thicknessMm - (23 / 32) * 25.4)).toBeLessThan(0.5);
    // Sheets 48 x 96 in = 1219.2 x 2438.4 mm, sold as 1220 x 2440 (practice).
    expect(by("ply-18").sheetWidthMm! - 48 * 25.4).toBeLessThan(1);
    expect(by("ply-18").sheetLengthMm! - 96 * 25.4).toBeLessThan(2);
    // MDF is made to its stated thickness, +/-0.005 in (ANSI A208.2): 3/4 in = 19.05 mm.
    expect(Math.abs(by("mdf-19").thicknessMm - 19.05)).toBeLessThanOrEqual(0.005 * 25.4);
    expect(by("poplar-19").form).toBe("board");
    expect(by("maple-19").thicknessMm).toBe(19);
  });
});

describe("planJsonSchema", () => {
  const schema = planJsonSchema() as { $schema: string; title: string; required: string[]; properties: Record<string, { required?: string[]; properties?: Record<string, unknown> }> };
  it("describes the input shape: defaulted fields optional", () => {
    expect(schema.$schema).toMatch(/2020-12/);
    expect(schema.title).toMatch(new RegExp(`version ${PLAN_SCHEMA_VERSION}`));
    expect(schema.required.sort()).toEqual(["room", "schemaVersion"]);
    expect(schema.properties.room.required).toEqual(["walls"]);
    expect(Object.keys(schema.properties.settings.properties ?? {})).toContain("elbowHeightMm");
  });
  it("is plain JSON", () => {
    expect(JSON.parse(JSON.stringify(schema))).toEqual(schema);
  });
});

describe("docs/plan-format.md", () => {
  const md = readFileSync(join(process.cwd(), "docs", "plan-format.md"), "utf8");
  const example = /```json\n([\s\S]*?)\n```/.exec(md);
  it("holds a complete example that reads as a valid plan", () => {
    expect(example).not.toBeNull();
    const doc = readPlanDocument(JSON.parse(example![1]));
    expect(doc.room.walls).toHaveLength(4);
    expect(doc.fixtures.length).toBeGreaterThan(0);
    // The example's three fixtures meet end to end: 400 + 1219.2 = 1619.2; 1619.2 + 812.8 = 2432.
    const at = (id: string) => doc.fixtures.find((f) => f.id === id)!.placement;
    expect(at("saw-bay")).toMatchObject({ offsetMm: 1619.2 });
    expect(at("cab-left")).toMatchObject({ offsetMm: 2432 });
    // Its measured diagonal must fit the walls, so the shape comes from it.
    expect(solveRoom(doc.room).report.method).toBe("diagonals");
  });
  it("documents every top-level, settings and room field", () => {
    const shape = planDocumentSchema.shape;
    const fields = [...Object.keys(shape), ...Object.keys(shape.settings.unwrap().shape), ...Object.keys(shape.room.shape)];
    for (const f of fields) expect(md).toContain("`" + f);
  });
});

describe("planJsonSchema descriptions", () => {
  it("carries the top-level field descriptions", () => {
    const props = (planJsonSchema() as { properties: Record<string, { description?: string }> }).properties;
    for (const k of ["schemaVersion", "settings", "room", "materials", "fixtures"]) expect(props[k].description).toBeTruthy();
    expect(props.room.description).toMatch(/mm/);
  });
});
