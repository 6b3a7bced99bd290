"use client";
import { useDeferredValue } from "react";
import { PartsView } from "@/components/parts/PartsView";
import { useDoc } from "@/lib/client/react/useEditorState";

/** The parts, sheet maps, boards and shopping list of the plan being edited (follows edits, a step behind during drags). */
export function PartsTab() {
  const doc = useDeferredValue(useDoc((d) => d));
  return <PartsView plan={doc} />;
}
