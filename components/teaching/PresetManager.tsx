"use client";

import { useCallback, useEffect, useState } from "react";
import { api } from "@/components/plans/api";
import { PresetForm, type PresetRow } from "./PresetForm";

/** An instructor's presets: list, edit one at a time, delete, make a new one. */
export function PresetManager({ ownerId }: { ownerId: string }) {
  const [rows, setRows] = useState<PresetRow[]>([]);
  const [editing, setEditing] = useState<string | "new" | null>(null);
  const load = useCallback(() => api<{ presets: (PresetRow & { ownerId: string })[] }>(`/api/v1/presets?owner=${ownerId}`).then((r) => setRows(r.presets)), [ownerId]);
  useEffect(() => {
    void load();
  }, [load]);
  const done = () => {
    setEditing(null);
    void load();
  };
  return (
    <div className="flex flex-col gap-4">
      <ul className="flex flex-col gap-2">
        {rows.map((p) => (
          <li key={p.id} className="rounded-md border border-walnut-100 bg-white p-3">
            <div className="flex flex-wrap items-center gap-3">
              <span className="font-medium">{p.name}</span>
              <span className="text-sm text-walnut-500">{p.published ? "published" : "draft"} · {Object.keys(p.numbers).length} numbers</span>
              <button className="ml-auto text-sm underline" onClick={() => setEditing(editing === p.id ? null : p.id)}>{editing === p.id ? "Close" : "Edit"}</button>
              <button className="text-sm text-brick-700 underline" onClick={() => api(`/api/v1/presets/${p.id}`, { method: "DELETE" }).then(load)}>Delete</button>
            </div>
            {editing === p.id && <PresetForm preset={p} onSaved={done} />}
          </li>
        ))}
      </ul>
      {editing === "new" ? <PresetForm onSaved={done} /> : <button className="self-start rounded-md border border-walnut-700 px-3 py-1.5 text-sm" onClick={() => setEditing("new")}>New preset</button>}
    </div>
  );
}
