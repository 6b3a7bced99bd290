"use client";
import { OrbitControls, OrthographicCamera, PerspectiveCamera } from "@react-three/drei";
import { useThree } from "@react-three/fiber";
import { useEffect } from "react";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";
import { fitCamera } from "./fit-camera";

/**
 * The three views: 3D orbit (perspective), plan from above and wall elevation (both orthographic,
 * pan and zoom only). Frames the room, or the requested fixtures, when the view or request changes.
 */
export function CameraRig() {
  const ed = useEditor();
  const view = useUi((s) => s.view);
  const wallId = useUi((s) => s.elevationWallId);
  const frameN = useUi((s) => s.frameRequest.n);
  const dims = useUi((s) => s.showDimensions);
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);

  useEffect(() => {
    const d = ed.derived.getState().derived;
    if (!d || !controls) return;
    const bodies = ed.ui.getState().frameRequest.ids.map((id) => ed.placed(id)).filter((f) => !!f);
    if (fitCamera(camera, controls, d, view, wallId, bodies, size, dims)) invalidate();
  }, [ed, view, wallId, frameN, camera, controls, size, invalidate, dims]);

  return (
    <>
      {view === "orbit" ? <PerspectiveCamera key="orbit" makeDefault up={[0, 0, 1]} fov={45} near={0.05} far={400} position={[-5, -8, 6]} /> : null}
      {view === "plan" ? <OrthographicCamera key="plan" makeDefault up={[0, 1, 0]} near={0.1} far={200} position={[0, 0, 50]} /> : null}
      {view === "elevation" ? <OrthographicCamera key={`elev-${wallId}`} makeDefault up={[0, 0, 1]} near={0.05} far={200} /> : null}
      <OrbitControls key={`controls-${view}`} makeDefault enableRotate={view === "orbit"} enableDamping={false} screenSpacePanning />
    </>
  );
}
