"use client";
import { useDeferredValue, useMemo } from "react";
import { StopTableView } from "@/components/parts/build/StopTableView";
import { formatters } from "@/components/parts/format";
import { buildPlan } from "@/lib/engine/build";
import { useDerived } from "@/lib/client/react/useEditorState";

/** The selected stop track's stop table, filled from the plan's repeat crosscuts and the lengths typed on it. */
export function StopTrackTable({ id }: { id: string }) {
  const doc = useDeferredValue(useDerived((s) => s.doc));
  const derived = useDeferredValue(useDerived((s) => s.derived));
  const table = useMemo(() => (doc && derived ? buildPlan(doc, derived).stopTables.find((t) => t.fixtureId === id) : undefined), [doc, derived, id]);
  const fmt = useMemo(() => formatters(doc?.settings ?? { units: "in", precision: 16 }), [doc?.settings]);
  if (!table) return null;
  return (
    <div className="rounded border border-walnut-100 bg-white/60 p-2 text-xs" data-testid="track-stop-table">
      <StopTableView table={table} fmt={fmt} compact />
      <p className="mt-1 text-walnut-500">Labels are the parts cut at each stop; the Build tab of the parts area lists every setup.</p>
    </div>
  );
}
