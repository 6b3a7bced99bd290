import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Placement } from "@/lib/engine/plan/schema";
import { trackNearSaw } from "@/lib/engine/fixtures/stop-track/attach";
import type { Editor } from "../editor";

/** The kind whose new fixtures attach to the saw they are placed near. */
export const TRACK_KIND = "stop-track";

/**
 * Where a new stop track goes when placed near `point` (mm): on the nearest saw station, on the side of the
 * blade the point is on (or the other side when only that one has counter room), with the saw named in its
 * parameters. Null when no saw station is near, or for other kinds.
 */
export function attachNear(ed: Editor, kind: string, params: Record<string, unknown>, point: Vec2): { placement: Placement; params: Record<string, unknown> } | null {
  if (kind !== TRACK_KIND) return null;
  const derived = ed.derived.getState().derived;
  if (!derived) return null;
  const a = trackNearSaw(ed.doc, derived, point, params);
  return a ? { placement: a.placement, params: { ...params, sawId: a.sawId, side: a.side, ...(a.lengthMm ? { lengthMm: a.lengthMm } : {}) } } : null;
}
