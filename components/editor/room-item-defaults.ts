import { obstacleSchema, openingSchema, type Obstacle, type Opening, type PlanDocument } from "@/lib/engine/plan/schema";
import { newId } from "@/lib/client/store/ids";

/**
 * Starting sizes for a new opening or obstacle (the user then types the measured ones). Garage door
 * 16 x 7 ft double (TRADE.md, practice); entry door 36 x 80 in and window 36 in wide are common
 * stock sizes (practice, from memory).
 */
export function newOpening(kind: Opening["kind"], doc: PlanDocument): Opening {
  const wallId = doc.room.walls[0].id;
  const widthMm = kind === "garage-door" ? 4877 : kind === "entry-door" ? 914 : 914;
  return openingSchema.parse({ id: newId("op"), kind, wallId, offsetMm: 300, widthMm });
}

export function newObstacle(kind: Obstacle["kind"], doc: PlanDocument): Obstacle {
  const wallId = doc.room.walls[Math.min(1, doc.room.walls.length - 1)].id;
  if (kind === "parking-bay") return obstacleSchema.parse({ id: newId("ob"), kind, placement: { mode: "free", xMm: 600, yMm: 600 } });
  if (kind === "post") return obstacleSchema.parse({ id: newId("ob"), kind, placement: { mode: "free", xMm: 1500, yMm: 1500 } });
  return obstacleSchema.parse({ id: newId("ob"), kind, placement: { mode: "wall", wallId, offsetMm: 300 } });
}

export const openingTitles: Record<Opening["kind"], string> = { "entry-door": "Entry door", "garage-door": "Garage door", window: "Window" };
export const obstacleTitles: Record<Obstacle["kind"], string> = { panel: "Electrical panel", "water-heater": "Water heater", post: "Post", outlet: "Outlet", "parking-bay": "Parking bay" };

export const openingVariant = (kind: Opening["kind"]) => openingSchema.options.find((o) => o.shape.kind.value === kind)!;
export const obstacleVariant = (kind: Obstacle["kind"]) => obstacleSchema.options.find((o) => o.shape.kind.value === kind)!;
