import { describe, it, expect } from "vitest";
import type { Finding } from "@/lib/engine/checks/types";
import type { WorldZone } from "@/lib/engine/fixtures/types";
import { describeZone, pickHoveredZone, zoneSize } from "@/scene/zone-info";

const mm = (v: number) => v as never;
// A 914.4 x 762 mm (36 x 30 in) working space, 1981.2 mm (78 in) high, turned 90 degrees on the floor.
const zone: WorldZone = {
  id: "p1:working",
  ownerId: "p1",
  purpose: "panel-working-space",
  label: "Working space in front of the panel",
  prism: { polygon: [{ x: 0, y: 0 }, { x: 0, y: 914.4 }, { x: -762, y: 914.4 }, { x: -762, y: 0 }], zMin: mm(0), zMax: mm(1981.2) },
};
const fmt = (v: number) => `${Math.round(v * 10) / 10} mm`;

describe("zone hover card", () => {
  it("measures a turned rectangle along its first edge and across it", () => {
    const s = zoneSize(zone.prism);
    expect(s.lengthMm).toBeCloseTo(914.4, 6);
    expect(s.acrossMm).toBeCloseTo(762, 6);
    expect(s.heightMm).toBeCloseTo(1981.2, 6);
  });

  it("names the state in words and gives the failing finding's measured and required numbers", () => {
    // 30 in = 762 mm wide working space (NEC 110.26(A)(2), see TRADE.md); the finding below is made up for the test.
    const findings: Finding[] = [
      { ruleId: "panel-working-space", severity: "conflict", pass: false, fixtureIds: ["c1"], zoneIds: [zone.id], measured: 450, required: 914.4, unit: "mm", message: "A cabinet stands in the panel's working space." },
      { ruleId: "walkway", severity: "caution", pass: true, fixtureIds: [], zoneIds: [zone.id], measured: 1000, required: 914.4, unit: "mm", message: "Walkway is wide enough." },
      { ruleId: "other", severity: "caution", pass: false, fixtureIds: [], zoneIds: ["elsewhere"], message: "Not this zone." },
    ];
    const info = describeZone(zone, findings, "conflict", fmt);
    expect(info.label).toBe("Working space in front of the panel");
    expect(info.size).toBe("914.4 mm × 762 mm, 1981.2 mm high");
    expect(info.stateText).toBe("Conflict");
    expect(info.findings).toEqual([{ ruleId: "panel-working-space", severity: "conflict", measured: "450 mm", required: "914.4 mm", message: "A cabinet stands in the panel's working space." }]);
  });

  it("shows passing findings when none fails, with degrees written as degrees", () => {
    const findings: Finding[] = [{ ruleId: "angle", severity: "advice", pass: true, fixtureIds: [], zoneIds: [zone.id], measured: 12.34, required: 15, unit: "deg", message: "Fine." }];
    expect(describeZone(zone, findings, "clear", fmt).findings[0]).toMatchObject({ measured: "12.3°", required: "15.0°" });
  });

  it("prefers the worst zone under the pointer, then the nearest", () => {
    const states = new Map([["b", "caution" as const], ["c", "conflict" as const]]);
    expect(pickHoveredZone(["a", "b", "c"], states)).toBe("c");
    expect(pickHoveredZone(["a", "b"], states)).toBe("b");
    expect(pickHoveredZone(["a", "d"], states)).toBe("a");
    expect(pickHoveredZone([], states)).toBeNull();
  });
});
