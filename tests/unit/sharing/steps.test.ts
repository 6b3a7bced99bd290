import { describe, it, expect } from "vitest";
import { stepForKey } from "@/components/teaching/steps";

describe("presentation keys", () => {
  it("moves one step with the arrows and stops at the ends", () => {
    expect(stepForKey("ArrowRight", 0, 3)).toBe(1);
    expect(stepForKey("ArrowRight", 2, 3)).toBe(2);
    expect(stepForKey("ArrowLeft", 0, 3)).toBe(0);
    expect(stepForKey("PageDown", 1, 3)).toBe(2);
    expect(stepForKey(" ", 0, 3)).toBe(1);
  });
  it("jumps with Home and End, ignores other keys", () => {
    expect(stepForKey("End", 0, 5)).toBe(4);
    expect(stepForKey("Home", 4, 5)).toBe(0);
    expect(stepForKey("a", 1, 5)).toBeNull();
    expect(stepForKey("End", 0, 0)).toBe(0);
  });
});
