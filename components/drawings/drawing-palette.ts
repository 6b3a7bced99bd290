import type { DrawingLabel, FillRole } from "@/lib/engine/drawings/types";

/** How a mark of each role is painted: our own palette (walnut ink on sawdust paper). Widths are in text heights. */
export interface MarkStyle {
  fill: string;
  stroke: string;
  width: number;
  dash?: boolean;
  opacity?: number;
}

export const MARK_STYLES: Record<FillRole, MarkStyle> = {
  floor: { fill: "#f3ecdf", stroke: "none", width: 0 },
  wall: { fill: "#4b3423", stroke: "#4b3423", width: 0.04 },
  "wall-face": { fill: "#fbf8f2", stroke: "#4b3423", width: 0.06 },
  opening: { fill: "#dfe7ee", stroke: "#5b6b7d", width: 0.06 },
  "door-swing": { fill: "none", stroke: "#5b6b7d", width: 0.06, dash: true },
  fixture: { fill: "#e6d5bb", stroke: "#6b4e33", width: 0.08 },
  "fixture-above": { fill: "none", stroke: "#6b4e33", width: 0.08, dash: true },
  carcass: { fill: "#d9bf98", stroke: "#6b4e33", width: 0.05 },
  front: { fill: "#efe0c6", stroke: "#6b4e33", width: 0.05 },
  counter: { fill: "#6d6358", stroke: "#3d342b", width: 0.05 },
  shelf: { fill: "#d2b48c", stroke: "#6b4e33", width: 0.05 },
  tool: { fill: "#5b6b7d", stroke: "#2f3a45", width: 0.05 },
  track: { fill: "#9aa5b1", stroke: "#36414e", width: 0.05 },
  rack: { fill: "#a88256", stroke: "#5c4632", width: 0.05 },
  "keep-clear": { fill: "#2f7d4f", stroke: "#2f7d4f", width: 0.05, dash: true, opacity: 0.12 },
  obstacle: { fill: "#9aa5b1", stroke: "#36414e", width: 0.07 },
  leader: { fill: "none", stroke: "#4b3423", width: 0.05 },
};

/** A highlighted mark (a walk-through step's fixtures and zones): amber outline, warm fill. */
export const HIGHLIGHT: { fill: string; stroke: string; width: number } = { fill: "#fdf0cf", stroke: "#d99a1e", width: 0.2 };

export const TEXT_COLOURS: Record<DrawingLabel["kind"], string> = { name: "#2a1c12", tag: "#2a1c12", legend: "#2a1c12", "wall-name": "#4b3423", title: "#2a1c12" };
export const DIMENSION_INK = "#4b3423";
/** Paper-coloured halo under text, so it reads over any fill. */
export const HALO = "#fffdf8";
