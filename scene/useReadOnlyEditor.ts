"use client";
import { useEffect, useMemo } from "react";
import { Editor } from "@/lib/client/editor";
import { liveEngine } from "@/lib/client/engine-live";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";

/** The class preset a read-only page shows its checks with (null: the standard numbers). */
export interface ReadOnlyPreset {
  name: string;
  numbers: Partial<RuleNumbers>;
}

/**
 * An editor over a plan that nobody edits: the same derived plan, findings and layers as the
 * editor's, for read-only pages. No tool, shortcut or save is mounted around it, so nothing can
 * change the document; `highlight` selects fixtures so their outline and zones show.
 */
export function useReadOnlyEditor(document: PlanDocument, preset: ReadOnlyPreset | null = null, highlight: readonly string[] = []): Editor {
  // Keyed by the preset's content: a page may hand a fresh but equal object on each render.
  const presetKey = preset ? JSON.stringify(preset) : "";
  const editor = useMemo(() => {
    const ed = new Editor({ doc: document, engine: liveEngine, ui: { view: "orbit" } });
    const p = presetKey ? (JSON.parse(presetKey) as ReadOnlyPreset) : null;
    if (p) ed.setPreset({ id: "read-only", name: p.name, numbers: p.numbers });
    return ed;
  }, [document, presetKey]);
  useEffect(() => () => editor.dispose(), [editor]);
  const key = highlight.join(" ");
  useEffect(() => {
    editor.select(key ? key.split(" ").filter((id) => editor.fixture(id)) : []);
  }, [editor, key]);
  return editor;
}
