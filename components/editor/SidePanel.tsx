"use client";
import type { ReactNode } from "react";
import type { PanelTab } from "@/lib/client/store/ui-store";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useUi } from "@/lib/client/react/useEditorState";

/** Tabs for the left panel (a real tab list: arrow keys move between tabs). */
export function SidePanel({ tabs }: { tabs: { id: PanelTab; label: string; body: () => ReactNode }[] }) {
  const ed = useEditor();
  const tab = useUi((s) => s.tab);
  const failing = useDerived((s) => s.findings.filter((f) => !f.pass).length);
  const current = tabs.find((t) => t.id === tab) ?? tabs[0];
  return (
    <div className="flex min-h-0 flex-col">
      <div
        role="tablist"
        aria-label="Panels"
        className="flex border-b border-walnut-100"
        onKeyDown={(e) => {
          if (e.key !== "ArrowRight" && e.key !== "ArrowLeft") return;
          e.preventDefault();
          const i = tabs.findIndex((t) => t.id === current.id);
          const next = tabs[(i + (e.key === "ArrowRight" ? 1 : tabs.length - 1)) % tabs.length];
          ed.ui.setState({ tab: next.id });
          document.getElementById(`tab-${next.id}`)?.focus();
        }}
      >
        {tabs.map((t) => (
          <button
            key={t.id}
            id={`tab-${t.id}`}
            role="tab"
            type="button"
            aria-selected={t.id === current.id}
            aria-controls={`panel-${t.id}`}
            tabIndex={t.id === current.id ? 0 : -1}
            className="flex-1 px-2 py-1.5 text-xs font-medium text-walnut-700 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-selected:border-b-2 aria-selected:border-walnut-700 aria-selected:text-walnut-900"
            onClick={() => ed.ui.setState({ tab: t.id })}
          >
            {t.label}
            {t.id === "checks" && failing ? <span className="ml-1 rounded bg-brick-100 px-1 text-brick-700">{failing}</span> : null}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`panel-${current.id}`} aria-labelledby={`tab-${current.id}`} className="min-h-0 flex-1 overflow-y-auto p-3">
        {current.body()}
      </div>
    </div>
  );
}
