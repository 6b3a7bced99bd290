import type { SolvedWall } from "@/lib/engine/room/types";
import type { Footprint, PlacedFixture } from "@/lib/engine/fixtures/types";
import type { FixtureDoc, PlanDocument } from "@/lib/engine/plan/schema";
import { followSaws } from "@/lib/engine/fixtures/stop-track/follow";
import { createDerivedStore, recompute, type Analyser, type DerivedStore } from "./derived/derived-store";
import type { AdoptedPreset, EnginePort } from "./engine-port";
import { createPlanStore, PlanHistory, type DocRecipe } from "./store/plan-store";
import { gridStepFor } from "./store/grid-steps";
import { createUiStore, type UiState, type UiStore } from "./store/ui-store";
import { ToolController } from "./tools/controller";

export interface EditorInit {
  doc: PlanDocument;
  engine: EnginePort;
  ui?: Partial<UiState>;
}

/**
 * The editor's one object: the undoable document, the derived results, the UI state and the
 * active tool. Components and tests talk to it; it knows nothing of React or three.
 */
export class Editor {
  readonly history: PlanHistory;
  readonly ui: UiStore;
  readonly derived: DerivedStore;
  readonly engine: EnginePort;
  readonly tools: ToolController;
  private readonly unsub: () => void;
  private readonly analyse: Analyser;
  private presetInForce: AdoptedPreset | null = null;

  constructor(init: EditorInit) {
    this.engine = init.engine;
    this.history = new PlanHistory(createPlanStore(init.doc));
    this.ui = createUiStore(init.ui);
    this.derived = createDerivedStore();
    this.analyse = this.engine.createAnalyser({ preset: () => this.presetInForce });
    recompute(this.derived, this.analyse, init.doc);
    this.followSaws(true);
    this.unsub = this.history.store.subscribe((s) => {
      recompute(this.derived, this.analyse, s.doc);
      if (this.followSaws(false)) return;
      this.pruneSelection(s.doc);
    });
    this.tools = new ToolController(this);
  }

  dispose(): void {
    this.unsub();
  }

  /** The adopted preset whose numbers the live checks use (null: the standard numbers). */
  get preset(): AdoptedPreset | null {
    return this.presetInForce;
  }

  /** Puts a preset's numbers in force (or none) and checks the plan again with them. */
  setPreset(preset: AdoptedPreset | null): void {
    if (preset === this.presetInForce) return;
    this.presetInForce = preset;
    this.ui.setState({ presetName: preset?.name ?? null });
    recompute(this.derived, this.analyse, this.doc, true);
  }

  get doc(): PlanDocument {
    return this.history.doc;
  }

  edit(recipe: DocRecipe): boolean {
    return this.history.edit(recipe);
  }

  get selection(): string[] {
    return this.ui.getState().selection;
  }

  select(ids: string[]): void {
    this.ui.setState({ selection: [...new Set(ids)] });
  }

  toggleSelected(id: string): void {
    const sel = this.selection;
    this.select(sel.includes(id) ? sel.filter((x) => x !== id) : [...sel, id]);
  }

  announce(text: string): void {
    this.ui.setState({ announcement: text });
  }

  fixture(id: string): FixtureDoc | undefined {
    return this.doc.fixtures.find((f) => f.id === id);
  }

  placed(id: string): PlacedFixture | undefined {
    return this.derived.getState().fixtureById.get(id);
  }

  wall(wallId: string): SolvedWall | undefined {
    return this.derived.getState().derived?.room.walls.find((w) => w.id === wallId);
  }

  /** Outer size of a fixture, from the derived plan, or from its kind when not derived yet. */
  footprint(id: string): Footprint | undefined {
    const p = this.placed(id);
    if (p) return p.footprint;
    const f = this.fixture(id);
    return f ? this.engine.footprint(f.kind, f.params, this.doc) : undefined;
  }

  /** The grid step in force for dragging, placing and nudging, mm (`big`: the Shift step). It follows the plan's units. */
  gridStepMm(big = false): number {
    return gridStepFor(this.doc.settings.units, this.ui.getState().gridSize, big);
  }

  formatLength(mm: number): string {
    return this.engine.formatLength(mm, this.doc.settings);
  }

  /** Asks the view to frame these fixtures (none: the whole room). */
  frame(ids: string[] = []): void {
    const n = this.ui.getState().frameRequest.n + 1;
    this.ui.setState({ frameRequest: { ids, n } });
  }

  /**
   * Stop tracks follow their saws: after a change, write where derive put each attached track into the document,
   * as part of the same undo step (on load, without one). True when the document changed.
   */
  private followSaws(loading: boolean): boolean {
    const d = this.derived.getState();
    if (!d.derived || d.doc !== this.doc) return false;
    const next = followSaws(this.doc, d.derived);
    if (next === this.doc) return false;
    if (loading) {
      this.history.replace(next);
      recompute(this.derived, this.analyse, next);
    } else this.history.amend(next);
    return true;
  }

  private pruneSelection(doc: PlanDocument): void {
    const sel = this.selection;
    if (sel.length === 0) return;
    const alive = sel.filter((id) => doc.fixtures.some((f) => f.id === id));
    if (alive.length !== sel.length) this.ui.setState({ selection: alive });
  }
}
