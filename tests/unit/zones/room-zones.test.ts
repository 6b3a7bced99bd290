import { describe, expect, it } from "vitest";
import { polygonBounds } from "@/lib/engine/checks/geom/polygon";
import { panelDepthMm, panelHeadroomMm, panelWidthMm } from "@/lib/engine/zones/panel";
import { roomZones } from "@/lib/engine/zones";
import { FT, IN, makePlan, rectRoom } from "../checks/helpers";

const room = rectRoom(6000, 6000, 2743);
const panel = (over: Record<string, unknown> = {}) =>
  makePlan(6000, 6000, {
    room: { obstacles: [{ id: "p", kind: "panel", placement: { mode: "wall", wallId: "w1", offsetMm: 1000, elevationMm: 1200 }, widthMm: 380, heightMm: 760, depthMm: 100, ...over }] },
  });
const zone = (plan: ReturnType<typeof panel>, id: string) => roomZones(plan, room).find((z) => z.id === id)!;

describe("panel working space, NEC 110.26", () => {
  it("depth by voltage and condition: Table 110.26(A)(1)", () => {
    expect(panelDepthMm("0-150", 1)).toBeCloseTo(3 * FT, 6);
    expect(panelDepthMm("0-150", 3)).toBeCloseTo(3 * FT, 6);
    expect(panelDepthMm("151-600", 1)).toBeCloseTo(914.4, 6);
    expect(panelDepthMm("151-600", 2)).toBeCloseTo(1066.8, 6);
    expect(panelDepthMm("151-600", 3)).toBeCloseTo(1219.2, 6);
  });
  it("width 30 in or the panel's width, height 6.5 ft or the panel's top: 110.26(A)(2), (A)(3)", () => {
    expect(panelWidthMm(380)).toBeCloseTo(762, 6);
    expect(panelWidthMm(900)).toBe(900);
    expect(panelHeadroomMm(1960)).toBeCloseTo(1981.2, 6);
    expect(panelHeadroomMm(2100)).toBe(2100);
  });
  it("working-space zone: 30 in wide centred on the panel, 3 ft deep from its front, floor to 6.5 ft", () => {
    const b = polygonBounds(zone(panel(), "p:working-space").prism.polygon);
    expect(b.minX).toBeCloseTo(1190 - 381, 6);
    expect(b.maxX).toBeCloseTo(1190 + 381, 6);
    expect(b.minY).toBeCloseTo(100, 6);
    expect(b.maxY).toBeCloseTo(100 + 914.4, 6);
    const z = zone(panel(), "p:working-space").prism;
    expect(z.zMin).toBe(0);
    expect(z.zMax).toBeCloseTo(1981.2, 6);
  });
  it("151-600 V condition 3 gives a 4 ft deep zone", () => {
    const b = polygonBounds(zone(panel({ voltageClass: "151-600", condition: 3 }), "p:working-space").prism.polygon);
    expect(b.maxY - b.minY).toBeCloseTo(4 * FT, 6);
  });
  it("slides along the wall near a corner instead of leaving the room", () => {
    const plan = makePlan(6000, 6000, { room: { obstacles: [{ id: "p", kind: "panel", placement: { mode: "wall", wallId: "w1", offsetMm: 100, elevationMm: 1200 } }] } });
    const b = polygonBounds(zone(plan, "p:working-space").prism.polygon);
    expect(b.minX).toBeCloseTo(0, 6);
    expect(b.maxX).toBeCloseTo(762, 6);
  });
  it("dedicated space: the panel's width and depth from the floor to 6 ft above it, capped by the ceiling (110.26(E)(1)(a))", () => {
    const d = zone(panel(), "p:dedicated-space").prism;
    const b = polygonBounds(d.polygon);
    expect(b.maxX - b.minX).toBeCloseTo(380, 6);
    expect(b.maxY - b.minY).toBeCloseTo(100, 6);
    expect(d.zMin).toBe(0);
    expect(d.zMax).toBe(2743); // 1960 + 1828.8 would pass the ceiling
    const low = roomZones(panel({ placement: { mode: "wall", wallId: "w1", offsetMm: 1000, elevationMm: 0 }, heightMm: 500 }), rectRoom(6000, 6000, 4000)).find((z) => z.id === "p:dedicated-space")!;
    expect(low.prism.zMax).toBeCloseTo(500 + 6 * FT, 6);
  });
});

describe("openings and parking bay zones", () => {
  const plan = makePlan(6000, 6000, {
    room: {
      openings: [
        { id: "d", kind: "entry-door", wallId: "w2", offsetMm: 1000, widthMm: 915, hinge: "left", swing: "in" },
        { id: "g", kind: "garage-door", wallId: "w3", offsetMm: 1000, widthMm: 2743, heightMm: 2134, trackDepthMm: 3300, trackDropMm: 380 },
        { id: "win", kind: "window", wallId: "w4", offsetMm: 1000, widthMm: 900, heightMm: 900, sillMm: 1000 },
      ],
      obstacles: [{ id: "bay", kind: "parking-bay", placement: { mode: "wall", wallId: "w1", offsetMm: 500 }, vehicleLengthMm: 4900, vehicleWidthMm: 1900, doorSwingMm: 760 }],
    },
  });
  const zs = roomZones(plan, room);
  it("door swing: a quarter circle with the door's width as radius, inside the room", () => {
    const z = zs.find((x) => x.id === "d:swing")!;
    const b = polygonBounds(z.prism.polygon);
    // Wall w2 is x = 6000, running +y; the room is toward -x.
    expect(b.minX).toBeCloseTo(6000 - 915, 3);
    expect(b.maxY - b.minY).toBeCloseTo(915, 3);
    expect(z.prism.zMax).toBe(2032);
  });
  it("garage track zone: door width x track depth, from the door's top (or track drop) to the ceiling", () => {
    const t = zs.find((x) => x.id === "g:track")!;
    const b = polygonBounds(t.prism.polygon);
    expect(b.maxX - b.minX).toBeCloseTo(2743, 3);
    expect(b.maxY - b.minY).toBeCloseTo(3300, 3);
    expect(t.prism.zMin).toBe(Math.min(2134, 2743 - 380));
    expect(t.prism.zMax).toBe(2743);
  });
  it("window zone sits above the sill", () => {
    const w = zs.find((x) => x.id === "win:window")!;
    expect(w.prism.zMin).toBe(1000);
    expect(w.prism.zMax).toBe(1900);
  });
  it("parking bay: vehicle in the middle, door strips each side along its length", () => {
    const v = polygonBounds(zs.find((x) => x.id === "bay:vehicle")!.prism.polygon);
    expect(v.minX).toBeCloseTo(500 + 760, 6);
    expect(v.maxX - v.minX).toBeCloseTo(1900, 6);
    expect(v.maxY - v.minY).toBeCloseTo(4900, 6);
    const r = polygonBounds(zs.find((x) => x.id === "bay:doors-right")!.prism.polygon);
    expect(r.maxX).toBeCloseTo(500 + 2 * 760 + 1900, 6);
  });
  it("no zones for obstacles on an unknown wall", () => {
    const bad = { ...plan, room: { ...plan.room, openings: [{ ...plan.room.openings[0], wallId: "nope" }], obstacles: [] } };
    expect(roomZones(bad, room)).toEqual([]);
  });
  it("inches helper sanity: 30 in is 762 mm (NIST SP 811)", () => expect(30 * IN).toBeCloseTo(762, 9));
});
