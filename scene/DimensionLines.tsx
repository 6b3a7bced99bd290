"use client";
import { Html, Line } from "@react-three/drei";
import { memo, useMemo } from "react";
import type { SolvedWall } from "@/lib/engine/room/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useDoc, useUi } from "@/lib/client/react/useEditorState";

type P3 = [number, number, number];

/**
 * A dimension line from a to b along a wall, offset by `off` mm (negative: outside the room), with
 * end ticks and a label. Memoised with its points: drei's Line disposes its material whenever its
 * points array changes, and when every line did so in one frame three dropped and recompiled the
 * line shader on each drag step.
 */
const Dim = memo(function Dim({ wall, from, to, off, text, testId }: { wall: SolvedWall; from: number; to: number; off: number; text: string; testId?: string }) {
  const pts = useMemo(() => {
    const at = (t: number, o: number): P3 => [wall.start.x + wall.dir.x * t + wall.inward.x * o, wall.start.y + wall.dir.y * t + wall.inward.y * o, 5];
    const tick = 60;
    return { line: [at(from, off), at(to, off)], a: [at(from, off - tick), at(from, off + tick)], b: [at(to, off - tick), at(to, off + tick)], label: at((from + to) / 2, off) };
  }, [wall, from, to, off]);
  return (
    <group>
      <Line points={pts.line} color="#2a1c12" lineWidth={1.2} />
      <Line points={pts.a} color="#2a1c12" lineWidth={1.2} />
      <Line points={pts.b} color="#2a1c12" lineWidth={1.2} />
      <Html position={pts.label} center className="pointer-events-none">
        <span className="whitespace-nowrap rounded bg-paper px-1 text-[11px] font-semibold text-walnut-900" data-testid={testId}>
          {text}
        </span>
      </Html>
    </group>
  );
});

/** The selected wall fixture's distances to the wall ends, in plan and elevation (the drawing's own dimensions are DrawingDimensions). */
export function DimensionLines() {
  const ed = useEditor();
  const view = useUi((s) => s.view);
  const show = useUi((s) => s.showDimensions);
  const elevationWallId = useUi((s) => s.elevationWallId);
  const selection = useUi((s) => s.selection);
  const walls = useDerived((s) => s.derived?.room.walls ?? []);
  const sel = useDoc((d) => (selection.length === 1 ? d.fixtures.find((f) => f.id === selection[0]) : undefined));
  const selWidth = useDerived((s) => (sel ? s.fixtureById.get(sel.id)?.footprint.widthMm : undefined));
  if (view === "orbit" || !show) return null;
  const shownWall = view === "elevation" ? (elevationWallId ?? walls[0]?.id) : undefined;
  const selWall = sel?.placement.mode === "wall" ? walls.find((w) => sel.placement.mode === "wall" && w.id === sel.placement.wallId && (!shownWall || w.id === shownWall)) : undefined;
  return (
    <group name="dimensions">
      {selWall && sel?.placement.mode === "wall" && selWidth !== undefined ? (
        <>
          <Dim wall={selWall} from={0} to={sel.placement.offsetMm} off={-150} text={ed.formatLength(sel.placement.offsetMm)} testId="dim-offset" />
          <Dim wall={selWall} from={sel.placement.offsetMm + selWidth} to={selWall.lengthMm} off={-150} text={ed.formatLength(selWall.lengthMm - sel.placement.offsetMm - selWidth)} />
        </>
      ) : null}
    </group>
  );
}
