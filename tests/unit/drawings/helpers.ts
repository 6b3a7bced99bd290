import type { Drawing } from "@/lib/engine/drawings/types";

/** Every label and legend entry that names a given plan object: a name label, or a tag with its legend line. */
export function namings(d: Drawing, ref: string): string[] {
  const names = d.labels.filter((l) => l.ref === ref && l.kind === "name").map((l) => l.text);
  const legend = d.legend.filter((e) => e.ref === ref).map((e) => e.text);
  return [...names, ...legend];
}

/** The box around a drawing's shapes for one plan object, sheet mm. */
export function boxOf(d: Drawing, ref: string): { x0: number; x1: number; y0: number; y1: number } {
  const pts = d.shapes.filter((s) => s.ref === ref && s.role !== "leader").flatMap((s) => s.points);
  return { x0: Math.min(...pts.map((p) => p.x)), x1: Math.max(...pts.map((p) => p.x)), y0: Math.min(...pts.map((p) => p.y)), y1: Math.max(...pts.map((p) => p.y)) };
}
