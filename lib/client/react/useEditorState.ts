"use client";
import { useStore } from "zustand";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { DerivedState } from "../derived/derived-store";
import type { UiState } from "../store/ui-store";
import { useEditor } from "./EditorContext";

/** A slice of the UI state; re-renders only when the slice changes. */
export function useUi<T>(select: (s: UiState) => T): T {
  return useStore(useEditor().ui, select);
}

/** A slice of the plan document. */
export function useDoc<T>(select: (d: PlanDocument) => T): T {
  return useStore(useEditor().history.store, (s) => select(s.doc));
}

/** A slice of the derived results (solved room, placed fixtures, findings). */
export function useDerived<T>(select: (s: DerivedState) => T): T {
  return useStore(useEditor().derived, select);
}

/** Whether undo / redo are possible. */
export function useHistoryFlags(): { canUndo: boolean; canRedo: boolean } {
  const ed = useEditor();
  const canUndo = useStore(ed.history.store.temporal, (t) => t.pastStates.length > 0);
  const canRedo = useStore(ed.history.store.temporal, (t) => t.futureStates.length > 0);
  return { canUndo, canRedo };
}
