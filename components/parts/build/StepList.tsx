"use client";

import type { BuildStep, Setup } from "@/lib/engine/build";
import { LabelChip } from "./LabelChip";
import { useLabels } from "./label-context";

/** The build order: each step with its parts (labels), the setups it uses (links), time notes with sources and cautions. */
export function StepList({ steps, setups }: { steps: readonly BuildStep[]; setups: ReadonlyMap<string, Setup> }) {
  const { selected } = useLabels();
  return (
    <ol className="flex flex-col gap-2" data-testid="build-steps">
      {steps.map((s) => {
        const hit = selected !== null && s.parts.some((p) => p.label === selected);
        return (
          <li key={s.id} id={`step-${s.id}`} className={`break-inside-avoid rounded border p-2 ${hit ? "border-steel-700 bg-steel-100" : "border-walnut-100 bg-white"}`} data-step={s.id}>
            <h4 className="text-sm font-semibold text-walnut-900">
              <span className="mr-1 tabular-nums text-walnut-500">{s.order}.</span>
              {s.title}
            </h4>
            <p className="text-xs text-walnut-700">{s.detail}</p>
            {s.parts.length > 0 && (
              <ul className="mt-1 flex flex-wrap gap-1" aria-label="Parts in this step">
                {s.parts.map((p) => (
                  <li key={p.label}>
                    <LabelChip label={p.label} qty={p.qty} />
                  </li>
                ))}
              </ul>
            )}
            {s.setupIds.length > 0 && (
              <p className="mt-1 text-xs text-walnut-700">
                Setups:{" "}
                {s.setupIds.map((id, i) => (
                  <span key={id}>
                    {i > 0 && ", "}
                    <a href={`#setup-${id}`} className="underline">
                      {setups.get(id)?.order ?? "?"}. {setups.get(id)?.title ?? id}
                    </a>
                  </span>
                ))}
              </p>
            )}
            {s.timeNotes.map((t) => (
              <p key={t.text} className="mt-1 text-xs text-walnut-900">
                <span aria-hidden="true">⏱ </span>
                {t.text} <span className="text-walnut-500">({t.source})</span>
              </p>
            ))}
            {s.cautions.length > 0 && (
              <ul className="mt-1 list-disc pl-4 text-xs text-amberline-700">
                {s.cautions.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            )}
          </li>
        );
      })}
    </ol>
  );
}
