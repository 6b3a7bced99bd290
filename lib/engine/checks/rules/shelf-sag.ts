import { shelfSag } from "../../sag/shelf-sag";
import { stiffnessOf } from "../../sag/moe";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { stiffnessKeyFor } from "../../sag/stiffness-key";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";
import { partFacts } from "../part-facts";
import type { Part } from "../../fixtures/types";

const ID = "shelf-sag";
const LB_PER_KG = 1 / 0.45359237;
const FT_PER_M = 1 / 0.3048;

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const note = ctx.presetNote("sagLimitMmPerM", "shelfLoadKgPerM");
  const lbPerFt = (n.shelfLoadKgPerM * LB_PER_KG) / FT_PER_M;
  // A shelf run says its own load and stiffness; other shelves carry the rule's book load.
  const runs = new Map<string, RunLoad | undefined>();
  for (const d of ctx.plan.fixtures) if (d.kind === "shelf-run") runs.set(d.id, runLoad(d.params));
  const stiffByMaterial = new Map<string, string>();
  // One finding per distinct shelf size in a fixture: identical shelves sag alike.
  for (const facts of partFacts(ctx.parts)) {
    if (ids && !ids.has(facts.fixtureId)) continue;
    for (const p of facts.shelves) out.push(shelfFinding(ctx, p, runs.get(p.fixtureId), stiffByMaterial, lbPerFt, note));
  }
  return out;
}

/** The sag finding of one shelf. */
function shelfFinding(ctx: CheckContext, p: Part, rp: RunLoad | undefined, stiffByMaterial: Map<string, string>, bookLoad: number, note: string): Finding {
  let stiff = rp?.stiffnessKey ?? stiffByMaterial.get(p.materialId);
  if (!stiff) {
    stiff = stiffnessKeyFor(p.materialId, ctx.plan.materials);
    stiffByMaterial.set(p.materialId, stiff);
  }
  const load = rp ? rp.loadLbPerFt : bookLoad;
  const r = shelfSag({
    spanMm: p.lengthMm,
    depthMm: p.widthMm,
    thicknessMm: p.thicknessMm,
    stiffnessKey: stiff,
    uniformLbPerFt: load,
    centreLoadLb: rp?.centreLoadLb,
    longTerm: rp?.longTerm,
  });
  const limitMm = (ctx.numbers.sagLimitMmPerM * p.lengthMm) / 1000;
  const ok = r.deflectionMm <= limitMm + 1e-9;
  const f = ctx.fixtureById.get(p.fixtureId);
  const who = `${f?.label ?? p.fixtureId}: ${p.name.toLowerCase()} ${ctx.len(p.lengthMm)} span`;
  const mat = stiffnessOf(stiff)?.name ?? stiff;
  const under = `sags ${r.deflectionIn.toFixed(3)} in under ${load.toFixed(0)} lb/ft${rp?.longTerm ? ", long term" : ""} (${mat})`;
  return finding(
    ID,
    "caution",
    ok,
    p.fixtureId,
    ok
      ? `${who} ${under}; within ${limitIn(limitMm)} in${note}.`
      : `${who} ${under}, over the ${limitIn(limitMm)} in guide${note}: shorten the span, add a stiffening edge, or use thicker stock.`,
    { fixtureIds: [p.fixtureId], measured: r.deflectionMm, required: limitMm, shortfall: r.deflectionMm - limitMm, unit: "mm" },
  );
}

interface RunLoad {
  loadLbPerFt: number;
  centreLoadLb?: number;
  longTerm?: boolean;
  stiffnessKey?: string;
}

/** A shelf run's own load and stiffness, read from its parameters as parsePlan left them (defaults filled in). */
function runLoad(params: Record<string, unknown>): RunLoad | undefined {
  const load = params.loadLbPerFt;
  if (typeof load !== "number" || !Number.isFinite(load) || load < 0) return undefined;
  const centre = params.centreLoadLb;
  const key = params.stiffnessKey;
  return {
    loadLbPerFt: load,
    centreLoadLb: typeof centre === "number" && Number.isFinite(centre) && centre >= 0 ? centre : undefined,
    longTerm: params.longTerm === true,
    stiffnessKey: typeof key === "string" && stiffnessOf(key) ? key : undefined,
  };
}

const limitIn = (mmValue: number) => (mmValue / 25.4).toFixed(3);

/** Shelf sag under a book-like load against 0.02 in per foot of span. */
export const shelfSagRule: Rule<CheckContext> = {
  id: ID,
  title: "Shelf sag",
  protects: "A shelf that sags shows it within weeks and keeps creeping; under a long-term load wood sags about half as much again.",
  formula: "sag = 5 w L^4 / (384 E I), I = b t^3 / 12; sag <= 0.02 in per foot of span",
  numbers: [
    { label: "Sag guide", value: "0.02 in per foot of span (1/32 in per foot is visible)" },
    { label: "Load", value: "20 lb per running foot (books)" },
    { label: "Long-term factor", value: "1.5 (seasoned wood)" },
  ],
  sources: [
    { citation: "AWC Design Aid No. 6, Beam Design Formulas (2007), fig. 1", status: "published" },
    { citation: "USDA FPL Wood Handbook, FPL-GTR-190 (2010), Table 5-3b (stiffness)", status: "published" },
    { citation: "Sag guide and book load: furniture-building practice", status: "practice" },
    { citation: "AWC NDS 3.5.2: long-term deflection 1.5 x initial", status: "published" },
  ],
  severity: "caution",
  cautions: [],
  ...perFixture(check),
};
