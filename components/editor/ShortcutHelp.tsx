"use client";
import { useEffect, useRef } from "react";
import { commands } from "@/lib/client/commands/registry";
import { describeChord } from "@/lib/client/commands/shortcuts";
import type { CommandGroup } from "@/lib/client/commands/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useUi } from "@/lib/client/react/useEditorState";

const groups: { id: CommandGroup; title: string }[] = [
  { id: "edit", title: "Edit" },
  { id: "arrange", title: "Arrange" },
  { id: "tools", title: "Tools" },
  { id: "view", title: "View" },
  { id: "help", title: "Help" },
];

/** The shortcut sheet, built from the same command registry the keyboard and toolbar use. */
export function ShortcutHelp() {
  const ed = useEditor();
  const open = useUi((s) => s.helpOpen);
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (open) close.current?.focus();
  }, [open]);
  if (!open) return null;
  const mac = typeof navigator !== "undefined" && /Mac|iPhone|iPad/.test(navigator.platform);
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-walnut-900/40 p-4" onClick={() => ed.ui.setState({ helpOpen: false })}>
      <div role="dialog" aria-modal="true" aria-labelledby="help-h" className="max-h-[85vh] w-full max-w-2xl overflow-auto rounded-lg bg-paper p-4 shadow-xl" onClick={(e) => e.stopPropagation()}>
        <div className="flex items-center justify-between">
          <h2 id="help-h" className="text-lg font-semibold text-walnut-900">
            Keyboard shortcuts
          </h2>
          <button ref={close} type="button" className="rounded px-2 py-1 text-sm underline focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500" onClick={() => ed.ui.setState({ helpOpen: false })}>
            Close
          </button>
        </div>
        <div className="mt-2 grid gap-4 sm:grid-cols-2">
          {groups.map((g) => (
            <section key={g.id}>
              <h3 className="text-sm font-semibold text-walnut-700">{g.title}</h3>
              <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-1 text-sm">
                {commands
                  .filter((c) => c.group === g.id)
                  .map((c) => (
                    <div key={c.name} className="contents">
                      <dt>{c.label}</dt>
                      <dd className="text-right">
                        {c.shortcuts.map((s) => (
                          <kbd key={s} className="ml-1 rounded border border-walnut-300 bg-white px-1 font-mono text-xs">
                            {describeChord(s, mac)}
                          </kbd>
                        ))}
                      </dd>
                    </div>
                  ))}
              </dl>
            </section>
          ))}
        </div>
        <p className="mt-3 text-xs text-walnut-500">Hold Alt while dragging or placing to turn snapping off for that move.</p>
      </div>
    </div>
  );
}
