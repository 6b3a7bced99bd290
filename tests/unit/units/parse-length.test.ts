import { describe, it, expect } from "vitest";
import fc from "fast-check";
import Fraction from "fraction.js";
import { unit } from "mathjs";
import { parseLength } from "@/lib/engine/units/parse-length";
import type { ParseLengthResult } from "@/lib/engine/units/parse-length";
import { MM_PER_FOOT, MM_PER_INCH, feet, inches, toInches } from "@/lib/engine/units/length";

function mmOf(r: ParseLengthResult): number {
  if (!r.ok) throw new Error(`expected ok, got: ${r.message}`);
  return r.mm;
}
function messageOf(r: ParseLengthResult): string {
  if (r.ok) throw new Error(`expected an error, got ${r.mm} mm`);
  return r.message;
}
const inch = { units: "in" } as const;
const metric = { units: "mm" } as const;

describe("inch definition", () => {
  // NIST SP 811 (2008), App. B; international yard and pound agreement (1959): 1 in = 25.4 mm, 1 ft = 0.3048 m exactly.
  it("uses 25.4 mm per inch and 304.8 mm per foot", () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(MM_PER_FOOT).toBe(304.8);
    expect(inches(1)).toBe(25.4);
    expect(feet(1)).toBe(304.8);
    expect(toInches(inches(23.875))).toBeCloseTo(23.875, 12);
  });
  // Reference library: mathjs defines the inch exactly; compare with a tolerance because floats show (TRADE.md).
  it("agrees with mathjs unit conversion", () => {
    for (const v of [1, 23.875, 96, 0.03125, 1234.5]) {
      expect(mmOf(parseLength(String(v), inch))).toBeCloseTo(unit(v, "inch").toNumber("mm"), 9);
    }
    expect(mmOf(parseLength(`2' 3-1/2"`, inch))).toBeCloseTo(unit(2, "ft").toNumber("mm") + unit(3.5, "inch").toNumber("mm"), 9);
  });
});

describe("parseLength: what people type", () => {
  // Expected values worked from 1 in = 25.4 mm (NIST SP 811, App. B).
  const cases: [string, number][] = [
    ["23 7/8", 606.425],
    [`23-7/8"`, 606.425],
    ["23.875", 606.425],
    [`2' 3-1/2"`, 698.5], // 27.5 in
    ["2ft 3.5in", 698.5],
    ["1'6", 457.2],
    ["606.4 mm", 606.4],
    ["60.64cm", 606.4],
    ["0.6064 m", 606.4],
    ["7/8", 22.225],
    [`3/4"`, 19.05],
    [`2'-3 1/2"`, 698.5],
    ["23 ⅞", 606.425],
    ["23 7/8 in", 606.425],
    [`2'`, 609.6],
    ["8 feet", 2438.4],
    [`5'11"`, 1803.4],
    ["6 1/2 inches", 165.1],
    ["23 7/8''", 606.425],
    ["1' 6 1/2", 469.9],
    ["2 ft", 609.6],
    ["1/2 in", 12.7],
    [".5", 12.7],
    ["7.", 177.8],
  ];
  for (const [text, expected] of cases) {
    it(`reads ${text}`, () => {
      expect(mmOf(parseLength(text, inch))).toBeCloseTo(expected, 9);
    });
  }

  it("reads bare numbers in the user's units", () => {
    expect(mmOf(parseLength("24", { units: "in" }))).toBeCloseTo(609.6, 9);
    expect(mmOf(parseLength("24", { units: "ft-in" }))).toBeCloseTo(609.6, 9);
    expect(mmOf(parseLength("24", metric))).toBe(24);
    expect(mmOf(parseLength(`24"`, metric))).toBeCloseTo(609.6, 9);
    const r = parseLength("24", metric);
    expect(r.ok && r.readAs).toBe("mm");
  });

  // Reference library: fraction.js reads mixed numbers exactly; our reading must match its value times 25.4.
  it("agrees with fraction.js on mixed numbers", () => {
    for (const t of ["23 7/8", "1 1/32", "95 15/16", "3/64", "47 31/32"]) {
      const exactInches = new Fraction(t).valueOf();
      expect(mmOf(parseLength(t, inch))).toBeCloseTo(exactInches * 25.4, 9);
    }
  });

  it("allows zero and negatives only when asked", () => {
    expect(messageOf(parseLength("0", inch))).toMatch(/greater than zero/);
    expect(mmOf(parseLength("0", { units: "in", allowZero: true }))).toBe(0);
    expect(messageOf(parseLength("-3", inch))).toMatch(/negative/);
    expect(mmOf(parseLength("-3", { units: "in", allowNegative: true }))).toBeCloseTo(-76.2, 9);
  });
});

describe("parseLength: rejects with a message saying what was wrong", () => {
  const bad: [string, RegExp][] = [
    ["7//8", /two slashes/i],
    ["1/2/3", /too many slashes/i],
    ["-23 7/8", /negative/i],
    ["", /enter a length/i],
    ["   ", /enter a length/i],
    ["7/0", /0 below the slash/i],
    ["101 m", /100 m/],
    ["4000 ft", /100 m/],
    ["banana", /could not read/i],
    ["12 apples", /could not read/i],
    ["1.5/2", /whole numbers/i],
    ["7/", /below the slash/i],
    [`2' 30 mm`, /not both/i],
    [`2' 3' 4"`, /feet are given twice/i],
    ["1.2.3", /one decimal point/i],
    ["606,4", /commas/i],
  ];
  for (const [text, message] of bad) {
    it(`rejects ${JSON.stringify(text)}`, () => {
      expect(messageOf(parseLength(text, inch))).toMatch(message);
    });
  }
  it("asks for an inch mark on a fraction typed in mm mode", () => {
    expect(messageOf(parseLength("7/8", metric))).toMatch(/inch mark/);
  });
  it("never throws, and every length it accepts is in range (random text)", () => {
    const alphabet = fc.constantFrom(..."0123456789 ./-'\"ftinmc½".split(""));
    fc.assert(
      fc.property(fc.array(alphabet, { maxLength: 16 }).map((a) => a.join("")), fc.constantFrom("in", "ft-in", "mm" as const), (text, units) => {
        const r = parseLength(text, { units });
        if (r.ok) expect(r.mm > 0 && r.mm <= 100_000).toBe(true);
        else expect(r.message.length).toBeGreaterThan(5);
      }),
      { numRuns: 3000 },
    );
  });
  it("never throws on odd input", () => {
    for (const t of ["\"", "'", "--", "/", "mm", "in", "ft", "1e5", "NaN", "Infinity", "½'", "9".repeat(39)]) {
      expect(() => parseLength(t, inch)).not.toThrow();
      const r = parseLength(t, inch);
      if (r.ok) expect(Number.isFinite(r.mm) && r.mm > 0 && r.mm <= 100_000).toBe(true);
    }
  });
});
