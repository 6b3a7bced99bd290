import { describe, expect, it } from "vitest";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { derivePlan } from "@/lib/engine/derive";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { parsePlan } from "@/lib/engine/plan/parse";
import { boundedAnalysisJson } from "@/lib/server/engine-pool/answer-bound";

/** Twelve cabinets stacked in one place: every pair collides, so there are many findings to cut. */
function stacked() {
  const doc = { ...newPlanDocument(), fixtures: Array.from({ length: 12 }, (_, i) => ({ id: `f${i}`, kind: "base-cabinet", placement: { mode: "wall", wallId: "w3", offsetMm: 100 }, params: {} })) };
  const r = parsePlan(doc);
  if (!r.ok) throw new Error("plan refused");
  return analyzePlan(r.plan, derivePlan(r.plan));
}

describe("analyze answer size bound", () => {
  it("leaves an answer that fits untouched, without a trimmed note", () => {
    const a = stacked();
    const text = boundedAnalysisJson(a, 10_000_000);
    expect(text).toBe(JSON.stringify(a));
    expect(JSON.parse(text).trimmed).toBeUndefined();
  });

  it("cuts the least serious findings to fit, counts them and says so", () => {
    const a = stacked();
    const full = Buffer.byteLength(JSON.stringify(a));
    const limit = Math.floor(full * 0.6);
    const text = boundedAnalysisJson(a, limit);
    expect(Buffer.byteLength(text)).toBeLessThanOrEqual(limit);
    const b = JSON.parse(text);
    expect(b.findings.length).toBeGreaterThan(0);
    expect(b.findings.length).toBeLessThan(a.findings.length);
    // The kept ones are the list's head, in order (most serious first).
    expect(b.findings).toEqual(JSON.parse(JSON.stringify(a.findings.slice(0, b.findings.length))));
    expect(b.trimmed.findings).toBe(a.findings.length - b.findings.length);
    expect(b.omittedFindings).toBe(a.omittedFindings + b.trimmed.findings);
    expect(b.trimmed.zones).toBe(0);
    expect(b.trimmed.note).toMatch(/cut to stay under \d+ kB: \d+ of the least serious findings are left out/);
    expect(b.summary).toEqual(a.summary);
  });

  it("drops the zones too when even they do not fit", () => {
    const a = stacked();
    const withoutListsBytes = Buffer.byteLength(JSON.stringify({ ...a, findings: [], zones: [] }));
    const limit = withoutListsBytes + 450;
    const b = JSON.parse(boundedAnalysisJson(a, limit));
    expect(b.zones).toEqual([]);
    expect(b.trimmed.zones).toBe(a.zones.length);
    expect(b.trimmed.note).toMatch(/keep-clear zones/);
  });
});
