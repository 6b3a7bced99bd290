"use client";
import { useEffect } from "react";
import type { Editor } from "@/lib/client/editor";
import type { AdoptedPreset } from "@/lib/client/engine-port";

type PresetReply = { preset: AdoptedPreset | null };

async function getJson(url: string): Promise<PresetReply | null> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  return res.ok ? ((await res.json()) as PresetReply) : null;
}

/**
 * Keeps the editor's live checks on the adopted preset's numbers. At load the plan's preset comes
 * from the plan (GET /api/v1/plans/[id]/preset); a preset adopted in the editor is not saved yet,
 * so it is read by its own id. A preset that cannot be read leaves the standard numbers in force.
 */
export function usePlanPreset(editor: Editor, planId: string): void {
  useEffect(() => {
    let alive = true;
    let loaded: string | null | undefined;
    const initial = editor.doc.settings.presetId ?? null;
    const apply = (want: string | null, reply: PresetReply | null) => {
      // Only the answer for the preset the document still names counts (adoptions may overtake each other).
      if (!alive || (editor.doc.settings.presetId ?? null) !== want) return;
      const p = reply?.preset ?? null;
      editor.setPreset(p && p.id === want ? { id: p.id, name: p.name, numbers: p.numbers } : null);
      if (want && !p) editor.announce("The class preset could not be read; the checks use the standard numbers.");
    };
    const follow = (want: string | null, first: boolean) => {
      if (want === loaded) return;
      loaded = want;
      if (!want) return apply(null, null);
      const url = first ? `/api/v1/plans/${planId}/preset` : `/api/v1/presets/${want}`;
      getJson(url).then((r) => apply(want, r), () => apply(want, null));
    };
    follow(initial, true);
    const unsub = editor.history.store.subscribe((s) => follow(s.doc.settings.presetId ?? null, false));
    return () => {
      alive = false;
      unsub();
    };
  }, [editor, planId]);
}
