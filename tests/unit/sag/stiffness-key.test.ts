import { describe, expect, it } from "vitest";
import type { Material } from "@/lib/engine/plan/schema";
import { stiffnessKeyFor } from "@/lib/engine/sag/stiffness-key";

const mat = (id: string, name: string, species?: string): Material => ({ id, name, form: "board", thicknessMm: 19, species });

// Which stiffness row a material reads decides its sag (MOE from USDA FPL Wood Handbook Table 5-3b,
// ANSI A208.1/A208.2 for panels): the shelf-run fixture and the shelf-sag check share this one reading.
describe("stiffness key of a plan material", () => {
  it("takes the species when the table knows it, as written or with spaces as dashes", () => {
    expect(stiffnessKeyFor("oak-19", [mat("oak-19", "Oak board", "white-oak")])).toBe("white-oak");
    expect(stiffnessKeyFor("oak-19", [mat("oak-19", "Oak board", "Northern Red Oak")])).toBe("northern-red-oak");
  });

  it("guesses from the id and name when the species is missing or unknown", () => {
    expect(stiffnessKeyFor("wo-19", [mat("wo-19", "White oak board, 3/4 in")])).toBe("white-oak");
    expect(stiffnessKeyFor("mdf-19", [])).toBe("mdf-130");
    expect(stiffnessKeyFor("pb-16", [])).toBe("particleboard-m2");
    expect(stiffnessKeyFor("x", [mat("x", "Hard maple", "something-rare")])).toBe("sugar-maple");
  });

  it("falls back to plywood when nothing matches", () => {
    expect(stiffnessKeyFor("mystery", [mat("mystery", "Reclaimed shelf board")])).toBe("plywood");
  });
});
