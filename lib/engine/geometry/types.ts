import type { Mm } from "../units/length";

/** A point or vector on the floor plane, millimetres. x and y on the floor; z is up. */
export interface Vec2 {
  x: number;
  y: number;
}

/**
 * An upright prism in world space: a convex floor polygon (counter-clockwise, mm) extruded from
 * zMin to zMax (mm above the floor). Fixture boxes, keep-clear zones and obstacles all use it.
 */
export interface Prism {
  polygon: Vec2[];
  zMin: Mm;
  zMax: Mm;
}

/** An axis-aligned box in a fixture's local frame (mm): x along its width from its left end, y from its back (the wall) toward the room, z up from its base. */
export interface LocalBox {
  x: number;
  y: number;
  z: number;
  w: number;
  d: number;
  h: number;
  /** What the box is, for drawing: carcass, counter, drawer-front, toe-kick, tool, shelf, track... */
  role: string;
  /** Optional label shown on hover. */
  label?: string;
}

/** Axis-aligned bounds on the floor plane, mm. */
export interface Bounds2 {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}
