import { derivePlan } from "../derive";
import { followSaws } from "../fixtures/stop-track/follow";
import { newPlanDocument } from "../plan/defaults";
import type { FixtureDoc, Obstacle, Opening, PlanDocument } from "../plan/schema";
import { planDocumentSchema } from "../plan/schema";
import { inches } from "../units/length";

const wall = (wallId: string, offsetMm: number, elevationMm = 0) => ({ mode: "wall" as const, wallId, offsetMm, elevationMm });

/**
 * A demo plan of our own: the default two-car garage (6.1 x 6.7 m) with one bay still parked. Along the back
 * wall a run of base cabinets with a compact miter saw on a tool shelf flush between them and a stop track on
 * the counters to the saw's left; wall cabinets over the counters on its right; a shelf run on the left wall; a lumber rack and
 * the electrical panel on the right wall; a water heater in the back-left corner. All numbers invented for the demo.
 */
export function demoPlan(): PlanDocument {
  const base = newPlanDocument();
  const cab = inches(30);
  const runStart = 600;
  const shelfParams = { preset: "compact-miter-saw", widthMm: inches(32) };
  const sawAt = runStart + 2 * cab;
  const rightAt = sawAt + shelfParams.widthMm;
  const fixtures: Partial<FixtureDoc>[] = [
    { id: "cab-1", kind: "base-cabinet", label: "Drawer bank", placement: wall("w3", runStart), params: {} },
    { id: "cab-2", kind: "base-cabinet", label: "Drawers and doors", placement: wall("w3", runStart + cab), params: { sections: [{ fill: "drawers", drawerCount: 3, drawerHeights: "equal" }, { fill: "doors", shelfCount: 1 }] } },
    { id: "saw", kind: "tool-shelf", label: "Miter saw station", placement: wall("w3", sawAt), params: shelfParams },
    { id: "cab-3", kind: "base-cabinet", label: "Left counter", placement: wall("w3", rightAt), params: { sections: [{ fill: "drawers", drawerCount: 5 }] } },
    { id: "cab-4", kind: "base-cabinet", label: "Left counter, end", placement: wall("w3", rightAt + cab), params: { sections: [{ fill: "open", shelfCount: 2 }] } },
    {
      id: "stops",
      kind: "stop-track",
      label: "Stop track",
      // On the saw, on the counters further along the wall (the left as you face the back wall): the engine
      // places it from the saw (height, fence line, start at the bay's end); followSaws writes that placement.
      placement: wall("w3", rightAt),
      params: { sawId: "saw", side: "left", lengthMm: inches(48), stops: ["A", "B"], cutLengthsMm: [18, 24, 30.5, 42].map(inches) },
    },
    { id: "upper-1", kind: "wall-cabinet", label: "Upper cabinet", placement: wall("w3", runStart), params: {} },
    { id: "upper-2", kind: "wall-cabinet", label: "Upper cabinet", placement: wall("w3", runStart + cab), params: {} },
    { id: "shelves", kind: "shelf-run", label: "Finishing shelves", placement: wall("w4", 1000), params: { bays: 2, spanMm: inches(30), materialId: "ply-18", loadLbPerFt: 15 } },
    { id: "rack", kind: "lumber-rack", label: "Lumber rack", placement: wall("w2", 1500), params: { levels: 4, bottomMm: inches(30) } },
    { id: "cleats", kind: "cleat-wall", label: "Cleat wall", placement: wall("w4", 3200), params: { widthMm: inches(48) } },
  ];
  const openings: Opening[] = [
    { id: "garage-door", kind: "garage-door", wallId: "w1", offsetMm: 600, widthMm: 4877, heightMm: 2134, trackDepthMm: 3300, trackDropMm: 380 },
    { id: "house-door", kind: "entry-door", wallId: "w4", offsetMm: 4500, widthMm: 914, heightMm: 2032, hinge: "right", swing: "in" },
  ];
  const obstacles: Obstacle[] = [
    { id: "panel", kind: "panel", placement: wall("w2", 4500, 1200), widthMm: 380, heightMm: 760, depthMm: 100, voltageClass: "0-150", condition: 1 },
    { id: "heater", kind: "water-heater", placement: { mode: "free", xMm: 40, yMm: 6100, rotationDeg: 0, elevationMm: 0 }, diameterMm: 560, heightMm: 1500 },
    { id: "car", kind: "parking-bay", placement: wall("w1", 600), vehicleLengthMm: 4900, vehicleWidthMm: 1900, doorSwingMm: 760 },
  ];
  const plan = planDocumentSchema.parse({ ...base, room: { ...base.room, openings, obstacles }, fixtures });
  return followSaws(plan, derivePlan(plan));
}
