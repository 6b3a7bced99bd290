"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame, useThree } from "@react-three/fiber";
import { useEffect, useMemo, useRef } from "react";
import { Shape, Vector3 } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { solveRoom } from "@/lib/engine/room/solve";
import { ease, stepPointToScene, type StepCameraMm } from "./step-camera";

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

const MOVE_MS = 700;

/** Moves the camera to a walk-through step's saved view (at once when the reader prefers less motion). */
function SavedView({ view }: { view?: StepCameraMm }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const move = useRef<{ from: Vector3; to: Vector3; fromTarget: Vector3; toTarget: Vector3; t0: number } | null>(null);
  useEffect(() => {
    if (!view || !controls) return;
    const to = new Vector3(...stepPointToScene(view.position));
    const toTarget = new Vector3(...stepPointToScene(view.target));
    const still = typeof window !== "undefined" && window.matchMedia?.("(prefers-reduced-motion: reduce)").matches;
    move.current = { from: camera.position.clone(), to, fromTarget: controls.target.clone(), toTarget, t0: still ? -Infinity : performance.now() };
  }, [view, camera, controls]);
  useFrame(() => {
    const m = move.current;
    if (!m || !controls) return;
    const k = ease((performance.now() - m.t0) / MOVE_MS);
    camera.position.lerpVectors(m.from, m.to, k);
    controls.target.lerpVectors(m.fromTarget, m.toTarget, k);
    controls.update();
    if (k >= 1) move.current = null;
  });
  return null;
}

/** A simple 3D look at the plan's room: the solved floor and its walls, with orbit controls; `camera`: a step's saved view to move to. */
export default function RoomPreview({ document, camera }: { document: PlanDocument; camera?: StepCameraMm }) {
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
      <SavedView view={camera} />
      <FrameCounter />
    </Canvas>
  );
}
