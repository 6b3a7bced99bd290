"use client";

import { useState, type FormEvent } from "react";
import { ApiError, api } from "@/components/plans/api";
import { DEFAULT_RULE_NUMBERS, RULE_NUMBER_KEYS } from "@/lib/engine/checks/numbers";
import { formatLength } from "@/lib/engine/units/format-length";
import { parseLength } from "@/lib/engine/units/parse-length";

export interface PresetRow {
  id: string;
  name: string;
  description: string;
  numbers: Record<string, number>;
  published: boolean;
}

const isLength = (k: string) => k.endsWith("Mm");
const label = (k: string) => k.replace(/Mm$/, "").replace(/([A-Z])/g, " $1").toLowerCase();
const show = (k: string, v: number) => (isLength(k) ? formatLength(v, { units: "in", precision: 32 }) : String(v));

/** Reads one typed number: lengths as the engine reads any length (fractions, feet and inches, metric), the rest as plain numbers. */
function readNumber(k: string, raw: string): { ok: true; value: number } | { ok: false; message: string } {
  if (isLength(k)) {
    const r = parseLength(raw, { units: "in" });
    return r.ok ? { ok: true, value: r.mm } : r;
  }
  const n = Number(raw);
  return Number.isFinite(n) ? { ok: true, value: n } : { ok: false, message: "Type a number." };
}

/** Create or edit a preset: only the numbers filled in are set; lengths are typed in inches and stored in mm. */
export function PresetForm({ preset, onSaved }: { preset?: PresetRow; onSaved: () => void }) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const numbers: Record<string, number> = {};
    const bad: Record<string, string> = {};
    for (const k of RULE_NUMBER_KEYS) {
      const raw = String(f.get(`n-${k}`) ?? "").trim();
      if (raw === "") continue;
      const read = readNumber(k, raw);
      if (read.ok) numbers[k] = read.value;
      else bad[`numbers.${k}`] = read.message;
    }
    // Nothing is sent, and nothing typed is lost, until every number reads.
    if (Object.keys(bad).length) return setErrors({ ...bad, _: "Some numbers could not be read." });
    const body = { name: f.get("name"), description: f.get("description") ?? "", published: f.get("published") === "on", numbers };
    try {
      await api(preset ? `/api/v1/presets/${preset.id}` : "/api/v1/presets", { method: preset ? "PUT" : "POST", body: JSON.stringify(body) });
      setErrors({});
      onSaved();
    } catch (err) {
      const fields = err instanceof ApiError ? (err.body as { error?: { fields?: Record<string, string> } })?.error?.fields : undefined;
      setErrors({ ...(fields ?? {}), _: (err as Error).message });
    }
  }
  return (
    <form onSubmit={submit} className="flex flex-col gap-3 rounded-lg border border-walnut-100 bg-white p-4">
      <label className="flex flex-col text-sm">
        Name
        <input name="name" required maxLength={120} defaultValue={preset?.name} className="rounded-md border border-walnut-300 px-2 py-1" />
      </label>
      <label className="flex flex-col text-sm">
        What it is for
        <textarea name="description" rows={2} maxLength={2000} defaultValue={preset?.description} className="rounded-md border border-walnut-300 px-2 py-1" />
      </label>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" name="published" defaultChecked={preset?.published} /> Published (students and other plans can adopt it)
      </label>
      <fieldset className="grid gap-2 text-sm sm:grid-cols-2">
        <legend className="mb-1 font-medium">Numbers to set (blank keeps the default shown; lengths as on a tape: 42, 3&apos; 6&quot;, 1067 mm)</legend>
        {RULE_NUMBER_KEYS.map((k) => (
          <label key={k} className="flex flex-col">
            {label(k)}
            <input name={`n-${k}`} defaultValue={preset?.numbers[k] !== undefined ? show(k, preset.numbers[k]) : ""} placeholder={show(k, DEFAULT_RULE_NUMBERS[k])} className="rounded-md border border-walnut-300 px-2 py-1" />
            {errors[`numbers.${k}`] && <span className="text-brick-700">{errors[`numbers.${k}`]}</span>}
          </label>
        ))}
      </fieldset>
      {errors._ && <p role="alert" className="text-sm text-brick-700">{errors._}</p>}
      <button type="submit" className="self-start rounded-md bg-walnut-700 px-3 py-1.5 text-sm font-medium text-paper">{preset ? "Save preset" : "Create preset"}</button>
    </form>
  );
}
