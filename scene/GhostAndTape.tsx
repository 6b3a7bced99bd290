"use client";
import { Html } from "@react-three/drei";
import { useThree } from "@react-three/fiber";
import { useEffect, useState } from "react";
import { MathUtils } from "three";
import { Line2 } from "three/examples/jsm/lines/Line2.js";
import { LineGeometry } from "three/examples/jsm/lines/LineGeometry.js";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import type { Placement } from "@/lib/engine/plan/schema";
import type { SolvedWall } from "@/lib/engine/room/types";
import { frameOfWall, wallHeading, wallToWorld } from "@/lib/engine/room/wall-frame";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";

/** Where a placement puts a fixture's local frame: on a wall through the engine's wall frame (offset along it, facing the room), or free. */
function frameOf(p: Placement, wall: SolvedWall | undefined): { x: number; y: number; z: number; rot: number } | null {
  if (p.mode === "free") return { x: p.xMm, y: p.yMm, z: p.elevationMm, rot: MathUtils.degToRad(p.rotationDeg) };
  if (!wall) return null;
  const f = frameOfWall(wall);
  const o = wallToWorld(f, p.offsetMm, 0);
  return { x: o.x, y: o.y, z: p.elevationMm, rot: wallHeading(f) };
}

/** The fixture about to be placed, translucent under the pointer. */
export function Ghost() {
  const ed = useEditor();
  const ghost = useUi((s) => s.ghost);
  if (!ghost) return null;
  const fp = ed.engine.footprint(ghost.kind, ed.engine.defaultParams(ghost.kind), ed.doc);
  const f = frameOf(ghost.placement, ghost.placement.mode === "wall" ? ed.wall(ghost.placement.wallId) : undefined);
  if (!f) return null;
  return (
    <group position={[f.x, f.y, f.z]} rotation={[0, 0, f.rot]}>
      <mesh position={[fp.widthMm / 2, fp.depthMm / 2, fp.heightMm / 2]} raycast={() => null}>
        <boxGeometry args={[fp.widthMm, fp.depthMm, fp.heightMm]} />
        <meshBasicMaterial color="#1f6fd1" transparent opacity={0.3} depthWrite={false} />
      </mesh>
    </group>
  );
}

/**
 * The tape measure's line and reading. One line object for the whole measurement, its points set
 * in place: drei's Line makes a new geometry and disposes its material on each new points array,
 * and when it is the only wide line on screen (the 3D view) three then recompiles its shader on
 * every pointer move.
 */
export function TapeLine() {
  const ed = useEditor();
  const m = useUi((s) => s.measurement);
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  const [line] = useState(() => new Line2(new LineGeometry(), new LineMaterial({ color: 0xd99a1e, linewidth: 3, dashSize: 40, gapSize: 20 })));
  useEffect(() => () => {
    line.geometry.dispose();
    line.material.dispose();
  }, [line]);
  useEffect(() => {
    line.material.resolution.set(size.width, size.height);
  }, [line, size.width, size.height]);
  useEffect(() => {
    if (!m) return;
    drawTape(line, m);
    invalidate();
  }, [line, m, invalidate]);
  if (!m) return null;
  const len = Math.hypot(m.to.x - m.from.x, m.to.y - m.from.y);
  return (
    <group>
      <primitive object={line} />
      <Html position={[(m.from.x + m.to.x) / 2, (m.from.y + m.to.y) / 2, TAPE_Z]} center className="pointer-events-none">
        <span className="whitespace-nowrap rounded bg-amberline-100 px-1 text-xs font-semibold text-walnut-900 shadow" data-testid="tape-reading">
          {ed.formatLength(len)}
        </span>
      </Html>
    </group>
  );
}

const TAPE_Z = 20;

/** Puts the tape's two ends into its line, in place; dashed while the tape is still being pulled. */
function drawTape(line: Line2, m: { from: { x: number; y: number }; to: { x: number; y: number }; done: boolean }): void {
  line.geometry.setPositions([m.from.x, m.from.y, TAPE_Z, m.to.x, m.to.y, TAPE_Z]);
  line.computeLineDistances();
  line.material.dashed = !m.done;
}
