"use client";

import { useState } from "react";
import type { OffcutInput } from "@/lib/engine/nesting/types";
import type { Material, PlanSettings } from "@/lib/engine/plan/schema";
import { parseLength } from "@/lib/engine/units/parse-length";
import type { Formatters } from "./format";

interface Props {
  offcuts: OffcutInput[];
  onChange: (next: OffcutInput[]) => void;
  materials: readonly Material[];
  settings: Pick<PlanSettings, "units">;
  fmt: Formatters;
}

/** Offcuts on hand, used before new sheets: material, size in the plan's units, count. */
export function OffcutsForm({ offcuts, onChange, materials, settings, fmt }: Props) {
  const sheets = materials.filter((m) => m.form === "sheet");
  const [materialId, setMaterialId] = useState(sheets[0]?.id ?? "");
  const [len, setLen] = useState("");
  const [wid, setWid] = useState("");
  const [qty, setQty] = useState(1);
  const [error, setError] = useState<string | null>(null);

  const add = () => {
    const l = parseLength(len, { units: settings.units });
    const w = parseLength(wid, { units: settings.units });
    if (!l.ok) return setError(`Length: ${l.message}`);
    if (!w.ok) return setError(`Width: ${w.message}`);
    if (!materialId) return setError("Choose a material.");
    setError(null);
    onChange([...offcuts, { id: `offcut-${Date.now().toString(36)}`, materialId, lengthMm: l.mm, widthMm: w.mm, qty: Math.max(1, Math.round(qty)) }]);
    setLen("");
    setWid("");
  };

  return (
    <details className="no-print rounded border border-walnut-100 bg-white/60 p-3 text-sm">
      <summary className="cursor-pointer font-semibold text-walnut-900">Offcuts on hand ({offcuts.length})</summary>
      <p className="mt-1 text-xs text-walnut-500">Pieces from earlier work are filled first; their sawn edges are not trimmed.</p>
      <ul className="mt-2">
        {offcuts.map((o) => (
          <li key={o.id} className="flex items-center gap-2">
            {o.qty} x {materials.find((m) => m.id === o.materialId)?.name ?? o.materialId}, {fmt.size(o.lengthMm, o.widthMm)}
            <button type="button" aria-label="Remove this offcut" onClick={() => onChange(offcuts.filter((x) => x.id !== o.id))} className="text-brick-700">
              ×
            </button>
          </li>
        ))}
      </ul>
      <div className="mt-2 flex flex-wrap items-end gap-2">
        <label className="flex flex-col">
          <span className="text-xs text-walnut-700">Material</span>
          <select value={materialId} onChange={(e) => setMaterialId(e.target.value)} className="rounded border border-walnut-300 bg-white px-1 py-0.5">
            {sheets.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="text-xs text-walnut-700">Length</span>
          <input value={len} onChange={(e) => setLen(e.target.value)} className="w-24 rounded border border-walnut-300 px-1 py-0.5" />
        </label>
        <label className="flex flex-col">
          <span className="text-xs text-walnut-700">Width</span>
          <input value={wid} onChange={(e) => setWid(e.target.value)} className="w-24 rounded border border-walnut-300 px-1 py-0.5" />
        </label>
        <label className="flex flex-col">
          <span className="text-xs text-walnut-700">How many</span>
          <input type="number" min={1} value={qty} onChange={(e) => setQty(Number(e.target.value))} className="w-16 rounded border border-walnut-300 px-1 py-0.5" />
        </label>
        <button type="button" onClick={add} className="rounded-md border border-walnut-300 px-3 py-1">
          Add offcut
        </button>
      </div>
      {error && (
        <p role="alert" className="mt-1 text-brick-700">
          {error}
        </p>
      )}
    </details>
  );
}
