import { createStore } from "zustand/vanilla";
import { temporal } from "zundo";
import type { PlanDocument } from "@/lib/engine/plan/schema";

/** The undoable part of the editor: the plan document only. Selection and view live elsewhere. */
export interface PlanState {
  doc: PlanDocument;
}

export type DocRecipe = (doc: PlanDocument) => PlanDocument;

/** History depth: enough for a long session, bounded so memory stays flat. */
const HISTORY_LIMIT = 300;

/** Creates the document store with undo/redo; history keeps documents by reference (edits are immutable). */
export function createPlanStore(doc: PlanDocument) {
  return createStore<PlanState>()(
    temporal(() => ({ doc }), {
      partialize: (s) => ({ doc: s.doc }),
      equality: (a, b) => a.doc === b.doc,
      limit: HISTORY_LIMIT,
    }),
  );
}

export type PlanStore = ReturnType<typeof createPlanStore>;

/**
 * Wraps the store with edit, undo/redo and gestures. A gesture (a drag) writes the document live
 * with history paused and records one undo step when it ends.
 */
export class PlanHistory {
  private gestureStart: PlanDocument | null = null;

  constructor(readonly store: PlanStore) {}

  get doc(): PlanDocument {
    return this.store.getState().doc;
  }

  get inGesture(): boolean {
    return this.gestureStart !== null;
  }

  /** Applies an edit; one undo step unless a gesture is running. Returns true when something changed. */
  edit(recipe: DocRecipe): boolean {
    const before = this.doc;
    const after = recipe(before);
    if (after === before) return false;
    this.store.setState({ doc: after });
    return true;
  }

  /**
   * Replaces the current document without a history step of its own: the change belongs to the edit that led
   * to it (a stop track following the saw the user moved), so one undo takes both back.
   */
  amend(doc: PlanDocument): void {
    if (doc === this.doc) return;
    const t = this.store.temporal.getState();
    const tracking = t.isTracking;
    if (tracking) t.pause();
    this.store.setState({ doc });
    if (tracking) t.resume();
  }

  beginGesture(): void {
    if (this.gestureStart) return;
    this.gestureStart = this.doc;
    this.store.temporal.getState().pause();
  }

  /** Ends the gesture: the whole gesture becomes a single undo step (none if nothing changed). */
  endGesture(): void {
    const start = this.gestureStart;
    if (!start) return;
    this.gestureStart = null;
    const final = this.doc;
    const t = this.store.temporal.getState();
    if (final === start) {
      t.resume();
      return;
    }
    this.store.setState({ doc: start });
    t.resume();
    this.store.setState({ doc: final });
  }

  cancelGesture(): void {
    const start = this.gestureStart;
    if (!start) return;
    this.gestureStart = null;
    this.store.setState({ doc: start });
    this.store.temporal.getState().resume();
  }

  undo(): void {
    if (this.inGesture) this.cancelGesture();
    this.store.temporal.getState().undo();
  }

  redo(): void {
    if (this.inGesture) return;
    this.store.temporal.getState().redo();
  }

  canUndo(): boolean {
    return this.store.temporal.getState().pastStates.length > 0;
  }

  canRedo(): boolean {
    return this.store.temporal.getState().futureStates.length > 0;
  }

  /** Replaces the document and forgets history (loading a newer version from the server). */
  replace(doc: PlanDocument): void {
    this.gestureStart = null;
    const t = this.store.temporal.getState();
    t.pause();
    this.store.setState({ doc });
    t.clear();
    t.resume();
  }
}
