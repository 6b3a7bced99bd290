import { createStore } from "zustand/vanilla";
import type { Finding } from "@/lib/engine/checks/types";
import type { Derived } from "@/lib/engine/derive-types";
import type { PlacedFixture } from "@/lib/engine/fixtures/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { EnginePort } from "../engine-port";

/** Everything computed from the document: kept in its own store so panels subscribe to what they show. */
export interface DerivedState {
  doc: PlanDocument | null;
  derived: Derived | null;
  findings: Finding[];
  fixtureById: Map<string, PlacedFixture>;
  /** Set when the engine cannot derive the plan (bad room measurements, say). */
  error: string | null;
  /** Script time of the last derive + check, ms (shown in the bench). */
  lastMs: number;
}

export function createDerivedStore() {
  return createStore<DerivedState>()(() => ({ doc: null, derived: null, findings: [], fixtureById: new Map(), error: null, lastMs: 0 }));
}

export type DerivedStore = ReturnType<typeof createDerivedStore>;

export type Analyser = ReturnType<EnginePort["createAnalyser"]>;

/** Re-derives and re-checks the plan (the analyser works incrementally when only fixtures changed). */
export function recompute(store: DerivedStore, analyse: Analyser, doc: PlanDocument, force = false): void {
  const prev = store.getState();
  if (prev.doc === doc && !force) return;
  const t0 = performance.now();
  try {
    const { derived, findings } = analyse(doc);
    const fixtureById = new Map(derived.fixtures.map((f) => [f.id, f]));
    store.setState({ doc, derived, findings, fixtureById, error: null, lastMs: performance.now() - t0 });
  } catch (e) {
    store.setState({ doc, error: e instanceof Error ? e.message : String(e), lastMs: performance.now() - t0 });
  }
}
