"use client";

import { OrbitControls } from "@react-three/drei";
import { Canvas, useFrame, useThree } from "@react-three/fiber";
import { useEffect, useRef } from "react";
import { Vector3 } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { EditorProvider, useEditor } from "@/lib/client/react/EditorContext";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { fitCamera } from "./fit-camera";
import { FrameCounter } from "./FrameCounter";
import { PlanLayers } from "./PlanLayers";
import { SelectionOutline } from "./SelectionOutline";
import { ease, stepPointToScene, type StepCameraMm } from "./step-camera";
import { M } from "./units";
import { useReadOnlyEditor, type ReadOnlyPreset } from "./useReadOnlyEditor";

const MOVE_MS = 700;

/** Frames the whole room as the editor's 3D view does, when no saved view is given. */
function FitRoom({ skip }: { skip: boolean }) {
  const ed = useEditor();
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    const d = ed.derived.getState().derived;
    if (skip || !d || !controls) return;
    if (fitCamera(camera, controls, d, "orbit", null, [], size)) invalidate();
  }, [ed, skip, camera, controls, size, invalidate]);
  return null;
}

/** Moves the camera to a walk-through step's saved view (at once when the reader prefers less motion). */
function SavedView({ view }: { view?: StepCameraMm }) {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const invalidate = useThree((s) => s.invalidate);
  const move = useRef<{ from: Vector3; to: Vector3; fromTarget: Vector3; toTarget: Vector3; t0: number } | null>(null);
  useEffect(() => {
    if (!view || !controls) return;
    const to = new Vector3(...stepPointToScene(view.position));
    const toTarget = new Vector3(...stepPointToScene(view.target));
    const still = typeof window !== "undefined" && window.matchMedia?.("(prefers-reduced-motion: reduce)").matches;
    move.current = { from: camera.position.clone(), to, fromTarget: controls.target.clone(), toTarget, t0: still ? -Infinity : performance.now() };
    invalidate();
  }, [view, camera, controls, invalidate]);
  useFrame(() => {
    const m = move.current;
    if (!m || !controls) return;
    const k = ease((performance.now() - m.t0) / MOVE_MS);
    camera.position.lerpVectors(m.from, m.to, k);
    controls.target.lerpVectors(m.fromTarget, m.toTarget, k);
    controls.update();
    if (k >= 1) move.current = null;
    else invalidate();
  });
  return null;
}

interface Props {
  document: PlanDocument;
  /** A walk-through step's saved view to move to. */
  camera?: StepCameraMm;
  /** The class preset the page's checks use, so zones show the same states as its findings. */
  preset?: ReadOnlyPreset | null;
  /** Fixture ids to outline (a walk-through step's highlight). */
  highlight?: readonly string[];
  label?: string;
}

/**
 * The plan in 3D, read-only: the editor's own room, fixture and keep-clear layers over the
 * engine's derived plan, with orbit controls. Draws on demand (camera moves ask for frames).
 */
export default function RoomPreview({ document, camera, preset = null, highlight = [], label = "The plan in 3D: the room, its fixtures and keep-clear zones" }: Props) {
  const editor = useReadOnlyEditor(document, preset, highlight);
  return (
    <Canvas
      data-testid="plan-canvas"
      frameloop="demand"
      camera={{ up: [0, 0, 1], position: [-5, -8, 6], fov: 45, near: 0.05, far: 400 }}
      gl={{ preserveDrawingBuffer: true, antialias: true }}
      dpr={[1, 1.5]}
      role="img"
      aria-label={label}
      className="rounded-lg"
    >
      <EditorProvider editor={editor}>
        <color attach="background" args={["#ece3d0"]} />
        <ambientLight intensity={0.75} />
        <directionalLight position={[6, -8, 12]} intensity={1.1} />
        <hemisphereLight args={["#ffffff", "#b89c80", 0.35]} />
        <group scale={M}>
          <PlanLayers />
          <SelectionOutline />
        </group>
        <OrbitControls makeDefault enableDamping={false} screenSpacePanning />
        <FitRoom skip={!!camera} />
        <SavedView view={camera} />
        <FrameCounter />
      </EditorProvider>
    </Canvas>
  );
}
