import { planDocumentSchema, type PlanDocument } from "../lib/engine/plan/schema";

/** The demo plan: a two-car garage (20 x 22 ft, slightly out of square) of our own invention. */
export function demoDocument(): PlanDocument {
  return planDocumentSchema.parse({
    schemaVersion: 1,
    room: {
      walls: [
        { id: "w1", label: "Garage door wall", lengthMm: 6096 },
        { id: "w2", label: "Workshop wall", lengthMm: 6706 },
        { id: "w3", label: "House wall", lengthMm: 6090 },
        { id: "w4", label: "Side wall", lengthMm: 6706 },
      ],
      diagonals: [{ from: 0, to: 2, lengthMm: 9070 }],
      ceilingHeightMm: 2743,
      openings: [{ id: "gd1", kind: "garage-door", wallId: "w1", offsetMm: 700, widthMm: 4877 }],
      obstacles: [{ id: "p1", kind: "panel", placement: { mode: "wall", wallId: "w3", offsetMm: 400, elevationMm: 1200 } }],
    },
  });
}
