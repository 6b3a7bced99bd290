"use client";

import Link from "next/link";
import { useCallback, useEffect, useRef, useState } from "react";
import type { Finding } from "@/lib/engine/checks/types";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { StepStage } from "./StepStage";
import { stepForKey, type Step } from "./steps";

interface Props {
  title: string;
  planName: string;
  ownerName: string;
  steps: Step[];
  document: PlanDocument;
  /** The plan view and wall elevations, made on the server by the engine (null when the room cannot be solved). */
  drawings: PlanDrawings | null;
  presetName: string | null;
  /** The plan's findings (server-computed), so a step can show what its rule says about this plan. */
  findings: Finding[];
}

/** Full-screen presentation: one step at a time, arrow keys or buttons to move, F for full screen. */
export function Presenter({ title, planName, ownerName, steps, document, drawings, presetName, findings }: Props) {
  const [i, setI] = useState(0);
  const root = useRef<HTMLDivElement>(null);
  const count = steps.length;

  const toggleFull = useCallback(() => {
    if (window.document.fullscreenElement) void window.document.exitFullscreen();
    else void root.current?.requestFullscreen?.().catch(() => undefined);
  }, []);

  useEffect(() => {
    function onKey(e: KeyboardEvent) {
      if (e.target instanceof HTMLElement && /^(INPUT|TEXTAREA|SELECT)$/.test(e.target.tagName)) return;
      if (e.key === "f" || e.key === "F") {
        toggleFull();
        return;
      }
      const next = stepForKey(e.key, i, count);
      if (next === null) return;
      e.preventDefault();
      setI(next);
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [i, count, toggleFull]);

  const step = steps[i];
  return (
    <div ref={root} className="fixed inset-0 z-40 flex flex-col bg-paper" data-testid="presenter">
      <header className="flex items-center gap-3 border-b border-walnut-100 px-4 py-2 text-sm">
        <span className="font-semibold text-walnut-900">{title}</span>
        <span className="text-walnut-500">{planName} · {ownerName}</span>
        {presetName && <span className="rounded bg-amberline-100 px-2 py-0.5 text-amberline-700">preset: {presetName}</span>}
        <span className="ml-auto" aria-live="polite" data-testid="step-counter">
          Step {count ? i + 1 : 0} of {count}
        </span>
        <button onClick={toggleFull} className="rounded border border-walnut-300 px-2 py-0.5">Full screen (F)</button>
      </header>
      {step ? (
        <div className="grid min-h-0 flex-1 grid-rows-[1fr_auto] md:grid-cols-[1fr_22rem] md:grid-rows-1">
          <div className="min-h-0" data-testid="step-stage" data-view={step.view}>
            <StepStage document={document} drawings={drawings} step={step} />
          </div>
          <aside className="flex flex-col gap-3 overflow-auto border-l border-walnut-100 bg-paper-deep p-4">
            <h1 className="text-xl font-semibold text-walnut-900" data-testid="step-title">{step.title}</h1>
            {step.note && <p className="whitespace-pre-line text-walnut-900">{step.note}</p>}
            {step.ruleId && (
              <ul className="flex flex-col gap-1 text-sm" data-testid="step-findings">
                {findings
                  .filter((f) => f.ruleId === step.ruleId)
                  .slice(0, 4)
                  .map((f, k) => (
                    <li key={k} className={`rounded border-l-4 bg-white px-2 py-1 ${f.pass ? "border-pine-500" : f.severity === "conflict" ? "border-brick-500" : "border-amberline-500"}`}>
                      {f.message}
                    </li>
                  ))}
              </ul>
            )}
            {step.ruleId && (
              <Link className="text-sm underline" href={`/rules/${step.ruleId}`} target="_blank">
                The rule behind this step: {step.ruleId}
              </Link>
            )}
            <nav className="mt-auto flex gap-2" aria-label="Steps">
              <button onClick={() => setI(Math.max(0, i - 1))} disabled={i === 0} className="rounded-md border border-walnut-700 px-3 py-1.5 disabled:opacity-40">← Back</button>
              <button onClick={() => setI(Math.min(count - 1, i + 1))} disabled={i >= count - 1} className="rounded-md bg-walnut-700 px-3 py-1.5 text-paper disabled:opacity-40">Next →</button>
            </nav>
            <p className="text-xs text-walnut-500">Keys: ← → to move, Home/End, F for full screen, Esc to leave it.</p>
          </aside>
        </div>
      ) : (
        <p className="p-8 text-walnut-700">This walk-through has no steps yet.</p>
      )}
    </div>
  );
}
