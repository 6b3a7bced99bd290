"use client";
import { useFrame } from "@react-three/fiber";
import { memo, useMemo, useRef } from "react";
import { Shape, type Group } from "three";
import type { Opening } from "@/lib/engine/plan/schema";
import type { SolvedRoom, SolvedWall } from "@/lib/engine/room/types";
import { DRAWN_WALL_THICKNESS_MM as WALL_THICKNESS_MM, frameOfWall, wallHeading, wallToWorld } from "@/lib/engine/room/wall-frame";
import { useDerived, useDoc } from "@/lib/client/react/useEditorState";
import { prismGeometry } from "./prism";

/**
 * Hides the walls between the camera and the room (their inner face looks away from the camera) so
 * the 3D view sees in; plan and elevation views keep every wall.
 */
function Cutaway({ walls, children }: { walls: readonly SolvedWall[]; children: (wall: SolvedWall) => React.ReactNode }) {
  const groups = useRef(new Map<string, Group>());
  useFrame(({ camera }) => {
    for (const w of walls) {
      const g = groups.current.get(w.id);
      if (!g) continue;
      // Camera position is in metres; the wall in mm.
      const dx = camera.position.x * 1000 - w.start.x;
      const dy = camera.position.y * 1000 - w.start.y;
      const outside = dx * w.inward.x + dy * w.inward.y < 0;
      const fromAbove = camera.up.z === 0;
      g.visible = fromAbove || !outside;
    }
  });
  return (
    <>
      {walls.map((w) => (
        <group
          key={w.id}
          ref={(g) => {
            if (g) groups.current.set(w.id, g);
            else groups.current.delete(w.id);
          }}
        >
          {children(w)}
        </group>
      ))}
    </>
  );
}

function WallMesh({ wall, heightMm }: { wall: SolvedWall; heightMm: number }) {
  // Walls stand outside the floor polygon so fixtures' backs sit on the inner face; drawn at their solved length.
  const f = frameOfWall(wall);
  const c = wallToWorld(f, f.lengthMm / 2, -WALL_THICKNESS_MM / 2);
  return (
    <mesh position={[c.x, c.y, heightMm / 2]} rotation={[0, 0, wallHeading(f)]} userData={{ pick: "wall", wallId: wall.id }}>
      <boxGeometry args={[f.lengthMm + WALL_THICKNESS_MM * 2, WALL_THICKNESS_MM, heightMm]} />
      <meshStandardMaterial color="#efe7da" transparent opacity={0.5} depthWrite={false} />
    </mesh>
  );
}

const openingColour: Record<Opening["kind"], string> = { "entry-door": "#8a6a48", "garage-door": "#9aa5b1", window: "#a9c7d8" };

function OpeningMesh({ opening, wall }: { opening: Opening; wall: SolvedWall }) {
  const bottom = opening.kind === "window" ? opening.sillMm : 0;
  const f = frameOfWall(wall);
  const c = wallToWorld(f, opening.offsetMm + opening.widthMm / 2, -WALL_THICKNESS_MM / 2);
  return (
    <mesh position={[c.x, c.y, bottom + opening.heightMm / 2]} rotation={[0, 0, wallHeading(f)]} userData={{ pick: "wall", wallId: wall.id }}>
      <boxGeometry args={[opening.widthMm, WALL_THICKNESS_MM * 1.2, opening.heightMm]} />
      <meshStandardMaterial color={openingColour[opening.kind]} transparent opacity={0.55} depthWrite={false} />
    </mesh>
  );
}

const Floor = memo(function Floor({ room }: { room: SolvedRoom }) {
  const shape = useMemo(() => {
    const s = new Shape();
    room.corners.forEach((c, i) => (i === 0 ? s.moveTo(c.x, c.y) : s.lineTo(c.x, c.y)));
    s.closePath();
    return s;
  }, [room]);
  return (
    <mesh userData={{ pick: "floor" }} receiveShadow>
      <shapeGeometry args={[shape]} />
      <meshStandardMaterial color="#d9cdb8" />
    </mesh>
  );
});

/** The solved floor, walls with their openings, and the obstacles. Re-renders only when the room changes. */
export function RoomLayer() {
  const room = useDerived((s) => s.derived?.room ?? null);
  const obstacles = useDerived((s) => s.derived?.obstacles ?? null);
  const openings = useDoc((d) => d.room.openings);
  if (!room) return null;
  const wallById = new Map(room.walls.map((w) => [w.id, w]));
  return (
    <group name="room">
      <Floor room={room} />
      <Cutaway walls={room.walls}>
        {(w) => (
          <>
            <WallMesh wall={w} heightMm={room.ceilingHeightMm} />
            {openings
              .filter((o) => o.wallId === w.id)
              .map((o) => (
                <OpeningMesh key={o.id} opening={o} wall={wallById.get(o.wallId)!} />
              ))}
          </>
        )}
      </Cutaway>
      {obstacles?.map((o) => (
        <mesh key={o.id} geometry={prismGeometry(o.body)} userData={{ pick: "obstacle", id: o.id }}>
          <meshStandardMaterial color={o.kind === "panel" ? "#36414e" : "#7a8794"} transparent opacity={o.kind === "parking-bay" ? 0.25 : 0.9} />
        </mesh>
      ))}
    </group>
  );
}
