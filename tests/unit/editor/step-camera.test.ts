import { describe, it, expect } from "vitest";
import { ease, stepPointToScene } from "@/scene/step-camera";

describe("a walk-through step's saved view", () => {
  it("maps room mm (y up, z across) to the scene's metres (z up, y across)", () => {
    // 3 m along, 4 m up, 6 m across (the step schema's example view in the integration test).
    expect(stepPointToScene([3000, 4000, 6000])).toEqual([3, 6, 4]);
    expect(stepPointToScene([3000, 0, 3000])).toEqual([3, 3, 0]);
  });

  it("eases from the current view to the saved one and stops there", () => {
    expect(ease(0)).toBe(0);
    expect(ease(0.5)).toBe(0.5);
    expect(ease(1)).toBe(1);
    expect(ease(2)).toBe(1);
  });
});
