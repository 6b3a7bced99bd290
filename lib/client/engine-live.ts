import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { formatLength } from "@/lib/engine/units/format-length";
import { parseLength } from "@/lib/engine/units/parse-length";
import { deriveWithEngineParts } from "./derive-bridge";
import type { EnginePort } from "./engine-port";
import { editorKinds, kindOf } from "./kinds";

/** The editor's engine: the real derive, checks, fixture kinds and units. */
export const liveEngine: EnginePort = {
  derive: (doc) => deriveWithEngineParts(doc),
  evaluate: (doc, derived) => evaluatePlan(doc, derived),
  kinds: () => editorKinds.map((k) => ({ kind: k.kind, title: k.title, blurb: k.blurb })),
  paramsSchema: (kind) => kindOf(kind)?.paramsSchema,
  defaultParams: (kind) => (kindOf(kind)?.defaults() ?? {}) as Record<string, unknown>,
  footprint(kind, params, doc) {
    const k = kindOf(kind);
    const p = k?.paramsSchema.safeParse(params);
    if (!k || !p?.success) return { widthMm: 600, depthMm: 600, heightMm: 900 };
    return k.footprint(p.data, { settings: doc.settings, materials: doc.materials });
  },
  fixtureParts(doc, fixtureId) {
    const f = doc.fixtures.find((x) => x.id === fixtureId);
    const k = f && kindOf(f.kind);
    const p = k?.paramsSchema.safeParse(f?.params);
    if (!f || !k || !p?.success) return [];
    return k.parts(f.id, p.data, { settings: doc.settings, materials: doc.materials });
  },
  formatLength: (mm, s) => formatLength(mm, { units: s.units, precision: s.precision }),
  parseLength(text, s, opts) {
    const r = parseLength(text, { units: s.units, allowZero: opts?.allowZero, allowNegative: opts?.allowNegative });
    return r.ok ? { ok: true, mm: r.mm } : { ok: false, message: r.message };
  },
};
