"use client";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived } from "@/lib/client/react/useEditorState";

/** Read-only numbers the engine works out for a fixture: size, work surface, flush shelf height, drawer boxes. */
export function DerivedFacts({ id }: { id: string }) {
  const ed = useEditor();
  const placed = useDerived((s) => s.fixtureById.get(id));
  const parts = useDerived((s) => s.derived?.parts);
  const drawerParts = (parts ?? []).filter((p) => p.fixtureId === id && /drawer/i.test(p.name));
  if (!placed) return null;
  const f = ed.formatLength.bind(ed);
  const tool = placed.boxes.find((b) => b.role === "tool");
  return (
    <section aria-labelledby={`facts-${id}`} className="rounded border border-walnut-100 bg-white/60 p-2 text-xs" data-testid="derived-facts">
      <h3 id={`facts-${id}`} className="font-semibold text-walnut-900">
        Worked out
      </h3>
      <dl className="grid grid-cols-[auto_1fr] gap-x-2 tabular-nums">
        <dt>Overall</dt>
        <dd>
          {f(placed.footprint.widthMm)} wide × {f(placed.footprint.depthMm)} deep × {f(placed.footprint.heightMm)} high
        </dd>
        {placed.workSurfaceMm !== undefined ? (
          <>
            <dt>{tool ? "Tool table at" : "Work surface at"}</dt>
            <dd data-testid="work-surface">{f(placed.origin.z + placed.workSurfaceMm)}</dd>
          </>
        ) : null}
        {tool ? (
          <>
            <dt>Shelf top (flush)</dt>
            <dd data-testid="shelf-top">{f(tool.z)}</dd>
          </>
        ) : null}
      </dl>
      {drawerParts.length ? (
        <table className="mt-1 w-full tabular-nums">
          <caption className="text-left font-semibold text-walnut-900">Drawer parts</caption>
          <thead>
            <tr className="text-left text-walnut-500">
              <th scope="col">Part</th>
              <th scope="col">Qty</th>
              <th scope="col">Size</th>
            </tr>
          </thead>
          <tbody>
            {drawerParts.slice(0, 24).map((p) => (
              <tr key={p.id}>
                <td>{p.name}</td>
                <td>{p.qty}</td>
                <td>
                  {f(p.lengthMm)} × {f(p.widthMm)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}
