import { describe, it, expect } from "vitest";
import { z } from "zod";
import { fieldsOf, getPath, labelOf, setPath } from "@/lib/client/forms/schema-fields";

const schema = z.object({
  widthMm: z.number().positive().max(2500).default(762),
  revealMm: z.number().min(0).max(10).default(3.175),
  drawerCount: z.number().int().min(1).max(8).default(4),
  fill: z.enum(["drawers", "doors"]).default("drawers"),
  doorCount: z.union([z.literal(1), z.literal(2)]).default(1),
  back: z.boolean().default(true),
  coreMaterialId: z.string().default("mdf-19"),
  toeKick: z.object({ heightMm: z.number().positive().default(101.6) }).prefault({}),
  sections: z.array(z.object({ shelfCount: z.number().int().min(0).max(6).default(1) })).min(1).max(6).prefault([{}]),
  materials: z.object({ carcass: z.string().default("ply-18") }).prefault({}),
});

describe("fieldsOf", () => {
  it("describes each parameter with a field of the right kind", () => {
    const f = fieldsOf(schema);
    expect(f.map((x) => [x.path, x.kind])).toEqual([
      ["widthMm", "length"],
      ["revealMm", "length"],
      ["drawerCount", "number"],
      ["fill", "choice"],
      ["doorCount", "choice"],
      ["back", "toggle"],
      ["coreMaterialId", "material"],
      ["toeKick", "group"],
      ["sections", "list"],
      ["materials", "group"],
    ]);
    expect(f[0]).toMatchObject({ allowZero: false, label: "Width" });
    expect(f[1]).toMatchObject({ allowZero: true });
    expect(f[2]).toMatchObject({ int: true, min: 1, max: 8 });
    expect(f[4]).toMatchObject({ options: [{ value: 1 }, { value: 2 }] });
    expect(f[7]).toMatchObject({ fields: [{ path: "toeKick.heightMm", kind: "length" }] });
    expect(f[8]).toMatchObject({ min: 1, max: 6, item: [{ path: "shelfCount", kind: "number" }] });
    expect(f[9]).toMatchObject({ fields: [{ path: "materials.carcass", kind: "material" }] });
  });

  it("labels keys in words and reads/writes dot paths without mutating", () => {
    expect(labelOf("carcassHeightMm")).toBe("Carcass height");
    expect(labelOf("coreMaterialId")).toBe("Core material");
    const v = { a: { b: [{ c: 1 }, { c: 2 }] } };
    const w = setPath(v, "a.b.1.c", 5);
    expect(getPath(w, "a.b.1.c")).toBe(5);
    expect(getPath(v, "a.b.1.c")).toBe(2);
    expect(Array.isArray(getPath(w, "a.b"))).toBe(true);
  });
});
