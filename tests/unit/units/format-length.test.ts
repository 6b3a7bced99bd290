import { describe, it, expect } from "vitest";
import fc from "fast-check";
import Fraction from "fraction.js";
import { displayStepMm, formatArea, formatLength, formatLengthPerLength, formatMmNumber } from "@/lib/engine/units/format-length";
import { parseLength } from "@/lib/engine/units/parse-length";
import { roundToFraction } from "@/lib/engine/units/fraction";
import type { InchPrecision, LengthUnits } from "@/lib/engine/units/length";

// All expected strings below are worked by hand from 1 in = 25.4 mm (NIST SP 811, App. B).
describe("formatLength", () => {
  it("writes reduced inch fractions", () => {
    expect(formatLength(606.425, { units: "in" })).toBe(`23 7/8"`);
    expect(formatLength(22.225, { units: "in" })).toBe(`7/8"`);
    expect(formatLength(12.7, { units: "in" })).toBe(`1/2"`);
    expect(formatLength(609.6, { units: "in" })).toBe(`24"`);
    expect(formatLength(0, { units: "in" })).toBe(`0"`);
    // 1/32 in = 0.79375 mm.
    expect(formatLength(0.79375, { units: "in", precision: 32 })).toBe(`1/32"`);
    expect(formatLength(25.4 * (3 + 5 / 32), { units: "in", precision: 32 })).toBe(`3 5/32"`);
  });

  it("carries when the fraction rounds up to a whole inch", () => {
    // 23 31/32 in is 1/32 short of 24 in: at 1/16 precision it rounds to 24 (half a step, rounds up).
    expect(formatLength(25.4 * (23 + 31 / 32), { units: "in", precision: 16 })).toBe(`24"`);
    // 23 15/16 + a hair under 1/32 in rounds to 23 15/16 at 1/16, but 23.99 in rounds to 24.
    expect(formatLength(25.4 * 23.99, { units: "in", precision: 16 })).toBe(`24"`);
    expect(formatLength(25.4 * 23.95, { units: "in", precision: 16 })).toBe(`23 15/16"`);
  });

  it("writes feet and inches, carrying into feet", () => {
    expect(formatLength(698.5, { units: "ft-in" })).toBe(`2' 3 1/2"`);
    expect(formatLength(609.6, { units: "ft-in" })).toBe(`2' 0"`);
    expect(formatLength(25.4 * 23.99, { units: "ft-in" })).toBe(`2' 0"`);
    expect(formatLength(25.4 * 11.5, { units: "ft-in" })).toBe(`11 1/2"`);
    // 6100 / 25.4 = 240.1575 in; x16 = 3842.5 steps -> 3843 = 240 3/16 in = 20 ft 0 3/16 in.
    expect(formatLength(6100, { units: "ft-in" })).toBe(`20' 0 3/16"`);
  });

  it("writes millimetres with at most one decimal and no trailing zeros", () => {
    expect(formatLength(606.425, { units: "mm" })).toBe("606.4 mm");
    expect(formatLength(609.6, { units: "mm" })).toBe("609.6 mm");
    expect(formatLength(600.04, { units: "mm" })).toBe("600 mm");
    expect(formatLength(18, { units: "mm", unitMark: false })).toBe("18");
    expect(formatMmNumber(100)).toBe("100");
  });

  it("formats areas and rates", () => {
    // 6100 x 6700 mm = 40.87 m^2 = 439.9 sq ft (1 sq ft = 0.09290304 m^2 exactly, NIST SP 811 App. B).
    expect(formatArea(6100 * 6700, { units: "mm" })).toBe("40.87 m²");
    expect(formatArea(6100 * 6700, { units: "in" })).toBe("439.9 sq ft");
    // 0.02 in per foot of span (shelf sag practice, TRADE.md) = 0.02/12 mm per mm = 1.7 mm/m.
    expect(formatLengthPerLength(0.02 / 12, { units: "in" })).toBe("0.02 in/ft");
    expect(formatLengthPerLength(0.02 / 12, { units: "mm" })).toBe("1.7 mm/m");
  });
});

describe("roundToFraction agrees with fraction.js", () => {
  // Reference library: fraction.js does exact rational arithmetic; its reduced form must equal ours.
  it("reduces like an exact rational", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), fc.constantFrom(16, 32), (steps, den) => {
        const m = roundToFraction(steps / den, den);
        const exact = new Fraction(steps, den);
        expect(m.whole * m.den + m.num).toBe(Number(exact.n) * (m.den / Number(exact.d)));
        if (m.num !== 0) expect(`${m.num}/${m.den}`).toBe(new Fraction(m.num, m.den).toFraction());
      }),
    );
  });
});

describe("format then parse lands within half a display step", () => {
  const units = fc.constantFrom<LengthUnits>("in", "ft-in", "mm");
  const precision = fc.constantFrom<InchPrecision>(16, 32);
  it("round-trips", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 99_000, noNaN: true }), units, precision, (valueMm, u, p) => {
        const text = formatLength(valueMm, { units: u, precision: p });
        // Lengths under half a step show as 0, so zero must be accepted here.
        const back = parseLength(text, { units: u, allowZero: true });
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.mm - valueMm)).toBeLessThanOrEqual(displayStepMm({ units: u, precision: p }) / 2 + 1e-9);
      }),
      { numRuns: 2000 },
    );
  });
  it("round-trips without unit marks in the user's own units", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 99_000, noNaN: true }), fc.constantFrom<LengthUnits>("in", "mm"), precision, (valueMm, u, p) => {
        const text = formatLength(valueMm, { units: u, precision: p, unitMark: false });
        const back = parseLength(text, { units: u });
        expect(back.ok && Math.abs(back.mm - valueMm) <= displayStepMm({ units: u, precision: p }) / 2 + 1e-9).toBe(true);
      }),
    );
  });
});
