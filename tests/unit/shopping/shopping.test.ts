import { describe, it, expect } from "vitest";
import type { HardwareItem, Part } from "@/lib/engine/fixtures/types";
import { bandedLengthMm } from "@/lib/engine/shopping/edges";
import { csvField, partsCsv, shoppingCsv, toCsv } from "@/lib/engine/shopping/csv";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { findPrice, priceListSchema } from "@/lib/engine/shopping/price-schema";
import { boardFeet, buildShoppingList } from "@/lib/engine/shopping/shopping-list";
import { materialsReport } from "@/lib/engine/shopping/plan-shopping";
import { DEFAULT_MATERIALS } from "@/lib/engine/plan/defaults";
import { threeCabinetRun, TEST_MATERIALS } from "../nesting/part-sets";

const IN = 25.4; // 1 in = 25.4 mm exactly (NIST SP 811, App. B)

describe("csv", () => {
  it("quotes commas, quotes and line breaks (RFC 4180) and defuses formulas", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField('Side, left "A"')).toBe('"Side, left ""A"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvField(-3.5)).toBe("-3.5");
    expect(csvField(null)).toBe("");
    expect(toCsv([["a", 1], ["b,c", 2]])).toBe('a,1\r\n"b,c",2\r\n');
  });

  it("writes the parts list with sizes in inches and mm", () => {
    const part: Part = { id: "c:side", fixtureId: "c", name: "Side, left", qty: 2, lengthMm: 30.5 * IN, widthMm: 23.25 * IN, thicknessMm: 18, materialId: "ply-18", stock: "sheet", grain: "length", edges: ["front"], joinery: ["rabbet 1/2 x 1/2 in"] };
    const csv = partsCsv([part], DEFAULT_MATERIALS, { units: "in" });
    const lines = csv.split("\r\n");
    expect(lines[0].startsWith("Fixture,Part,Qty,Length")).toBe(true);
    // 30.5 in = 774.7 mm; 23.25 in = 590.55 mm, shown to one decimal.
    expect(lines[1]).toContain('"Side, left",2,"30 1/2""","23 1/4"""');
    expect(lines[1]).toContain(",774.7,590.6,18,");
  });
});

describe("edge banding and board feet", () => {
  it("reads edge words", () => {
    const p = { lengthMm: 600, widthMm: 200, edges: [] as string[] };
    expect(bandedLengthMm({ ...p, edges: ["front"] })).toBe(600);
    expect(bandedLengthMm({ ...p, edges: ["both long edges"] })).toBe(1200);
    expect(bandedLengthMm({ ...p, edges: ["all four edges"] })).toBe(1600);
    expect(bandedLengthMm({ ...p, edges: ["one short end"] })).toBe(200);
  });

  it("counts a board foot as 144 cubic inches", () => {
    // 1 in x 12 in x 1 ft = 1 board foot (the board foot's definition).
    expect(boardFeet(IN, 12 * IN, 12 * IN)).toBeCloseTo(1, 12);
    // 3/4 x 3-1/2 in x 8 ft = 1.75 board feet.
    expect(boardFeet(0.75 * IN, 3.5 * IN, 96 * IN)).toBeCloseTo(1.75, 12);
  });
});

describe("prices", () => {
  it("matches exact keys before patterns and validates lists", () => {
    expect(findPrice(DEFAULT_PRICE_LIST.items, "slide-20in")?.key).toBe("slide-*");
    expect(findPrice(DEFAULT_PRICE_LIST.items, "pocket-screw-1.25in")?.key).toBe("pocket-screw-*");
    expect(findPrice(DEFAULT_PRICE_LIST.items, "screw-1.25in")?.key).toBe("screw-*");
    expect(findPrice(DEFAULT_PRICE_LIST.items, "nothing")).toBeUndefined();
    expect(DEFAULT_PRICE_LIST.items.every((i) => i.example)).toBe(true);
    expect(priceListSchema.safeParse(DEFAULT_PRICE_LIST).success).toBe(true);
    const dup = { items: [DEFAULT_PRICE_LIST.items[0], DEFAULT_PRICE_LIST.items[0]] };
    expect(priceListSchema.safeParse(dup).success).toBe(false);
    // Every default material has an example price.
    for (const m of DEFAULT_MATERIALS) expect(findPrice(DEFAULT_PRICE_LIST.items, m.id), m.id).toBeDefined();
  });
});

describe("buildShoppingList", () => {
  const hardware: HardwareItem[] = [
    { fixtureId: "a", key: "slide-20in", name: "Slide 20 in", qty: 3, unit: "pair" },
    { fixtureId: "b", key: "slide-20in", name: "Slide 20 in", qty: 2, unit: "pair" },
    { fixtureId: "a", key: "screw-1.25in", name: "Screw", qty: 130, unit: "each" },
    { fixtureId: "t", key: "t-track", name: "T-track", qty: 1000, unit: "mm" },
    { fixtureId: "t", key: "mystery", name: "Unpriced thing", qty: 1, unit: "each" },
  ];

  it("sums hardware by key, rounds up to packs and adds the allowance to measured needs", () => {
    const list = buildShoppingList({ parts: [], hardware, sheets: [], boards: { groups: [], unplaced: [] }, materials: DEFAULT_MATERIALS }, DEFAULT_PRICE_LIST.items, { wasteAllowancePct: 10 });
    const slide = list.lines.find((l) => l.key === "slide-20in");
    expect(slide?.buyQty).toBe(5);
    expect(slide?.totalCents).toBe(5 * 1800);
    // 130 screws in boxes of 100: 2 boxes; counted items get no allowance.
    const screw = list.lines.find((l) => l.key === "screw-1.25in");
    expect(screw?.buyQty).toBe(2);
    expect(screw?.allowanceApplied).toBe(false);
    // 1000 mm + 10% = 1100 mm, one 48 in (1219.2 mm) length; at 0% still one.
    expect(list.lines.find((l) => l.key === "t-track")?.buyQty).toBe(1);
    expect(list.missingPrices).toEqual(["mystery"]);
    expect(list.lines.find((l) => l.key === "mystery")?.totalCents).toBeNull();
    expect(list.totalCents).toBe(5 * 1800 + 2 * 700 + 3000);
    expect(list.totals.find((t) => t.group === "hardware")?.totalCents).toBe(list.totalCents);
    expect(list.usesExamplePrices).toBe(true);
    const track = buildShoppingList({ parts: [], hardware: [{ ...hardware[3], qty: 1150 }], sheets: [], boards: { groups: [], unplaced: [] }, materials: DEFAULT_MATERIALS }, DEFAULT_PRICE_LIST.items, { wasteAllowancePct: 10 });
    // 1150 x 1.1 = 1265 mm > 1219.2: two lengths.
    expect(track.lines[0].buyQty).toBe(2);
  });

  it("prices sheets from the nest and boards by board foot, with totals per material", () => {
    const parts = threeCabinetRun();
    const r = materialsReport(parts, hardware, TEST_MATERIALS, DEFAULT_PRICE_LIST.items, { kerfMm: 3.175, nest: { maxAttempts: 30 } });
    const ply = r.shopping.lines.find((l) => l.id.startsWith("sheet:ply-18"));
    const plyNest = r.nest.materials.find((m) => m.materialId === "ply-18");
    expect(ply?.buyQty).toBe(plyNest?.sheetsUsed);
    expect(ply?.totalCents).toBe((plyNest?.sheetsUsed ?? 0) * 7200);
    const boards = r.shopping.lines.filter((l) => l.category === "board");
    expect(boards.length).toBeGreaterThan(0);
    for (const b of boards) {
      const len = Number(b.id.split(":").pop());
      const g = r.boards.groups[0];
      // Price per board = board feet x 650 cents, rounded to the cent.
      expect(b.unitPriceCents).toBe(Math.round(650 * boardFeet(g.thicknessMm, g.stockWidthMm, len)));
    }
    const perMaterial = r.shopping.totals.reduce((s, t) => s + t.totalCents, 0);
    expect(perMaterial).toBe(r.shopping.totalCents);
    const csv = shoppingCsv(r.shopping);
    expect(csv.split("\r\n").at(-2)).toContain(`All,,,,,,${(r.shopping.totalCents / 100).toFixed(2)}`);
  });
});
