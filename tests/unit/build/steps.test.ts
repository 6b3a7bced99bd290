import { describe, it, expect } from "vitest";
import { buildFromPlan } from "@/lib/engine/build";
import { demoPlan } from "@/lib/engine/demo/demo-plan";

describe("build order", () => {
  const b = buildFromPlan(demoPlan());
  const titles = b.steps.map((s) => s.title);
  const at = (re: RegExp) => titles.findIndex((t) => re.test(t));

  it("cuts first (each setting once), kicks, carcasses, install, tops, the stop track and its repeat cuts, face frames, drawers, fronts, wall fixtures", () => {
    const seq = [/^Cut and machine/, /toe-kick platforms/, /Glue up the carcass/, /Set and anchor/, /Countertop core/, /Fit the stop track/, /repeat lengths at the stop track/, /face frame/, /drawer boxes/, /drawer fronts/, /Hang the wall cabinet/];
    const idx = seq.map(at);
    for (const i of idx) expect(i).toBeGreaterThanOrEqual(0);
    expect(idx).toEqual([...idx].sort((x, y) => x - y));
    // The first cutting step runs every setup but the stop track's; those wait for the repeat step.
    expect(b.steps[0].setupIds).toEqual(b.setups.filter((s) => !s.stopTrackId).map((s) => s.id));
    expect(b.steps.find((s) => s.id === "room-repeat")?.setupIds).toEqual(b.setups.filter((s) => s.stopTrackId).map((s) => s.id));
  });

  it("fixture steps are titled with the fixture's letter and reference setups by id", () => {
    const carcass = b.steps.find((s) => s.id === "cab-1-carcass");
    expect(carcass?.title).toBe("A: Glue up the carcass");
    expect(carcass?.setupIds).toContain("rabbet-1");
    const ff = b.steps.find((s) => s.id === "cab-1-face-frame");
    expect(ff?.setupIds.every((id) => id.startsWith("pocket-screw-"))).toBe(true);
  });

  it("glue-ups carry PVA open and clamp times, laminating the cement's flash-off and fume caution, each with its source", () => {
    const glue = b.steps.find((s) => s.id === "cab-1-carcass");
    // PVA open time roughly 5-10 minutes, clamp 30-60 minutes (glue makers' data sheets; the label governs).
    expect(glue?.timeNotes.map((t) => t.text).join(" ")).toMatch(/5-10 minutes.*30-60 minutes/);
    for (const s of b.steps) for (const t of s.timeNotes) expect(t.source.length).toBeGreaterThan(5);
    const lam = b.steps.find((s) => s.id === "cab-1-top-laminate");
    // Contact cement: dry to the touch, often 15-30 minutes (makers' labels); vapour can ignite (Ontario MOL; CPSC 16 CFR 1302).
    expect(lam?.timeNotes.some((t) => /15-30 minutes/.test(t.text) && /makers' labels/.test(t.source))).toBe(true);
    expect(lam?.cautions.join(" ")).toMatch(/ignite.*16 CFR 1302/);
  });

  it("drawer fronts go on from the bottom up with spacers set to the reveal (practice); cabinets are anchored", () => {
    expect(b.steps.find((s) => s.id === "cab-1-fronts")?.detail).toMatch(/bottom up with spacers equal to the reveal/);
    expect(b.steps.find((s) => s.id === "room-install")?.cautions.join(" ")).toMatch(/studs or masonry/);
  });

  it("every part is in the cutting step and in exactly its quantity across its fixtures' steps", () => {
    for (const r of b.rows) {
      expect(b.steps[0].parts.find((p) => p.label === r.label)?.qty).toBe(r.pieces);
      const n = b.steps.filter((s) => s.id !== "room-cut" && s.id !== "room-repeat").reduce((s, st) => s + (st.parts.find((p) => p.label === r.label)?.qty ?? 0), 0);
      expect(n).toBe(r.qty);
    }
  });
});
