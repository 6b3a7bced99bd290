import type { Vec2 } from "../geometry/types";
import type { PlanDocument, PlanDocumentInput } from "../plan/schema";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "../plan/schema";
import type { SolvedRoom } from "../room/types";
import { roomZones } from "../zones";
import { DEFAULT_RULE_NUMBERS as N } from "./numbers";

/**
 * Small drawings for the rule pages, in mm. Plan views look down with the wall at the top and y
 * running into the room; elevations look at the wall with z up. Room-zone rules are drawn from the
 * same zone functions the checks use; fixture rules from boxes sized by the same default numbers.
 */
export interface DiagramShape {
  polygon: Vec2[];
  role: "wall" | "fixture" | "zone" | "obstacle" | "blocked" | "stock" | "person";
  label?: string;
}

export interface DiagramDim {
  from: Vec2;
  to: Vec2;
  label: string;
}

export interface RuleDiagram {
  view: "plan" | "elevation";
  caption: string;
  shapes: DiagramShape[];
  dims: DiagramDim[];
}

const IN = 25.4;
const rect = (x: number, y: number, w: number, d: number): Vec2[] => [
  { x, y },
  { x: x + w, y },
  { x: x + w, y: y + d },
  { x, y: y + d },
];
const box = (role: DiagramShape["role"], x: number, y: number, w: number, d: number, label?: string): DiagramShape => ({ polygon: rect(x, y, w, d), role, label });
const wallLine = (x0: number, x1: number): DiagramShape => box("wall", x0, -100, x1 - x0, 100);

/** A straight room for room-zone drawings: 6 x 6 m, walls w1..w4 counter-clockwise from the origin. */
function sampleRoom(): SolvedRoom {
  const c = [
    { x: 0, y: 0 },
    { x: 6000, y: 0 },
    { x: 6000, y: 6000 },
    { x: 0, y: 6000 },
  ];
  return {
    corners: c,
    walls: c.map((start, i) => {
      const end = c[(i + 1) % 4];
      const len = Math.hypot(end.x - start.x, end.y - start.y);
      const dir = { x: (end.x - start.x) / len, y: (end.y - start.y) / len };
      return { id: `w${i + 1}`, index: i, start, end, dir, inward: { x: -dir.y, y: dir.x }, lengthMm: len };
    }),
    ceilingHeightMm: 2743,
    report: { cornerAnglesDeg: [90, 90, 90, 90], offSquareDeg: [0, 0, 0, 0], diagonalDifferenceMm: 0, closureErrorMm: 0, method: "assumed-square", notes: [] },
  };
}

function samplePlan(room: Partial<PlanDocumentInput["room"]>): PlanDocument {
  return planDocumentSchema.parse({
    schemaVersion: PLAN_SCHEMA_VERSION,
    room: { walls: ["w1", "w2", "w3", "w4"].map((id) => ({ id, lengthMm: 6000 })), ...room },
  });
}

/** The zones as shapes; thin ones (a panel's dedicated space) go unlabelled so their text does not cover the drawing. */
function zonesAsShapes(plan: PlanDocument): DiagramShape[] {
  return roomZones(plan, sampleRoom()).map((z) => ({
    polygon: z.prism.polygon,
    role: z.purpose === "parking-vehicle" ? "obstacle" : "zone",
    label: z.purpose === "panel-dedicated-space" ? undefined : z.label,
  }));
}

/** The drawing for a rule, or null when a picture would not help (advice rules). */
export function ruleDiagram(ruleId: string): RuleDiagram | null {
  switch (ruleId) {
    case "panel-working-space": {
      const plan = samplePlan({ obstacles: [{ id: "panel", kind: "panel", placement: { mode: "wall", wallId: "w1", offsetMm: 1000, elevationMm: 1200 }, widthMm: 380, heightMm: 760, depthMm: 100, voltageClass: "0-150", condition: 1 }] });
      return {
        view: "plan",
        caption: "Plan view: the working space in front of a 0-150 V panel. The panel's own width and depth (its dedicated space) stay clear from the floor to 6 ft above it.",
        shapes: [wallLine(600, 1800), ...zonesAsShapes(plan), box("obstacle", 1000, 0, 380, 100, "Panel")],
        dims: [
          { from: { x: 1190 - 381, y: 1100 }, to: { x: 1190 + 381, y: 1100 }, label: "30 in min." },
          { from: { x: 1650, y: 100 }, to: { x: 1650, y: 100 + N.panelDepthLowVoltageMm }, label: "3 ft" },
        ],
      };
    }
    case "openings-clear": {
      const plan = samplePlan({ openings: [{ id: "door", kind: "entry-door", wallId: "w1", offsetMm: 600, widthMm: 915, heightMm: 2032, hinge: "left", swing: "in" }] });
      return {
        view: "plan",
        caption: "Plan view: an in-swinging entry door; its whole swing stays clear.",
        shapes: [wallLine(300, 1800), ...zonesAsShapes(plan), box("blocked", 1400, 0, 400, 610, "Cabinet in the swing")],
        dims: [{ from: { x: 600, y: -200 }, to: { x: 1515, y: -200 }, label: "door width = swing radius" }],
      };
    }
    case "parking-bay": {
      const plan = samplePlan({ obstacles: [{ id: "bay", kind: "parking-bay", placement: { mode: "wall", wallId: "w1", offsetMm: 0, elevationMm: 0 }, vehicleLengthMm: 4900, vehicleWidthMm: 1900, doorSwingMm: 760 }] });
      return {
        view: "plan",
        caption: "Plan view: the vehicle and a strip each side to open a door and step out.",
        shapes: [wallLine(0, 3420), ...zonesAsShapes(plan)],
        dims: [
          { from: { x: 0, y: 5100 }, to: { x: 760, y: 5100 }, label: "door" },
          { from: { x: 3620, y: 0 }, to: { x: 3620, y: 4900 }, label: "vehicle length" },
        ],
      };
    }
    case "walkway": {
      const D = 610;
      const aisle = N.walkwayMm;
      return {
        view: "plan",
        caption: "Plan view: counters on facing walls; the clear width between their fronts.",
        shapes: [wallLine(0, 2400), box("fixture", 0, 0, 2400, D, "Counter run"), box("zone", 0, D, 2400, aisle, "Walkway"), box("fixture", 0, D + aisle, 2400, D, "Bench run")],
        dims: [
          { from: { x: 1800, y: D }, to: { x: 1800, y: D + aisle }, label: "36 in (never < 28 in)" },
        ],
      };
    }
    case "stock-path": {
      const L = N.longestStockMm;
      const blade = 0;
      return {
        view: "plan",
        caption: "Plan view: the longest board each side of the blade; counters at table height carry at least half of it.",
        shapes: [
          wallLine(-L - 200, L + 200),
          box("fixture", -L / 2 - 300, 0, L / 2, 610, "Counter"),
          box("fixture", -300, 0, 600, 610, "Miter station"),
          box("fixture", 300, 0, L / 2, 610, "Counter"),
          box("stock", blade - L, 100, L, 140, "Stock path"),
          box("stock", blade, 100, L, 140),
          box("blocked", L - 600, 0, 300, 300, "Rack"),
        ],
        dims: [
          { from: { x: blade, y: 700 }, to: { x: blade + L, y: 700 }, label: "longest stock" },
          { from: { x: blade - L / 2, y: 700 }, to: { x: blade, y: 700 }, label: "half, supported" },
        ],
      };
    }
    case "saw-infeed-outfeed": {
      const L = N.longestStockMm;
      return {
        view: "plan",
        caption: "Plan view: a table saw on a mobile base with infeed and outfeed zones the length of the longest board.",
        shapes: [box("zone", -250, -L, 700, L, "Infeed"), box("fixture", -300, 0, 800, 700, "Table saw"), box("zone", -250, 700, 700, L, "Outfeed")],
        dims: [{ from: { x: 600, y: 700 }, to: { x: 600, y: 700 + L }, label: "outfeed" }],
      };
    }
    case "pull-out":
      return {
        view: "plan",
        caption: "Plan view: a drawer pulled out its full slide length must not meet anything.",
        shapes: [wallLine(0, 1400), box("fixture", 0, 0, 600, 610, "Drawer cabinet"), box("zone", 20, 610, 560, 508, "Pull-out"), box("fixture", 700, 0, 600, 610, "Neighbour")],
        dims: [{ from: { x: -120, y: 610 }, to: { x: -120, y: 1118 }, label: "20 in slide" }],
      };
    case "collisions":
      return {
        view: "plan",
        caption: "Plan view: two bodies may touch but not overlap.",
        shapes: [wallLine(0, 1500), box("fixture", 0, 0, 800, 610, "Cabinet"), box("blocked", 700, 0, 800, 610, "Overlaps")],
        dims: [],
      };
    case "in-room":
      return {
        view: "plan",
        caption: "Plan view: a fixture drawn past the wall line.",
        shapes: [box("wall", -100, -100, 100, 1500), box("blocked", -60, 300, 600, 610, "Through the wall")],
        dims: [],
      };
    case "table-flush":
      return {
        view: "elevation",
        caption: "Elevation: the saw table lands flush with the counters either side.",
        shapes: [
          box("fixture", -1200, 0, 1000, 914, "Counter"),
          box("fixture", -200, 0, 400, 914 - 100, "Tool shelf"),
          box("stock", -180, 814, 360, 100, "Saw table"),
          box("fixture", 200, 0, 1000, 914, "Counter"),
        ],
        dims: [{ from: { x: 1300, y: 0 }, to: { x: 1300, y: 914 }, label: "same height, within 1/32 in" }],
      };
    case "counter-height": {
      const elbow = N.elbowHeightMm;
      return {
        view: "elevation",
        caption: "Elevation: light work 10-15 cm below the elbow, heavy work 15-40 cm below.",
        shapes: [
          box("fixture", 0, 0, 800, 914, "Counter"),
          box("zone", 1400, elbow - 150, 600, 50, "Light work"),
          box("zone", 1400, elbow - 400, 600, 250, "Heavy work"),
          box("person", 900, 0, 300, 1755, "You"),
          box("stock", 0, elbow - 4, 2000, 8, "Elbow height"),
        ],
        dims: [{ from: { x: -100, y: 914 }, to: { x: -100, y: elbow }, label: "below elbow" }],
      };
    }
    case "wall-cabinet-clearance":
      return {
        view: "elevation",
        caption: "Elevation: 18 in from the counter to the wall cabinet; the saw head needs its own space.",
        shapes: [box("fixture", 0, 0, 1200, 914, "Counter"), box("fixture", 0, 914 + N.wallCabinetGapMm, 1200, 760, "Wall cabinet"), box("zone", 1300, 914, 600, 600, "Saw head")],
        dims: [{ from: { x: -100, y: 914 }, to: { x: -100, y: 914 + N.wallCabinetGapMm }, label: "18 in" }],
      };
    case "reach":
      return {
        view: "elevation",
        caption: "Elevation: shelves above 48 in (44 in over a deep counter) are beyond the ADA forward-reach reference.",
        shapes: [box("person", 900, 0, 300, 1755, "You"), box("fixture", 0, 0, 800, 2000, "Shelves"), box("zone", 0, N.reachMaxMm, 800, 2000 - N.reachMaxMm, "Above 48 in")],
        dims: [{ from: { x: -100, y: 0 }, to: { x: -100, y: N.reachMaxMm }, label: "48 in" }],
      };
    case "shelf-sag": {
      const span = 36 * IN;
      const sag = 60; // exaggerated for the drawing
      const top: Vec2[] = [];
      for (let i = 0; i <= 12; i++) {
        const x = (span * i) / 12;
        top.push({ x, y: 300 - sag * Math.sin((Math.PI * i) / 12) });
      }
      const bottom = top.map((p) => ({ x: p.x, y: p.y - 19 })).reverse();
      return {
        view: "elevation",
        caption: "Elevation: a loaded shelf between two supports (sag exaggerated); the guide is 0.02 in per foot of span.",
        shapes: [box("fixture", -19, 0, 19, 400), box("fixture", span, 0, 19, 400), { polygon: [...top, ...bottom], role: "stock", label: "Shelf" }],
        dims: [{ from: { x: 0, y: 360 }, to: { x: span, y: 360 }, label: "span" }],
      };
    }
    case "stop-reach":
      return {
        view: "plan",
        caption: "Plan view: a stop can be set from the track's near end to its far end less the stop's width.",
        shapes: [box("fixture", -300, 0, 600, 610, "Miter station"), box("fixture", 300, 0, 1800, 610, "Counter"), box("stock", 350, 20, 1219, 38, "Stop track")],
        dims: [{ from: { x: 0, y: 700 }, to: { x: 1569, y: 700 }, label: "longest setting" }],
      };
    default:
      return null;
  }
}
