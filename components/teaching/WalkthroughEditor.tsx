"use client";

import Link from "next/link";
import { useState } from "react";
import { api } from "@/components/plans/api";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { StepFields } from "./StepFields";
import type { Step } from "./steps";

interface Props {
  id: string;
  initial: { title: string; steps: Step[]; published: boolean };
  document: PlanDocument;
  ruleIds: string[];
}

const blank = (): Step => ({ title: "New step", view: "plan", highlight: { fixtureIds: [], zoneIds: [] }, note: "" });

/** Builds the ordered steps of a walk-through; saving replaces the whole list. */
export function WalkthroughEditor({ id, initial, document, ruleIds }: Props) {
  const [title, setTitle] = useState(initial.title);
  const [published, setPublished] = useState(initial.published);
  const [steps, setSteps] = useState<Step[]>(initial.steps);
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const [studentUrl, setStudentUrl] = useState<string | null>(null);

  const move = (i: number, d: -1 | 1) => setSteps((s) => {
    const j = i + d;
    if (j < 0 || j >= s.length) return s;
    const next = [...s];
    [next[i], next[j]] = [next[j], next[i]];
    return next;
  });

  async function save() {
    try {
      await api(`/api/v1/walkthroughs/${id}`, { method: "PUT", body: JSON.stringify({ title, steps, published }) });
      setMsg({ ok: true, text: "Saved." });
    } catch (e) {
      setMsg({ ok: false, text: (e as Error).message });
    }
  }

  async function studentLink() {
    try {
      setStudentUrl((await api<{ url: string }>(`/api/v1/walkthroughs/${id}/link`, { method: "POST", body: "{}" })).url);
    } catch (e) {
      setMsg({ ok: false, text: (e as Error).message });
    }
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col text-sm">
          Title
          <input value={title} onChange={(e) => setTitle(e.target.value)} maxLength={120} className="rounded-md border border-walnut-300 bg-white px-2 py-1" />
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={published} onChange={(e) => setPublished(e.target.checked)} /> Published on my class page
        </label>
        <button onClick={save} className="rounded-md bg-walnut-700 px-3 py-1.5 text-sm font-medium text-paper">Save</button>
        <Link href={`/present/${id}`} className="text-sm underline">Present</Link>
        <button onClick={studentLink} className="text-sm underline">New student link</button>
      </div>
      {studentUrl && <input readOnly value={studentUrl} className="rounded border border-pine-500 bg-white px-2 py-1 font-mono text-xs" aria-label="Student link" />}
      {msg && <p role={msg.ok ? "status" : "alert"} className={`text-sm ${msg.ok ? "text-pine-700" : "text-brick-700"}`}>{msg.text}</p>}
      <ol className="flex flex-col gap-3">
        {steps.map((s, i) => (
          <li key={i} className="rounded-lg border border-walnut-100 bg-white p-3">
            <div className="mb-2 flex items-center gap-2 text-sm">
              <span className="font-semibold">Step {i + 1}</span>
              <button onClick={() => move(i, -1)} className="underline" aria-label={`Move step ${i + 1} up`}>up</button>
              <button onClick={() => move(i, 1)} className="underline" aria-label={`Move step ${i + 1} down`}>down</button>
              <button onClick={() => setSteps((all) => all.filter((_, k) => k !== i))} className="ml-auto text-brick-700 underline">Remove</button>
            </div>
            <StepFields step={s} index={i} document={document} ruleIds={ruleIds} onChange={(n) => setSteps((all) => all.map((x, k) => (k === i ? n : x)))} />
          </li>
        ))}
      </ol>
      <button onClick={() => setSteps((s) => [...s, blank()])} className="self-start rounded-md border border-walnut-700 px-3 py-1.5 text-sm">Add a step</button>
    </div>
  );
}
