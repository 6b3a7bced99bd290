"use client";
import { run } from "@/lib/client/commands/registry";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useDoc, useUi } from "@/lib/client/react/useEditorState";
import { TRACK_KIND } from "@/lib/client/tools/track-attach";
import { setLabel, setParams } from "@/lib/client/store/fixture-ops";
import { DerivedFacts } from "./DerivedFacts";
import { StopTrackTable } from "./StopTrackTable";
import { FixtureFindings } from "./FindingsList";
import { FixtureDistances } from "./FixtureDistances";
import { FixturePlacement } from "./PlacementFields";
import { SchemaForm } from "./SchemaForm";
import { TRACK_MOUNT_FIELDS, TrackMount } from "./TrackMount";

const NONE: readonly string[] = [];
/** On its saw, the fence's distance from the wall comes from the saw's fence too. */
const TRACK_HIDDEN_ATTACHED: readonly string[] = [...TRACK_MOUNT_FIELDS, "fromWallMm"];

/** The selected fixture's properties: position, parameters from its kind's schema, and what the engine works out. */
export function PropertiesPanel() {
  const ed = useEditor();
  const selection = useUi((s) => s.selection);
  const fixture = useDoc((d) => (selection.length === 1 ? d.fixtures.find((f) => f.id === selection[0]) : undefined));
  const attached = useDerived((s) => (fixture ? s.fixtureById.get(fixture.id)?.track?.attached === true : false));
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
  const track = fixture.kind === TRACK_KIND;
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
      {track ? <TrackMount fixture={fixture} /> : null}
      {attached ? (
        <p className="rounded border border-walnut-100 p-2 text-xs text-walnut-700" data-testid="track-follows">
          Placed from its saw: it moves when the saw or the counters beside it move.
        </p>
      ) : (
        <>
          <FixturePlacement fixture={fixture} />
          <FixtureDistances fixture={fixture} />
        </>
      )}
      {schema ? <SchemaForm key={fixture.id} idPrefix={fixture.id} schema={schema} value={fixture.params} hide={track ? (attached ? TRACK_HIDDEN_ATTACHED : TRACK_MOUNT_FIELDS) : NONE} onValid={(next) => ed.edit((d) => setParams(d, fixture.id, next))} /> : <p className="text-xs text-brick-700">Unknown fixture kind.</p>}
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
