"use client";
import dynamic from "next/dynamic";
import Link from "next/link";
import { EditorProvider } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";
import { Catalogue } from "./Catalogue";
import { FindingsList } from "./FindingsList";
import { OutlineList } from "./OutlineList";
import { PropertiesPanel } from "./PropertiesPanel";
import { RoomForm } from "./RoomForm";
import { ConflictDialog, RestoreBanner } from "./SaveDialogs";
import { SaveIndicator } from "./SaveIndicator";
import { SidePanel } from "./SidePanel";
import { Toolbar } from "./Toolbar";
import { PlanFiles } from "@/components/packet/PlanFiles";
import { useEditorSession, type PlanInit } from "./useEditorSession";
import { useShortcuts } from "./useShortcuts";
import { ViewBar } from "./ViewBar";
import { ZoneLegend } from "./ZoneLegend";

const EditorCanvas = dynamic(() => import("@/scene/EditorCanvas"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });
// Opened on demand, so they load when first shown rather than with the page: the Parts tab brings
// the parts tables, sheet nesting and shopping list; History and the shortcut sheet are rarely open.
const PartsTab = dynamic(() => import("./PartsTab").then((m) => m.PartsTab), { loading: () => <p className="text-sm text-walnut-500">Loading the parts…</p> });
const RevisionsPanel = dynamic(() => import("./RevisionsPanel").then((m) => m.RevisionsPanel), { loading: () => <p className="text-sm text-walnut-500">Loading the history…</p> });
const ShortcutHelp = dynamic(() => import("./ShortcutHelp").then((m) => m.ShortcutHelp));
const PlanSettings = dynamic(() => import("./PlanSettings").then((m) => m.PlanSettings));
const ElevationPhotos = dynamic(() => import("./ElevationPhotos").then((m) => m.ElevationPhotos));

function Announcer() {
  const text = useUi((s) => s.announcement);
  return (
    <p className="sr-only" role="status" aria-live="polite" data-testid="announcer">
      {text}
    </p>
  );
}

/** The room editor: panels, toolbar, the 3D view and the save machinery for one plan. */
export function EditorShell({ plan }: { plan: PlanInit }) {
  const { editor, saver, api } = useEditorSession(plan);
  useShortcuts(editor);
  return (
    <EditorProvider editor={editor}>
      <EditorLayout plan={plan} editor={editor} saver={saver} api={api} />
    </EditorProvider>
  );
}

/** The parts tables and sheet maps need room: the left panel widens while the Parts tab is open. */
function EditorLayout({ plan, editor, saver, api }: { plan: PlanInit } & ReturnType<typeof useEditorSession>) {
  const wide = useUi((s) => s.tab) === "parts";
  const helpOpen = useUi((s) => s.helpOpen);
  return (
    <>
      <div className="flex h-[calc(100vh-3.5rem)] min-h-[560px] flex-col bg-paper">
        <div className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-walnut-100 px-3 py-2">
          <h1 className="text-lg font-semibold text-walnut-900">{plan.name}</h1>
          <SaveIndicator saver={saver} />
          {plan.role === "viewer" ? <span className="rounded bg-steel-100 px-2 text-xs text-steel-700">View only: changes are not saved</span> : null}
          {plan.role === "owner" ? (
            <Link href={`/plans/${plan.id}/share`} className="rounded border border-walnut-300 px-2 py-0.5 text-xs text-walnut-900 hover:bg-walnut-100" data-testid="share-link">
              Share
            </Link>
          ) : null}
          <Link href={`/plans/${plan.id}/shop`} className="rounded border border-walnut-300 px-2 py-0.5 text-xs text-walnut-900 hover:bg-walnut-100" data-testid="shop-link">
            At the saw (phone view)
          </Link>
          <PlanFiles planId={plan.id} walls={plan.document.room.walls} />
          <div className="ml-auto">
            <Toolbar />
          </div>
        </div>
        <RestoreBanner saver={saver} editor={editor} />
        <div className={`grid min-h-0 flex-1 grid-cols-1 ${wide ? "lg:grid-cols-[minmax(560px,58%)_minmax(0,1fr)_260px]" : "lg:grid-cols-[330px_minmax(0,1fr)_300px]"}`}>
          <aside className="min-h-0 border-r border-walnut-100 bg-paper-deep/40" aria-label="Plan panels">
            <SidePanel
              tabs={[
                {
                  id: "room",
                  label: "Room",
                  body: () => (
                    <div className="flex flex-col gap-4">
                      <PlanSettings planId={plan.id} canEdit={plan.role !== "viewer"} />
                      <RoomForm />
                    </div>
                  ),
                },
                {
                  id: "layout",
                  label: "Layout",
                  body: () => (
                    <div className="flex flex-col gap-4">
                      <Catalogue />
                      <OutlineList />
                    </div>
                  ),
                },
                { id: "checks", label: "Checks", body: () => <FindingsList /> },
                { id: "parts", label: "Parts", body: () => <PartsTab /> },
                { id: "history", label: "History", body: () => <RevisionsPanel api={api} planId={plan.id} saver={saver} editor={editor} /> },
              ]}
            />
          </aside>
          <section className="flex min-h-[360px] flex-col gap-2 p-2" aria-label="View">
            <ViewBar />
            <div className="relative min-h-0 flex-1 overflow-hidden rounded-lg border border-walnut-100">
              <EditorCanvas editor={editor} label={`3D view of ${plan.name}. Use the outline list to select fixtures and the arrow keys to move them.`} />
            </div>
            <ZoneLegend />
            <ElevationPhotos planId={plan.id} canEdit={plan.role !== "viewer"} />
          </section>
          <aside className="min-h-0 overflow-y-auto border-l border-walnut-100 p-3" aria-label="Properties">
            <PropertiesPanel />
          </aside>
        </div>
        <Announcer />
        {helpOpen ? <ShortcutHelp /> : null}
        <ConflictDialog saver={saver} editor={editor} name={plan.name} />
      </div>
    </>
  );
}
