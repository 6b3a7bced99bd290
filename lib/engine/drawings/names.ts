import type { Obstacle, Opening } from "../plan/schema";

/** Openings in words. */
export const OPENING_NAMES: Record<Opening["kind"], string> = { "entry-door": "Entry door", "garage-door": "Garage door", window: "Window" };

/** Obstacles in words. */
export const OBSTACLE_NAMES: Record<Obstacle["kind"], string> = { panel: "Electrical panel", "water-heater": "Water heater", post: "Post", outlet: "Outlet", "parking-bay": "Parking bay" };

/** A wall's name in words: its label, else its place in the room ("Wall 3"). */
export function wallName(label: string | undefined, index: number): string {
  return label?.trim() || `Wall ${index + 1}`;
}
