"use client";
import Link from "next/link";
import { useDeferredValue, useState } from "react";
import type { Finding } from "@/lib/engine/checks/types";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useUi } from "@/lib/client/react/useEditorState";

const badge: Record<string, { text: string; cls: string; mark: string }> = {
  conflict: { text: "Conflict", cls: "border-brick-500 bg-brick-100 text-brick-700", mark: "✕" },
  caution: { text: "Caution", cls: "border-amberline-500 bg-amberline-100 text-amberline-700", mark: "!" },
  advice: { text: "Advice", cls: "border-steel-500 bg-steel-100 text-steel-700", mark: "i" },
  pass: { text: "Pass", cls: "border-pine-500 bg-pine-100 text-pine-700", mark: "✓" },
};

function FindingItem({ f }: { f: Finding }) {
  const ed = useEditor();
  const b = f.pass ? badge.pass : badge[f.severity];
  return (
    <li className={`rounded border-l-4 bg-white p-2 text-xs ${b.cls.split(" ")[0]}`} data-testid="finding" data-rule={f.ruleId} data-pass={f.pass}>
      <div className="flex items-start gap-2">
        <span className={`shrink-0 rounded border px-1 font-semibold ${b.cls}`}>
          <span aria-hidden="true">{b.mark} </span>
          {b.text}
        </span>
        <p className="text-walnut-900">{f.message}</p>
      </div>
      <div className="mt-1 flex gap-3 pl-1">
        {f.fixtureIds.length ? (
          <button
            type="button"
            className="text-walnut-700 underline focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
            onClick={() => {
              ed.select(f.fixtureIds);
              ed.frame(f.fixtureIds);
            }}
          >
            Show in view
          </button>
        ) : null}
        <Link href={`/rules/${f.ruleId}`} className="text-walnut-700 underline" target="_blank">
          Why this rule
        </Link>
      </div>
    </li>
  );
}

/** Every check's findings with their numbers: failing first; clicking one selects and frames its fixtures. */
export function FindingsList() {
  const live = useDerived((s) => s.findings);
  // Drags re-check on every step; the list may lag a frame behind rather than slow the drag.
  const findings = useDeferredValue(live);
  const [showPasses, setShowPasses] = useState(true);
  const presetName = useUi((s) => s.presetName);
  const failing = findings.filter((f) => !f.pass);
  const passing = findings.filter((f) => f.pass);
  const conflicts = failing.filter((f) => f.severity === "conflict").length;
  return (
    <section aria-labelledby="findings-h" className="flex flex-col gap-2">
      <h2 id="findings-h" className="text-sm font-semibold text-walnut-900">
        Checks
      </h2>
      <p className="text-xs text-walnut-700" role="status" data-testid="findings-summary">
        {conflicts} conflict{conflicts === 1 ? "" : "s"}, {failing.length - conflicts} other to look at, {passing.length} passing.
      </p>
      {presetName ? (
        <p className="text-xs text-walnut-700" data-testid="findings-preset">
          Numbers set by the class preset “{presetName}” replace the standard ones (Room tab, plan settings).
        </p>
      ) : null}
      <ul className="flex flex-col gap-1">
        {failing.map((f, i) => (
          <FindingItem key={`${f.ruleId}-${i}-${f.fixtureIds.join(",")}`} f={f} />
        ))}
      </ul>
      <label className="flex items-center gap-2 text-xs">
        <input type="checkbox" checked={showPasses} onChange={(e) => setShowPasses(e.target.checked)} className="accent-walnut-700" />
        Show passing checks
      </label>
      {showPasses ? (
        <ul className="flex flex-col gap-1">
          {passing.slice(0, 200).map((f, i) => (
            <FindingItem key={`${f.ruleId}-p${i}-${f.fixtureIds.join(",")}`} f={f} />
          ))}
        </ul>
      ) : null}
    </section>
  );
}

/** The findings that name one fixture (shown under its properties). */
export function FixtureFindings({ id }: { id: string }) {
  const findings = useDerived((s) => s.findings);
  const mine = findings.filter((f) => f.fixtureIds.includes(id));
  if (!mine.length) return null;
  return (
    <section aria-label="Checks on this fixture">
      <h3 className="text-xs font-semibold text-walnut-900">Checks on this fixture</h3>
      <ul className="mt-1 flex flex-col gap-1">
        {mine.map((f, i) => (
          <FindingItem key={`${f.ruleId}-${i}`} f={f} />
        ))}
      </ul>
    </section>
  );
}
