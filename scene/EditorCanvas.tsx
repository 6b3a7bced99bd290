"use client";
import { Canvas } from "@react-three/fiber";
import type { Editor } from "@/lib/client/editor";
import { EditorProvider } from "@/lib/client/react/EditorContext";
import { CameraRig } from "./CameraRig";
import { DrawingDimensions } from "./DrawingDimensions";
import { FrameCounter } from "./FrameCounter";
import { Ghost, TapeLine } from "./GhostAndTape";
import { PointerBridge } from "./PointerBridge";
import { PlanLayers } from "./PlanLayers";
import { SelectionOutline } from "./SelectionOutline";
import { TestHooks } from "./TestHooks";
import { M } from "./units";
import { ZoneTooltip } from "./ZoneTooltip";

/**
 * The editor's 3D view (client only; loaded with next/dynamic, ssr: false). The engine's mm are
 * scaled to metres by the root group. The canvas draws on demand: edits and camera moves ask for frames.
 * The provider is repeated inside because the canvas renders in its own React root. The zone
 * hover card is a DOM overlay beside the canvas (the parent is positioned).
 */
/**
 * The scene takes no pointer events of its own: PointerBridge handles them. Left on, the fiber
 * event system read the pointer's offset on every move, which forces a page layout after each
 * React update (a few ms a drag step).
 */
const noSceneEvents = () => ({ enabled: false, priority: 0 });

export default function EditorCanvas({ editor, label }: { editor: Editor; label: string }) {
  return (
    <>
      <Canvas
        data-testid="plan-canvas"
        frameloop="demand"
        events={noSceneEvents}
        dpr={[1, 1.5]}
        gl={{ preserveDrawingBuffer: true, antialias: true }}
        tabIndex={0}
        aria-label={label}
        role="img"
        className="h-full w-full touch-none rounded-lg outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
      >
        <EditorProvider editor={editor}>
          <color attach="background" args={["#ece3d0"]} />
          <ambientLight intensity={0.75} />
          <directionalLight position={[6, -8, 12]} intensity={1.1} />
          <hemisphereLight args={["#ffffff", "#b89c80", 0.35]} />
          <CameraRig />
          <group scale={M}>
            <PlanLayers />
            <SelectionOutline />
            <Ghost />
            <TapeLine />
            <DrawingDimensions />
          </group>
          <PointerBridge />
          <FrameCounter />
          <TestHooks />
        </EditorProvider>
      </Canvas>
      <EditorProvider editor={editor}>
        <ZoneTooltip />
      </EditorProvider>
    </>
  );
}
