import { describe, it, expect } from "vitest";
import { parseAngle } from "@/lib/engine/units/parse-angle";

// Plain arithmetic: 1 degree = 60 minutes.
describe("parseAngle", () => {
  const good: [string, number][] = [
    ["90", 90],
    ["90.5°", 90.5],
    ["89 1/2", 89.5],
    ["89-3/4 deg", 89.75],
    ["90°30'", 90.5],
    ["270 degrees", 270],
    [" 135 ", 135],
  ];
  for (const [t, deg] of good) it(`reads ${t}`, () => expect(parseAngle(t)).toEqual({ ok: true, deg }));
  const bad: [string, RegExp][] = [
    ["", /enter an angle/i],
    ["-90", /negative/],
    ["0", /between 1° and 359°/],
    ["360", /between 1° and 359°/],
    ["90°75'", /minutes/i],
    ["right", /could not read/i],
    ["89 1/0", /0 below the slash/],
  ];
  for (const [t, m] of bad) {
    it(`rejects ${JSON.stringify(t)}`, () => {
      const r = parseAngle(t);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.message).toMatch(m);
    });
  }
});
