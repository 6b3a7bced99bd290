"use client";
import { useMemo } from "react";
import { fixtureDistances, gapEndName, offsetForGap } from "@/lib/engine/drawings/fixture-distances";
import type { FixtureDoc } from "@/lib/engine/plan/schema";
import { movePlacement } from "@/lib/client/commands/place";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived } from "@/lib/client/react/useEditorState";
import { LengthInput } from "./LengthInput";

/**
 * A wall fixture's size and its clear gaps along the wall, left and right as a person facing the
 * wall sees them (the numbers the plan and elevation views draw). Typing a gap moves the fixture
 * so that gap is left, its neighbour staying put: one edit, one undo step.
 */
export function FixtureDistances({ fixture }: { fixture: FixtureDoc }) {
  const ed = useEditor();
  const doc = useDerived((s) => s.doc);
  const derived = useDerived((s) => s.derived);
  const d = useMemo(() => (doc && derived ? fixtureDistances(doc, derived, fixture.id) : null), [doc, derived, fixture.id]);
  const p = fixture.placement;
  if (!d || p.mode !== "wall") return null;
  const move = (side: "left" | "right", mm: number) => movePlacement(ed, fixture.id, { ...p, offsetMm: offsetForGap(d, p.offsetMm, side, mm) });
  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded border border-walnut-100 p-2" data-testid="fixture-distances">
      <legend className="px-1 text-xs font-semibold text-walnut-700">Distances (facing the wall)</legend>
      <p className="col-span-2 text-xs text-walnut-700" data-testid="fixture-size">
        {ed.formatLength(d.widthMm)} wide, {ed.formatLength(d.depthMm)} deep, {ed.formatLength(d.heightMm)} high
      </p>
      <LengthInput label={`Gap on the left, to ${gapEndName(d.left.to)}`} valueMm={d.left.gapMm} allowZero testId="gap-left" onCommit={(mm) => move("left", mm)} />
      <LengthInput label={`Gap on the right, to ${gapEndName(d.right.to)}`} valueMm={d.right.gapMm} allowZero testId="gap-right" onCommit={(mm) => move("right", mm)} />
    </fieldset>
  );
}
