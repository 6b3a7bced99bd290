"use client";
import { Edges, Html } from "@react-three/drei";
import { memo, useMemo } from "react";
import type { WorldZone } from "@/lib/engine/fixtures/types";
import { useDerived, useUi } from "@/lib/client/react/useEditorState";
import { prismGeometry } from "./prism";
import { zoneMaterial, zoneStates, zoneStyle, type ZoneState } from "./zone-style";

const ZoneMesh = memo(function ZoneMesh({ zone, state, labelled, faint, hovered }: { zone: WorldZone; state: ZoneState; labelled: boolean; faint: boolean; hovered: boolean }) {
  const geometry = prismGeometry(zone.prism);
  const c = zone.prism.polygon.reduce((a, v) => ({ x: a.x + v.x / zone.prism.polygon.length, y: a.y + v.y / zone.prism.polygon.length }), { x: 0, y: 0 });
  // Raycast only by the hover pick (zone-hover.ts); fixture picking looks at the "pickables" group alone.
  return (
    <mesh geometry={geometry} material={zoneMaterial(state, faint, hovered)} renderOrder={2} userData={{ zoneId: zone.id }}>
      {hovered ? <Edges color={zoneStyle[state].colour} lineWidth={2} /> : null}
      {labelled ? (
        <Html position={[c.x, c.y, zone.prism.zMax]} center zIndexRange={[20, 10]} className="pointer-events-none">
          <span className="whitespace-nowrap rounded bg-white/90 px-1 text-[11px] font-medium text-walnut-900 shadow">
            {zoneStyle[state].label}: {zone.label}
          </span>
        </Html>
      ) : null}
    </mesh>
  );
});

/**
 * Keep-clear zones, translucent, coloured and patterned by state. Shown: the room's own zones,
 * the selected fixtures' zones and any zone in a failing check (or all, when asked).
 */
export function ZonesLayer() {
  const zones = useDerived((s) => s.derived?.zones ?? null);
  const findings = useDerived((s) => s.findings);
  const selection = useUi((s) => s.selection);
  const showAll = useUi((s) => s.showAllZones);
  const hoveredId = useUi((s) => s.hoveredZone?.id ?? null);
  const fixtureIds = useDerived((s) => s.fixtureById);
  const states = useMemo(() => zoneStates(findings), [findings]);
  if (!zones) return null;
  const selected = new Set(selection);
  let labels = 0;
  return (
    <group name="zones">
      {zones.map((z) => {
        const state = states.get(z.id) ?? "clear";
        const roomZone = !fixtureIds.has(z.ownerId);
        if (!showAll && state === "clear" && !roomZone && !selected.has(z.ownerId)) return null;
        const labelled = state !== "clear" && labels++ < 8;
        // The room's own clear zones (parking bay, door track) are large: drawn faint so fixtures stay visible.
        return <ZoneMesh key={z.id} zone={z} state={state} labelled={labelled} faint={roomZone && state === "clear" && !showAll} hovered={z.id === hoveredId} />;
      })}
    </group>
  );
}
