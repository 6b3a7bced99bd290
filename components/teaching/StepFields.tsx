"use client";

import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { Step } from "./steps";

const input = "rounded-md border border-walnut-300 bg-white px-2 py-1";

/** The fields of one step in the walk-through editor. */
export function StepFields({ step, index, document, ruleIds, onChange }: { step: Step; index: number; document: PlanDocument; ruleIds: string[]; onChange: (s: Step) => void }) {
  const set = <K extends keyof Step>(k: K, v: Step[K]) => onChange({ ...step, [k]: v });
  const toggle = (id: string) => {
    const ids = step.highlight.fixtureIds.includes(id) ? step.highlight.fixtureIds.filter((x) => x !== id) : [...step.highlight.fixtureIds, id];
    onChange({ ...step, highlight: { ...step.highlight, fixtureIds: ids } });
  };
  const p = `step-${index}`;
  return (
    <div className="grid gap-2 md:grid-cols-2">
      <label className="flex flex-col text-sm">
        Title
        <input id={`${p}-title`} value={step.title} maxLength={120} onChange={(e) => set("title", e.target.value)} className={input} />
      </label>
      <label className="flex flex-col text-sm">
        View
        <select value={step.view} onChange={(e) => set("view", e.target.value as Step["view"])} className={input}>
          <option value="plan">plan</option>
          <option value="3d">3D</option>
          <option value="elevation">wall elevation</option>
        </select>
      </label>
      {step.view === "elevation" && (
        <label className="flex flex-col text-sm">
          Wall
          <select value={step.wallId ?? ""} onChange={(e) => set("wallId", e.target.value || undefined)} className={input}>
            {document.room.walls.map((w) => (
              <option key={w.id} value={w.id}>{w.label || w.id}</option>
            ))}
          </select>
        </label>
      )}
      <label className="flex flex-col text-sm">
        Rule it demonstrates
        <select value={step.ruleId ?? ""} onChange={(e) => set("ruleId", e.target.value || undefined)} className={input}>
          <option value="">none</option>
          {ruleIds.map((r) => (
            <option key={r} value={r}>{r}</option>
          ))}
        </select>
      </label>
      <label className="flex flex-col text-sm md:col-span-2">
        Note
        <textarea value={step.note} maxLength={2000} rows={3} onChange={(e) => set("note", e.target.value)} className={input} />
      </label>
      {document.fixtures.length > 0 && (
        <fieldset className="text-sm md:col-span-2">
          <legend>Highlight</legend>
          <div className="flex flex-wrap gap-3">
            {document.fixtures.map((f) => (
              <label key={f.id} className="flex items-center gap-1">
                <input type="checkbox" checked={step.highlight.fixtureIds.includes(f.id)} onChange={() => toggle(f.id)} />
                {f.label || f.id}
              </label>
            ))}
          </div>
        </fieldset>
      )}
    </div>
  );
}
