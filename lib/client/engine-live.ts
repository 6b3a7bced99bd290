import { createChecker, type IncrementalChecker } from "@/lib/engine/checks/evaluate";
import type { Derived } from "@/lib/engine/derive-types";
import { derivePlan, rederiveFixtures } from "@/lib/engine/derive";
import { FIXTURE_KINDS, getFixtureKind } from "@/lib/engine/fixtures/registry";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";
import { parseLength } from "@/lib/engine/units/parse-length";
import type { AdoptedPreset, AnalyserOptions, EnginePort } from "./engine-port";

/** Ids of fixtures added, removed or replaced between two documents (edits keep unchanged fixtures by reference). */
export function changedFixtureIds(prev: PlanDocument, next: PlanDocument): string[] {
  const before = new Map(prev.fixtures.map((f) => [f.id, f]));
  const out: string[] = [];
  for (const f of next.fixtures) {
    if (before.get(f.id) !== f) out.push(f.id);
    before.delete(f.id);
  }
  return [...out, ...before.keys()];
}

/**
 * Derive and check, incrementally when only fixtures changed (a drag step re-places one fixture and
 * re-checks what it can reach); anything else (room, settings, materials, the adopted preset) starts over.
 */
function createLiveAnalyser(opts: AnalyserOptions = {}) {
  let prevDoc: PlanDocument | null = null;
  let prevDerived: Derived | null = null;
  let checker: IncrementalChecker | null = null;
  let prevPreset: AdoptedPreset | null = null;
  return (doc: PlanDocument) => {
    const preset = opts.preset?.() ?? null;
    const fixturesOnly =
      prevDoc && prevDerived && checker && preset === prevPreset && prevDoc.room === doc.room && prevDoc.settings === doc.settings && prevDoc.materials === doc.materials && prevDoc.schemaVersion === doc.schemaVersion;
    let derived: Derived;
    let findings;
    if (fixturesOnly) {
      const changed = changedFixtureIds(prevDoc!, doc);
      derived = rederiveFixtures(doc, prevDerived!, changed);
      findings = checker!.update(doc, derived, changed);
    } else {
      derived = derivePlan(doc);
      // The checks use the adopted preset's numbers, and findings name it (engine EvaluateOptions).
      checker = createChecker(doc, derived, preset ? { preset: preset.numbers, presetLabel: preset.name } : {});
      findings = checker.findings();
    }
    prevDoc = doc;
    prevDerived = derived;
    prevPreset = preset;
    return { derived, findings };
  };
}

/** The editor's engine: derive, checks, fixture kinds and units from lib/engine. */
export const liveEngine: EnginePort = {
  createAnalyser: createLiveAnalyser,
  kinds: () => FIXTURE_KINDS.map((k) => ({ kind: k.kind, title: k.title, blurb: k.blurb })),
  paramsSchema: (kind) => getFixtureKind(kind)?.paramsSchema,
  defaultParams: (kind) => (getFixtureKind(kind)?.defaults() ?? {}) as Record<string, unknown>,
  footprint(kind, params, doc) {
    const k = getFixtureKind(kind);
    const p = k?.paramsSchema.safeParse(params);
    if (!k || !p?.success) return { widthMm: 600, depthMm: 600, heightMm: 900 };
    return k.footprint(p.data, { settings: doc.settings, materials: doc.materials });
  },
  formatLength: (mm, s) => formatLength(mm, { units: s.units, precision: s.precision }),
  parseLength(text, s, opts) {
    const r = parseLength(text, { units: s.units, allowZero: opts?.allowZero, allowNegative: opts?.allowNegative });
    return r.ok ? { ok: true, mm: r.mm } : { ok: false, message: r.message };
  },
};
