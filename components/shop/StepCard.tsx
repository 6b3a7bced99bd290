import type { BuildStep } from "@/lib/engine/build";
import { Cautions } from "./Cautions";

/** One build step: cautions first, then what to do, the parts by label, time notes with their source, and a large done button. */
export function StepCard({ step, done, onDone, setupTitle }: { step: BuildStep; done: boolean; onDone: () => void; setupTitle: (id: string) => string }) {
  return (
    <section aria-labelledby={`step-${step.id}`} className={`flex flex-col gap-3 rounded-xl border-2 bg-white p-4 ${done ? "border-pine-500" : "border-walnut-100"}`} data-testid="step-card">
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-walnut-500">Step {step.order}</p>
        <h2 id={`step-${step.id}`} className="text-2xl font-bold leading-tight text-walnut-900">
          {step.title}
        </h2>
      </header>
      <Cautions items={step.cautions} />
      <p className="text-lg text-walnut-900">{step.detail}</p>
      {step.parts.length > 0 && (
        <p className="text-base text-walnut-700">
          Parts:{" "}
          {step.parts.map((p) => (
            <span key={p.label} className="mr-1 inline-block rounded bg-walnut-100 px-1.5 font-semibold text-walnut-900">
              {p.label}
              {p.qty > 1 ? ` ×${p.qty}` : ""}
            </span>
          ))}
        </p>
      )}
      {step.setupIds.length > 0 && <p className="text-base text-walnut-700">Setups: {step.setupIds.map(setupTitle).join("; ")}</p>}
      {step.timeNotes.map((t) => (
        <p key={t.text} className="rounded-lg bg-steel-100 px-3 py-2 text-base text-steel-700">
          {t.text} <span className="text-sm">({t.source})</span>
        </p>
      ))}
      <button type="button" onClick={onDone} disabled={done} className="min-h-14 rounded-lg bg-pine-700 px-4 text-lg font-bold text-white disabled:bg-pine-100 disabled:text-pine-700">
        {done ? "Step done" : "Mark this step done"}
      </button>
    </section>
  );
}
