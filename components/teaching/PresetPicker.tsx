"use client";

import { useEffect, useState } from "react";
import { api } from "@/components/plans/api";

interface PresetRow {
  id: string;
  name: string;
  ownerName: string;
  published: boolean;
}

/** Lets an editor adopt a class preset for the plan (a normal versioned save of settings.presetId). */
export function PresetPicker({ planId, canEdit }: { planId: string; canEdit: boolean }) {
  const [presets, setPresets] = useState<PresetRow[]>([]);
  const [current, setCurrent] = useState<string>("");
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);

  useEffect(() => {
    Promise.all([api<{ presets: PresetRow[] }>("/api/v1/presets"), api<{ preset: PresetRow | null }>(`/api/v1/plans/${planId}/preset`)])
      .then(([list, mine]) => {
        setPresets(list.presets);
        setCurrent(mine.preset?.id ?? "");
      })
      .catch((e: Error) => setMsg({ ok: false, text: e.message }));
  }, [planId]);

  async function adopt(presetId: string) {
    try {
      const { plan } = await api<{ plan: { version: number } }>(`/api/v1/plans/${planId}`);
      await api(`/api/v1/plans/${planId}/preset`, { method: "PUT", body: JSON.stringify({ presetId: presetId || null, version: plan.version }) });
      setCurrent(presetId);
      setMsg({ ok: true, text: presetId ? "The checks now use this preset's numbers." : "The checks use the standard numbers again." });
    } catch (e) {
      setMsg({ ok: false, text: (e as Error).message });
    }
  }

  return (
    <section aria-labelledby="preset-h" className="flex flex-col gap-2">
      <h2 id="preset-h" className="text-lg font-semibold text-walnut-900">Class rules</h2>
      <p className="text-sm text-walnut-700">An instructor&apos;s preset can tighten the numbers the checks use; every finding then says so.</p>
      <label className="flex flex-col text-sm">
        Preset
        <select value={current} disabled={!canEdit} onChange={(e) => adopt(e.target.value)} className="max-w-md rounded-md border border-walnut-300 bg-white px-2 py-1">
          <option value="">Standard numbers (no preset)</option>
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
