"use client";
import { run } from "@/lib/client/commands/registry";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";
import { setLabel, setParams } from "@/lib/client/store/fixture-ops";
import { DerivedFacts } from "./DerivedFacts";
import { StopTrackTable } from "./StopTrackTable";
import { FixtureFindings } from "./FindingsList";
import { FixturePlacement } from "./PlacementFields";
import { SchemaForm } from "./SchemaForm";

/** The selected fixture's properties: position, parameters from its kind's schema, and what the engine works out. */
export function PropertiesPanel() {
  const ed = useEditor();
  const selection = useUi((s) => s.selection);
  const fixture = useDoc((d) => (selection.length === 1 ? d.fixtures.find((f) => f.id === selection[0]) : undefined));
  if (selection.length === 0) {
    return <p className="text-sm text-walnut-500">Select a fixture to see its properties. Tab to the outline list to select with the keyboard.</p>;
  }
  if (!fixture) {
    return (
      <div className="flex flex-col gap-2 text-sm">
        <p>{selection.length} fixtures selected.</p>
        <div className="flex gap-2">
          <button type="button" className="rounded border border-walnut-300 px-2 py-1 text-xs" onClick={() => run(ed, "duplicate")}>
            Duplicate all
          </button>
          <button type="button" className="rounded border border-brick-500 px-2 py-1 text-xs text-brick-700" onClick={() => run(ed, "delete")}>
            Delete all
          </button>
        </div>
      </div>
    );
  }
  const kind = ed.engine.kinds().find((k) => k.kind === fixture.kind);
  const schema = ed.engine.paramsSchema(fixture.kind);
  return (
    <div className="flex flex-col gap-3" data-testid="properties">
      <div>
        <h2 className="text-sm font-semibold text-walnut-900">{kind?.title ?? fixture.kind}</h2>
        <label htmlFor={`${fixture.id}-label`} className="block text-xs font-medium text-walnut-700">
          Name
        </label>
        <input
          id={`${fixture.id}-label`}
          key={fixture.label}
          defaultValue={fixture.label}
          placeholder={kind?.title}
          className="mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
          onBlur={(e) => ed.edit((d) => setLabel(d, fixture.id, e.target.value.slice(0, 80)))}
        />
      </div>
      <FixturePlacement fixture={fixture} />
      {schema ? <SchemaForm key={fixture.id} idPrefix={fixture.id} schema={schema} value={fixture.params} onValid={(next) => ed.edit((d) => setParams(d, fixture.id, next))} /> : <p className="text-xs text-brick-700">Unknown fixture kind.</p>}
      <DerivedFacts id={fixture.id} />
      {fixture.kind === "stop-track" && <StopTrackTable id={fixture.id} />}
      <FixtureFindings id={fixture.id} />
      <div className="flex gap-2">
        <button type="button" className="rounded border border-walnut-300 px-2 py-1 text-xs" onClick={() => run(ed, "duplicate")}>
          Duplicate
        </button>
        <button type="button" className="rounded border border-brick-500 px-2 py-1 text-xs text-brick-700" onClick={() => run(ed, "delete")}>
          Delete
        </button>
      </div>
    </div>
  );
}
