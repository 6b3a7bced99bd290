"use client";

import { useEffect, useState } from "react";
import { api } from "@/components/plans/api";

interface PresetRow {
  id: string;
  name: string;
  ownerName: string;
  published: boolean;
}

/**
 * Lets an editor adopt a class preset for the plan. On its own (the share page) it saves
 * settings.presetId as a normal versioned save. Inside the editor, pass `value` and `onAdopt`: the
 * choice is then an edit of the editor's document, saved by its autosave with its version.
 */
export function PresetPicker({ planId, canEdit, value, onAdopt, headingLevel = 2 }: { planId: string; canEdit: boolean; value?: string | null; onAdopt?: (presetId: string | null) => void; headingLevel?: 2 | 3 }) {
  const [presets, setPresets] = useState<PresetRow[]>([]);
  const [saved, setSaved] = useState<string>("");
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const controlled = onAdopt !== undefined;
  const current = controlled ? (value ?? "") : saved;

  useEffect(() => {
    const list = api<{ presets: PresetRow[] }>("/api/v1/presets");
    const mine = controlled ? Promise.resolve(null) : api<{ preset: PresetRow | null }>(`/api/v1/plans/${planId}/preset`);
    Promise.all([list, mine])
      .then(([l, m]) => {
        setPresets(l.presets);
        if (m) setSaved(m.preset?.id ?? "");
      })
      .catch((e: Error) => setMsg({ ok: false, text: e.message }));
  }, [planId, controlled]);

  async function adopt(presetId: string) {
    if (onAdopt) {
      onAdopt(presetId || null);
      setMsg({ ok: true, text: presetId ? "The checks now use this preset's numbers." : "The checks use the standard numbers again." });
      return;
    }
    try {
      const { plan } = await api<{ plan: { version: number } }>(`/api/v1/plans/${planId}`);
      await api(`/api/v1/plans/${planId}/preset`, { method: "PUT", body: JSON.stringify({ presetId: presetId || null, version: plan.version }) });
      setSaved(presetId);
      setMsg({ ok: true, text: presetId ? "The checks now use this preset's numbers." : "The checks use the standard numbers again." });
    } catch (e) {
      setMsg({ ok: false, text: (e as Error).message });
    }
  }

  return (
    <section aria-labelledby="preset-h" className="flex flex-col gap-2">
      {headingLevel === 2 ? (
        <h2 id="preset-h" className="text-lg font-semibold text-walnut-900">Class rules</h2>
      ) : (
        <h3 id="preset-h" className="text-sm font-semibold text-walnut-900">Class rules</h3>
      )}
      <p className="text-sm text-walnut-700">An instructor&apos;s preset can tighten the numbers the checks use; every finding then says so.</p>
      <label className="flex flex-col text-sm">
        Preset
        <select value={current} disabled={!canEdit} onChange={(e) => adopt(e.target.value)} className="max-w-md rounded-md border border-walnut-300 bg-white px-2 py-1">
          <option value="">Standard numbers (no preset)</option>
          {current && !presets.some((p) => p.id === current) ? <option value={current}>The plan&apos;s preset</option> : null}
          {presets.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} · {p.ownerName}
              {p.published ? "" : " (draft)"}
            </option>
          ))}
        </select>
      </label>
      {msg && <p role={msg.ok ? "status" : "alert"} className={`text-sm ${msg.ok ? "text-pine-700" : "text-brick-700"}`}>{msg.text}</p>}
    </section>
  );
}
