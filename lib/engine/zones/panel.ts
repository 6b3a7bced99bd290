import type { WorldZone } from "../fixtures/types";
import type { Obstacle } from "../plan/schema";
import { feet, inches } from "../units/length";
import { rectPrism, type Frame } from "./frame";

type Panel = Extract<Obstacle, { kind: "panel" }>;

/** Working-space depth, mm, from NEC Table 110.26(A)(1): 0-150 V 3 ft; 151-600 V 3 / 3.5 / 4 ft by condition. */
export function panelDepthMm(voltageClass: Panel["voltageClass"], condition: 1 | 2 | 3): number {
  if (voltageClass === "0-150") return feet(3);
  return [feet(3), feet(3.5), feet(4)][condition - 1];
}

/** Working-space width, mm: 30 in or the equipment width, whichever is greater (NEC 110.26(A)(2)). */
export const panelWidthMm = (equipmentWidthMm: number) => Math.max(inches(30), equipmentWidthMm);

/** Working-space height, mm above the floor: 6.5 ft or the equipment's top, whichever is greater (NEC 110.26(A)(3)). */
export const panelHeadroomMm = (equipmentTopMm: number) => Math.max(feet(6.5), equipmentTopMm);

/**
 * The two zones of an electrical panel: the working space in front of it (NEC 110.26(A)) and the
 * dedicated space its own width and depth from the floor to 6 ft above it or the ceiling
 * (NEC 110.26(E)(1)(a)). The working space need not be centred: it is centred on the panel and
 * slid along the wall only as far as the wall's ends demand.
 */
export function panelZones(p: Panel, f: Frame, ceilingMm: number): WorldZone[] {
  const depth = panelDepthMm(p.voltageClass, p.condition);
  const width = panelWidthMm(p.widthMm);
  const top = f.z0 + p.heightMm;
  let x0 = p.widthMm / 2 - width / 2;
  // Slide inside the wall when the panel sits near a corner (the wall ends at -before and +after).
  if (x0 < -f.before) x0 = -f.before;
  if (x0 + width > f.after) x0 = Math.max(-f.before, f.after - width);
  const x1 = Math.min(x0 + width, f.after);
  return [
    {
      id: `${p.id}:working-space`,
      ownerId: p.id,
      purpose: "panel-working-space",
      label: "Panel working space (NEC 110.26(A))",
      prism: rectPrism(f, x0, p.depthMm, x1, p.depthMm + depth, 0, panelHeadroomMm(top)),
    },
    {
      id: `${p.id}:dedicated-space`,
      ownerId: p.id,
      purpose: "panel-dedicated-space",
      label: "Panel dedicated space (NEC 110.26(E))",
      prism: rectPrism(f, 0, 0, p.widthMm, p.depthMm, 0, Math.min(ceilingMm, top + feet(6))),
    },
  ];
}
