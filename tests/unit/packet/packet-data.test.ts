import { describe, expect, it } from "vitest";
import { RULES } from "@/lib/engine/checks/registry";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { planNestOptions } from "@/lib/engine/nesting/plan-nest";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { buildPacketData } from "@/lib/server/packet/packet-data";
import { paperFor } from "@/lib/server/packet/paper";
import { qrPath } from "@/lib/server/packet/qr";
import type { PacketInput } from "@/lib/server/packet/types";

const input = (over: Partial<PacketInput> = {}): PacketInput => ({
  doc: demoPlan(),
  name: "Two-car garage shop",
  ownerName: "Robin",
  revision: 4,
  updatedAt: "2026-12-02T10:00:00.000Z",
  shopUrl: "http://localhost:3000/plans/00000000-0000-4000-8000-000000000000/shop",
  shared: false,
  preset: null,
  prices: DEFAULT_PRICE_LIST.items,
  ...over,
});

describe("build packet content", () => {
  const data = buildPacketData(input());

  it("labels every part line once and every nested piece with its line's label", () => {
    const labels = data.parts.map((p) => p.label);
    expect(new Set(labels).size).toBe(labels.length);
    expect(data.parts.length).toBeGreaterThan(10);
    for (const m of data.sheets) for (const sh of m.sheets) for (const p of sh.placements) expect(labels).toContain(data.partLabels[p.partId]);
    for (const g of data.boards.groups) for (const b of g.boards) for (const c of b.cuts) expect(labels).toContain(data.partLabels[c.partId]);
  });

  it("nests exactly as the screen and the CSV do (the plan's seed and work cap)", () => {
    const d = derivePlan(input().doc);
    const again = nestSheets(d.parts, input().doc.materials, planNestOptions(input().doc.settings.kerfMm));
    expect(data.sheets.map((m) => m.sheets.map((s) => s.placements.map((p) => `${p.pieceKey}@${p.xMm},${p.yMm}`)))).toEqual(again.materials.map((m) => m.sheets.map((s) => s.placements.map((p) => `${p.pieceKey}@${p.xMm},${p.yMm}`))));
  });

  it("lists every rule with its sources, and cautions that name a source", () => {
    expect(data.checks.map((c) => c.ruleId)).toEqual(RULES.map((r) => r.id));
    for (const c of data.checks) expect(c.sources.length).toBeGreaterThan(0);
    expect(data.cautions.length).toBeGreaterThan(2);
    for (const c of data.cautions) expect(c.source.length).toBeGreaterThan(3);
    // The demo has a miter saw: its guarding caution rests on OSHA 29 CFR 1910.213(b)(3).
    expect(data.cautions.some((c) => c.source.startsWith("OSHA 29 CFR 1910.213"))).toBe(true);
  });

  it("writes the date in UTC and is the same for the same input", () => {
    expect(data.meta.changed).toBe("Dec 2, 2026");
    expect(JSON.stringify(buildPacketData(input()))).toBe(JSON.stringify(data));
  });

  it("says why when the room cannot be solved, and still lists no parts rather than failing", () => {
    const doc = demoPlan();
    const broken = { ...doc, room: { ...doc.room, walls: doc.room.walls.slice(0, 1) } };
    const d = buildPacketData(input({ doc: broken }));
    expect(d.problem).toMatch(/cannot be solved/);
    expect(d.drawings).toBeNull();
  });
});

describe("packet paper and QR code", () => {
  it("prints inch plans on Letter and millimetre plans on A4 unless the plan says otherwise", () => {
    expect(paperFor({ units: "in" })).toBe("LETTER");
    expect(paperFor({ units: "ft-in" })).toBe("LETTER");
    expect(paperFor({ units: "mm" })).toBe("A4");
    expect(paperFor({ units: "mm", paperSize: "letter" })).toBe("LETTER");
    expect(paperFor({ units: "in", paperSize: "A4" })).toBe("A4");
    expect(paperFor({ units: "in", paperSize: 7 })).toBe("LETTER");
  });

  it("draws the QR code as unit squares inside its size", () => {
    const q = qrPath("http://localhost:3000/s/abc/shop");
    expect(q.size).toBeGreaterThanOrEqual(21);
    const moves = [...q.path.matchAll(/M(\d+) (\d+)h(\d+)/g)].map((m) => m.slice(1).map(Number));
    expect(moves.length).toBeGreaterThan(50);
    for (const [x, y, run] of moves) {
      expect(x + run).toBeLessThanOrEqual(q.size);
      expect(y).toBeLessThan(q.size);
    }
  });
});
