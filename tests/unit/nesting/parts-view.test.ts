import { describe, it, expect } from "vitest";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { PartsView } from "@/components/parts/PartsView";
import { SheetMap } from "@/components/parts/SheetMap";
import { formatters } from "@/components/parts/format";
import { planParts } from "@/components/parts/plan-parts";
import { runNestRequest, type NestReply } from "@/lib/client/nest-worker";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { planDocumentSchema } from "@/lib/engine/plan/schema";
import { cabinetParts, TEST_MATERIALS } from "./part-sets";

function planWithCabinets() {
  const doc = newPlanDocument();
  return planDocumentSchema.parse({
    ...doc,
    fixtures: [
      { id: "cab-1", kind: "base-cabinet", label: "Left cabinet", placement: { mode: "wall", wallId: "w3", offsetMm: 0 }, params: {} },
      { id: "cab-2", kind: "base-cabinet", label: "Right cabinet", placement: { mode: "wall", wallId: "w3", offsetMm: 700 }, params: {} },
    ],
  });
}

describe("nest worker", () => {
  it("answers a request with the same result as the engine, reporting progress", () => {
    const parts = cabinetParts("cab", 24, 4);
    const replies: NestReply[] = [];
    runNestRequest({ id: 7, parts, materials: TEST_MATERIALS, options: { kerfMm: 3.175, maxAttempts: 30, seed: 1 } }, (r) => replies.push(r), 0);
    const done = replies.at(-1);
    expect(done?.type).toBe("done");
    expect(replies.some((r) => r.type === "progress")).toBe(true);
    expect(replies.every((r) => r.id === 7)).toBe(true);
    const direct = nestSheets(parts, TEST_MATERIALS, { kerfMm: 3.175, maxAttempts: 30, seed: 1 });
    if (done?.type === "done") expect(done.result.materials.map((m) => m.sheetsUsed)).toEqual(direct.materials.map((m) => m.sheetsUsed));
  });
});

describe("parts view markup", () => {
  it("derives parts from the plan's fixtures and renders the tabs and parts table", () => {
    const plan = planWithCabinets();
    const { parts, hardware } = planParts(plan);
    expect(parts.length).toBeGreaterThan(10);
    expect(hardware.length).toBeGreaterThan(0);
    const html = renderToStaticMarkup(createElement(PartsView, { plan }));
    expect(html).toContain('role="tablist"');
    expect(html).toContain("Sheet maps");
    expect(html).toContain('data-testid="parts-table"');
    expect(html).toContain("Left cabinet");
  });

  it("draws a sheet with every piece, numbered cuts and inch sizes", () => {
    const res = nestSheets(cabinetParts("cab", 24, 4), TEST_MATERIALS, { kerfMm: 3.175, maxAttempts: 20 });
    const sheet = res.materials[0].sheets[0];
    const html = renderToStaticMarkup(createElement(SheetMap, { sheet, kerfMm: 3.175, fmt: formatters({ units: "in", precision: 16 }), title: "Sheet 1" }));
    expect((html.match(/<rect[^>]*fill="#fdf0cf"/g) ?? []).length).toBe(sheet.placements.length);
    expect((html.match(/<circle/g) ?? []).length).toBe(sheet.cuts.length);
    // 48 x 96 in sheet (TRADE.md, practice): the caption shows it in inches.
    expect(html).toContain("96&quot; x 48&quot;");
  });
});
