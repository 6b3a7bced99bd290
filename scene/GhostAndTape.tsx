"use client";
import { Html, Line } from "@react-three/drei";
import type { Placement } from "@/lib/engine/plan/schema";
import type { SolvedWall } from "@/lib/engine/room/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";

/** Where a placement puts a fixture's local frame: wall start + offset along it, facing the room. */
function frameOf(p: Placement, wall: SolvedWall | undefined): { x: number; y: number; z: number; rot: number } | null {
  if (p.mode === "free") return { x: p.xMm, y: p.yMm, z: p.elevationMm, rot: (p.rotationDeg * Math.PI) / 180 };
  if (!wall) return null;
  return { x: wall.start.x + wall.dir.x * p.offsetMm, y: wall.start.y + wall.dir.y * p.offsetMm, z: p.elevationMm, rot: Math.atan2(wall.dir.y, wall.dir.x) };
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

/** The tape measure's line and reading. */
export function TapeLine() {
  const ed = useEditor();
  const m = useUi((s) => s.measurement);
  if (!m) return null;
  const len = Math.hypot(m.to.x - m.from.x, m.to.y - m.from.y);
  const z = 20;
  return (
    <group>
      <Line points={[[m.from.x, m.from.y, z], [m.to.x, m.to.y, z]]} color="#d99a1e" lineWidth={3} dashed={!m.done} dashSize={40} gapSize={20} />
      <Html position={[(m.from.x + m.to.x) / 2, (m.from.y + m.to.y) / 2, z]} center className="pointer-events-none">
        <span className="rounded bg-amberline-100 px-1 text-xs font-semibold text-walnut-900 shadow" data-testid="tape-reading">
          {ed.formatLength(len)}
        </span>
      </Html>
    </group>
  );
}
