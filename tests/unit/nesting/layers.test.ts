import { describe, it, expect } from "vitest";
import type { Part } from "@/lib/engine/fixtures/types";
import { layersOf, sheetGroups } from "@/lib/engine/nesting/pieces";
import { TEST_MATERIALS } from "./part-sets";

const part = (id: string, thicknessMm: number, qty = 1): Part => ({
  id: `f:${id}`, fixtureId: "f", name: id, qty, lengthMm: 700, widthMm: 50, thicknessMm, materialId: "ply-18", stock: "sheet", grain: "length", edges: [], joinery: [],
});

describe("parts thinner or thicker than their sheet", () => {
  it("counts layers: thinner parts are cut from one layer, a doubled fence takes two", () => {
    expect(layersOf(13.75, 18)).toBe(1);
    expect(layersOf(18, 18)).toBe(1);
    // 2 x 3/4 in = 38.1 mm from 18 mm plywood: two layers (the 15% allowance), not three
    expect(layersOf(38.1, 18)).toBe(2);
    expect(layersOf(54, 18)).toBe(3);
    expect(layersOf(20, undefined)).toBe(1);
  });

  it("nests them with the rest of their material instead of a sheet of a thickness nobody sells", () => {
    const groups = sheetGroups([part("side", 18, 2), part("cleat", 13.75, 3), part("fence", 38.1)], TEST_MATERIALS);
    expect(groups).toHaveLength(1);
    expect(groups[0].thicknessMm).toBe(18);
    // 2 sides + 3 cleats + 2 fence layers
    expect(groups[0].pieces).toHaveLength(7);
  });
});
