"use client";
import { FixtureInstances } from "./fixtures/FixtureInstances";
import { RoomLayer } from "./RoomLayer";
import { ZonesLayer } from "./ZonesLayer";

/**
 * The plan's room, fixtures and keep-clear zones in mm: the one set of layers the editor and the
 * read-only previews (shared page, walk-throughs) both mount. Room and fixtures are pickable in the editor.
 */
export function PlanLayers() {
  return (
    <>
      <group name="pickables">
        <RoomLayer />
        <FixtureInstances />
      </group>
      <ZonesLayer />
    </>
  );
}
