import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { DrawingSvg } from "@/components/drawings/DrawingSvg";
import { planDrawingsOrNull } from "@/lib/engine/drawings/plan-drawings";
import { scaleBar } from "@/lib/engine/drawings/scale-bar";
import type { PlanDocument } from "@/lib/engine/plan/schema";

export interface DrawingFileInput {
  doc: PlanDocument;
  /** "plan" for the plan view, else a wall's id for its elevation. */
  which: { kind: "plan" } | { kind: "wall"; wallId: string };
}

export interface DrawingFile {
  svg: string;
  /** What it shows, for the file name: "plan" or the wall's name. */
  name: string;
}

/**
 * The plan view or one wall's elevation as a standalone SVG file: the same drawing objects and the
 * same SVG mapping as the pages (components/drawings/DrawingSvg.tsx), with a scale bar. Null when
 * the room cannot be drawn or the wall is not in the plan.
 */
export function drawingFile(input: DrawingFileInput): DrawingFile | null {
  const all = planDrawingsOrNull(input.doc);
  if (!all) return null;
  const { which } = input;
  const drawing = which.kind === "plan" ? all.plan : all.elevations.find((d) => d.wallId === which.wallId);
  if (!drawing) return null;
  const scale = scaleBar(drawing, { units: input.doc.settings.units, precision: input.doc.settings.precision });
  const body = renderToStaticMarkup(createElement(DrawingSvg, { drawing, scale, standalone: true }));
  return { svg: `<?xml version="1.0" encoding="UTF-8"?>\n${body}\n`, name: which.kind === "plan" ? "plan" : (drawing.wallName ?? "wall") };
}
