"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame } from "@react-three/fiber";
import { useMemo } from "react";
import { Shape } from "three";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { solveRoom } from "@/lib/engine/room/solve";

declare global {
  interface Window {
    __bwFrames?: number;
  }
}

/** Counts drawn frames so tests (and the curious) can tell the canvas is alive. */
function FrameCounter() {
  useFrame(() => {
    window.__bwFrames = (window.__bwFrames ?? 0) + 1;
  });
  return null;
}

const M = 0.001; // the engine works in mm; the scene in metres

function Walls({ document }: { document: PlanDocument }) {
  const room = useMemo(() => solveRoom(document.room), [document.room]);
  const floor = useMemo(() => {
    const s = new Shape();
    room.corners.forEach((c, i) => (i === 0 ? s.moveTo(c.x * M, c.y * M) : s.lineTo(c.x * M, c.y * M)));
    s.closePath();
    return s;
  }, [room]);
  const h = room.ceilingHeightMm * M;
  return (
    <group>
      <mesh receiveShadow>
        <shapeGeometry args={[floor]} />
        <meshStandardMaterial color="#d9cdb8" />
      </mesh>
      {room.walls.map((w) => {
        const len = w.lengthMm * M;
        const cx = ((w.start.x + w.end.x) / 2) * M - w.inward.x * 0.05;
        const cy = ((w.start.y + w.end.y) / 2) * M - w.inward.y * 0.05;
        return (
          <mesh key={w.id} position={[cx, cy, h / 2]} rotation={[0, 0, Math.atan2(w.dir.y, w.dir.x)]}>
            <boxGeometry args={[len, 0.1, h]} />
            <meshStandardMaterial color="#f4efe9" transparent opacity={0.55} />
          </mesh>
        );
      })}
    </group>
  );
}

/** A simple 3D look at the plan's room: the solved floor and its walls, with orbit controls. */
export default function RoomPreview({ document }: { document: PlanDocument }) {
  const room = useMemo(() => solveRoom(document.room), [document.room]);
  const cx = (room.corners.reduce((a, c) => a + c.x, 0) / room.corners.length) * M;
  const cy = (room.corners.reduce((a, c) => a + c.y, 0) / room.corners.length) * M;
  return (
    <Canvas data-testid="plan-canvas" camera={{ up: [0, 0, 1], position: [cx - 6, cy - 9, 8], fov: 45, near: 0.05, far: 200 }} gl={{ preserveDrawingBuffer: true }} className="rounded-lg">
      <color attach="background" args={["#ece3d0"]} />
      <ambientLight intensity={0.7} />
      <directionalLight position={[5, -5, 10]} intensity={1.2} />
      <Walls document={document} />
      <OrbitControls target={[cx, cy, 0]} makeDefault />
      <FrameCounter />
    </Canvas>
  );
}
