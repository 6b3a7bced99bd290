"use client";
import { Html, Line } from "@react-three/drei";
import { useThree } from "@react-three/fiber";
import { memo, useEffect, useMemo, useState } from "react";
import { OrthographicCamera } from "three";
import { fittingDimensionTexts, liveTextSizeMm } from "@/lib/engine/drawings/dimension-texts";
import { fixtureDistances, selectionElevationDimensions, selectionPlanDimensions } from "@/lib/engine/drawings/fixture-distances";
import { planViewDimensions } from "@/lib/engine/drawings/plan-view";
import { elevationSheetToRoom, planSheetToRoom, type RoomPoint } from "@/lib/engine/drawings/sheet-to-world";
import type { DimensionLine, SheetPoint } from "@/lib/engine/drawings/types";
import { wallElevation } from "@/lib/engine/drawings/wall-elevation";
import { frameOfWall } from "@/lib/engine/room/wall-frame";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useUi } from "@/lib/client/react/useEditorState";
import { M } from "./units";

type P3 = [number, number, number];
const INK = "#2a1c12";
/** Dimension text size on screen, CSS px (the labels below are drawn at this size). */
const TEXT_PX = 11;

/** The sheet text height for the camera's zoom, re-read when the controls move the camera or the view is framed again. */
function useLiveTextSize(): number {
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as { addEventListener(t: "change", f: () => void): void; removeEventListener(t: "change", f: () => void): void } | null;
  const frameN = useUi((s) => s.frameRequest.n);
  const view = useUi((s) => s.view);
  const wallId = useUi((s) => s.elevationWallId);
  const [size, setSize] = useState(100);
  useEffect(() => {
    const read = () => {
      if (!(camera instanceof OrthographicCamera)) return;
      const next = liveTextSizeMm(camera.zoom * M, TEXT_PX);
      setSize((prev) => (prev === next ? prev : next));
    };
    read();
    // The camera rig frames the view in its own effect: read again once it has.
    const t = setTimeout(read, 0);
    controls?.addEventListener("change", read);
    return () => {
      clearTimeout(t);
      controls?.removeEventListener("change", read);
    };
  }, [camera, controls, frameN, view, wallId]);
  return size;
}

/** One dimension's label, turned as the drawing turns it (the sheet and the screen share their axes in these views). */
const DimText = memo(function DimText({ at, d, testId }: { at: P3; d: DimensionLine; testId?: string }) {
  return (
    <Html position={at} center className="pointer-events-none" zIndexRange={[20, 10]}>
      <span
        className="block whitespace-nowrap rounded bg-paper/90 px-0.5 text-[11px] font-semibold leading-none text-walnut-900"
        style={d.textAngleDeg ? { transform: `rotate(${d.textAngleDeg}deg)` } : undefined}
        data-testid={testId ?? "dimension"}
        data-chain={d.chain}
        data-ref={d.ref}
        data-note={d.note}
        data-value-mm={d.valueMm}
        title={d.note}
      >
        {d.text}
      </span>
    </Html>
  );
});

/**
 * The engine's dimension strings in the plan and elevation views: the same drawing objects the
 * shared page and the packet draw, laid out for the current zoom. Texts that would overlap are
 * left off and shown while their fixture is hovered or selected.
 */
export function DrawingDimensions() {
  const ed = useEditor();
  const view = useUi((s) => s.view);
  const show = useUi((s) => s.showDimensions);
  const wallPick = useUi((s) => s.elevationWallId);
  const hovered = useUi((s) => s.hovered);
  const selection = useUi((s) => s.selection);
  const doc = useDerived((s) => s.doc);
  const derived = useDerived((s) => s.derived);
  const size = useLiveTextSize();
  const selected = selection.length === 1 ? selection[0] : null;

  // While a drag runs only the cheap dimensions follow it (wall lengths, the selection's gaps); the rest come back on release.
  const dragging = useUi((s) => s.tool === "dragging");

  const frameFor = useMemo(() => {
    if (!derived || view === "orbit") return null;
    if (view === "plan") {
      const z = derived.room.ceilingHeightMm + 10;
      return { wall: null, toRoom: (p: SheetPoint) => planSheetToRoom(p, z) };
    }
    const wall = derived.room.walls.find((w) => w.id === wallPick) ?? derived.room.walls[0];
    if (!wall) return null;
    const frame = frameOfWall(wall);
    // A little off the wall's face, into the room; the lines draw over the fixtures in any case.
    return { wall: frame, toRoom: (p: SheetPoint) => elevationSheetToRoom(frame, p, 5) };
  }, [derived, view, wallPick]);

  const base = useMemo(() => {
    if (!doc || !derived || !frameFor) return [];
    if (!frameFor.wall) return planViewDimensions(doc, derived, { detail: !dragging, textSizeMm: size });
    return dragging ? [] : (wallElevation(doc, derived, frameFor.wall.wallId, { detail: true, textSizeMm: size })?.dimensions ?? []);
  }, [doc, derived, frameFor, size, dragging]);

  // The selected wall fixture's gaps to its neighbours and its size, drawn first and always shown.
  const own = useMemo(() => {
    if (!doc || !derived || !frameFor || !selected) return [];
    const sel = fixtureDistances(doc, derived, selected);
    if (!sel) return [];
    const style = { sizeMm: size, format: (mm: number) => ed.formatLength(mm), chain: "selection" };
    if (frameFor.wall) {
      const zMin = derived.fixtures.find((f) => f.id === sel.fixtureId)?.body.zMin ?? 0;
      return sel.wallId === frameFor.wall.wallId ? selectionElevationDimensions(sel, frameFor.wall, zMin, style) : [];
    }
    const w = derived.room.walls.find((x) => x.id === sel.wallId);
    return w ? selectionPlanDimensions(sel, frameOfWall(w), style) : [];
  }, [ed, doc, derived, frameFor, selected, size]);

  const drawn = useMemo(() => (frameFor ? { dims: [...own, ...base], toRoom: frameFor.toRoom } : null), [frameFor, own, base]);

  const marks = useMemo(() => {
    if (!drawn) return null;
    const p3 = (p: RoomPoint): P3 => [p.x, p.y, p.z];
    const segs: P3[] = [];
    for (const d of drawn.dims) {
      segs.push(p3(drawn.toRoom(d.line[0])), p3(drawn.toRoom(d.line[1])));
      for (const [a, b] of d.extensions) segs.push(p3(drawn.toRoom(a)), p3(drawn.toRoom(b)));
    }
    return { segs, texts: drawn.dims.map((d) => p3(drawn.toRoom(d.textAt))), fits: fittingDimensionTexts(drawn.dims, size) };
  }, [drawn, size]);

  if (!show || !drawn || !marks || marks.segs.length === 0) return null;
  const lit = new Set(selection);
  if (hovered) lit.add(hovered);
  const wallNo = new Map(ed.doc.room.walls.map((w, i) => [w.id, i + 1]));
  return (
    <group name="drawing-dimensions">
      <Line points={marks.segs} segments color={INK} lineWidth={1} depthTest={false} renderOrder={10} />
      {drawn.dims.map((d, i) => {
        const on = marks.fits[i] || (d.ref !== undefined && lit.has(d.ref));
        if (!on) return null;
        const n = view === "plan" && d.chain === "overall" && d.ref ? wallNo.get(d.ref) : undefined;
        return <DimText key={`${d.chain}-${d.ref ?? ""}-${i}`} at={marks.texts[i]} d={n ? { ...d, text: `${n}: ${d.text}` } : d} testId={n ? `dim-wall-${n}` : undefined} />;
      })}
    </group>
  );
}
