import type { WorldZone } from "../fixtures/types";
import type { Opening } from "../plan/schema";
import { mm } from "../units/length";
import { rectPrism, toWorld, type Frame } from "./frame";

/** Segments used to draw the quarter circle of a door swing (a convex polygon). */
const SWING_SEGMENTS = 8;
/** Depth in front of an out-swinging door kept clear to step through, 30 in (practice). */
const DOORWAY_DEPTH_MM = 762;
/** How far the sections of an overhead door travel into the room through the track's curve, 12 in (practice, approximate). */
const GARAGE_CURVE_DEPTH_MM = 305;
/** Depth in front of a window kept below its sill, 4 in (our own choice: a fixture this close covers it). */
const WINDOW_DEPTH_MM = 100;

/** Keep-clear zones of one opening: door swing or doorway, overhead door travel and track, window. */
export function openingZones(op: Opening, f: Frame, ceilingMm: number): WorldZone[] {
  if (op.kind === "entry-door") {
    if (op.swing === "out") {
      return [{ id: `${op.id}:doorway`, ownerId: op.id, purpose: "doorway", label: "Doorway", prism: rectPrism(f, 0, 0, op.widthMm, DOORWAY_DEPTH_MM, 0, op.heightMm) }];
    }
    // Quarter circle of radius = door width, centred on the hinge jamb. The hinge side is as seen from inside
    // the room facing the door: the wall's local +x (toward its end corner) is that person's left.
    const hx = op.hinge === "left" ? op.widthMm : 0;
    const toward = op.hinge === "left" ? -1 : 1;
    const pts = [toWorld(f, hx, 0)];
    for (let i = 0; i <= SWING_SEGMENTS; i++) {
      const a = (i / SWING_SEGMENTS) * (Math.PI / 2);
      pts.push(toWorld(f, hx + toward * op.widthMm * Math.cos(a), op.widthMm * Math.sin(a)));
    }
    // Keep the outline counter-clockwise whichever side the hinge is on.
    const polygon = toward > 0 ? pts : [pts[0], ...pts.slice(1).reverse()];
    return [{ id: `${op.id}:swing`, ownerId: op.id, purpose: "entry-door-swing", label: "Door swing", prism: { polygon, zMin: mm(0), zMax: mm(op.heightMm) } }];
  }
  if (op.kind === "garage-door") {
    const trackBottom = Math.min(op.heightMm, ceilingMm - op.trackDropMm);
    return [
      {
        id: `${op.id}:opening`,
        ownerId: op.id,
        purpose: "garage-door-opening",
        label: "Overhead door travel",
        prism: rectPrism(f, 0, 0, op.widthMm, GARAGE_CURVE_DEPTH_MM, 0, op.heightMm),
      },
      {
        id: `${op.id}:track`,
        ownerId: op.id,
        purpose: "garage-door-track",
        label: "Overhead door track and open door",
        prism: rectPrism(f, 0, 0, op.widthMm, op.trackDepthMm, trackBottom, ceilingMm),
      },
    ];
  }
  return [
    {
      id: `${op.id}:window`,
      ownerId: op.id,
      purpose: "window",
      label: "Window",
      prism: rectPrism(f, 0, 0, op.widthMm, WINDOW_DEPTH_MM, op.sillMm, op.sillMm + op.heightMm),
    },
  ];
}
