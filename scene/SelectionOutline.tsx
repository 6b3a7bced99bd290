"use client";
import { useEffect, useRef } from "react";
import { BoxGeometry, EdgesGeometry, LineBasicMaterial, type Group } from "three";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";
import { fixtureMatrix } from "./fixtures/instance-layout";
import { useInvalidate } from "./fixtures/useInvalidate";

const edges = new EdgesGeometry(new BoxGeometry(1, 1, 1));
const lineMaterial = new LineBasicMaterial({ color: "#1f6fd1", depthTest: false });

/** Outlines the selected fixtures; follows them through refs while they are dragged. */
export function SelectionOutline() {
  const ed = useEditor();
  const selection = useUi((s) => s.selection);
  const invalidate = useInvalidate();
  const groups = useRef(new Map<string, Group>());

  useEffect(() => {
    const place = () => {
      for (const [id, g] of groups.current) {
        const f = ed.placed(id);
        g.visible = !!f;
        if (!f) continue;
        fixtureMatrix(f, g.matrix);
        g.matrixWorldNeedsUpdate = true;
        const box = g.children[0];
        box.position.set(f.footprint.widthMm / 2, f.footprint.depthMm / 2, f.footprint.heightMm / 2);
        box.scale.set(f.footprint.widthMm + 10, f.footprint.depthMm + 10, f.footprint.heightMm + 10);
      }
      invalidate();
    };
    place();
    return ed.derived.subscribe(place);
  }, [ed, selection, invalidate]);

  return (
    <group name="selection">
      {selection.map((id) => (
        <group
          key={id}
          matrixAutoUpdate={false}
          ref={(g) => {
            if (g) groups.current.set(id, g);
            else groups.current.delete(id);
          }}
        >
          <lineSegments geometry={edges} material={lineMaterial} renderOrder={5} raycast={() => null} />
        </group>
      ))}
    </group>
  );
}
