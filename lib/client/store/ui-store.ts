import { createStore } from "zustand/vanilla";
import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Placement } from "@/lib/engine/plan/schema";
import type { GridSize } from "./grid-steps";

export type ViewMode = "orbit" | "plan" | "elevation";
export type PanelTab = "room" | "layout" | "checks" | "parts" | "history";

/** A fixture about to be placed, shown as a ghost under the pointer. */
export interface Ghost {
  kind: string;
  placement: Placement;
}

/** A tape measure laid in the view: two floor points, mm. */
export interface Measurement {
  from: Vec2;
  to: Vec2;
  done: boolean;
}

/** Editor state that is not part of the document and is never undone. */
/** The keep-clear zone under the pointer, and where the pointer is on the canvas (CSS px from its top left; w, h: the canvas size). */
export interface ZoneHover {
  id: string;
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface UiState {
  selection: string[];
  hovered: string | null;
  /** Set only while idle (never during a drag), so hovering costs nothing while moving fixtures. */
  hoveredZone: ZoneHover | null;
  view: ViewMode;
  /** The wall shown in elevation view. */
  elevationWallId: string | null;
  /** Bumped to ask the camera to frame these fixtures (empty: the whole room). */
  frameRequest: { ids: string[]; n: number };
  /** Fine or normal grid; the steps themselves follow the plan's units (grid-steps.ts). */
  gridSize: GridSize;
  snapping: boolean;
  /** Draw every keep-clear zone, not only failing ones, the room's and the selection's. */
  showAllZones: boolean;
  /** Draw the dimension strings in the plan and elevation views. */
  showDimensions: boolean;
  tool: string;
  /** The fixture kind chosen in the catalogue while placing. */
  placingKind: string | null;
  ghost: Ghost | null;
  measurement: Measurement | null;
  helpOpen: boolean;
  tab: PanelTab;
  /** The name of the class preset whose numbers the checks use, when one is in force. */
  presetName: string | null;
  /** Polite live-region text for screen readers (what the last command did). */
  announcement: string;
}

export function createUiStore(init: Partial<UiState> = {}) {
  return createStore<UiState>()(() => ({
    selection: [],
    hovered: null,
    hoveredZone: null,
    view: "orbit",
    elevationWallId: null,
    frameRequest: { ids: [], n: 0 },
    gridSize: "normal",
    snapping: true,
    showAllZones: false,
    showDimensions: true,
    tool: "idle",
    placingKind: null,
    ghost: null,
    measurement: null,
    helpOpen: false,
    tab: "layout",
    announcement: "",
    presetName: null,
    ...init,
  }));
}

export type UiStore = ReturnType<typeof createUiStore>;
