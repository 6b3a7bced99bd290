import type { HardwareItem, Part, PlacedFixture, WorldZone } from "./fixtures/types";
import type { Prism } from "./geometry/types";
import type { SolvedRoom } from "./room/types";

/** An obstacle or opening resolved into the room. */
export interface PlacedObstacle {
  id: string;
  kind: string;
  body: Prism;
}

/** Everything derived from a plan document by pure functions. */
export interface Derived {
  room: SolvedRoom;
  fixtures: PlacedFixture[];
  obstacles: PlacedObstacle[];
  /** Fixture zones and room zones together. */
  zones: WorldZone[];
  parts: Part[];
  hardware: HardwareItem[];
}
