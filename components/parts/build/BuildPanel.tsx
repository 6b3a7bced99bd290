"use client";

import { useMemo } from "react";
import type { BuildResult, Setup, SetupKind } from "@/lib/engine/build";
import type { Formatters } from "../format";
import { CutRowsTable } from "./CutRowsTable";
import { LabelChip } from "./LabelChip";
import { useLabels } from "./label-context";
import { SetupCard } from "./SetupCard";
import { StepList } from "./StepList";
import { StopTableView } from "./StopTableView";

const GROUPS: { title: string; kinds: SetupKind[]; why: string }[] = [
  { title: "Rips", kinds: ["rip"], why: "Widest first: each narrower rip then comes from a piece still wide enough to ride the fence safely." },
  { title: "Crosscuts", kinds: ["crosscut"], why: "By station, longest first: long offcuts can still feed the short parts." },
  { title: "Joinery", kinds: ["dado", "rabbet", "groove", "pocket-screw"], why: "After every piece is to size, so each joint is cut from the same reference edge." },
];

/** Setups, stop tables, build steps and the labelled cut list of a plan; labels cross-link with the other tabs. */
export function BuildPanel({ build, fmt }: { build: BuildResult; fmt: Formatters }) {
  const { selected, select } = useLabels();
  const setups = useMemo(() => new Map(build.setups.map((s) => [s.id, s])), [build.setups]);
  const row = selected ? build.rows.find((r) => r.label === selected) : undefined;
  const materialName = (id: string) => build.rows.find((r) => r.materialId === id)?.materialName ?? id;
  if (build.rows.length === 0) {
    return (
      <div className="text-sm text-walnut-700">
        {build.notes.map((n) => (
          <p key={n}>{n}</p>
        ))}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-6" data-testid="build-panel">
      {row && (
        <div className="sticky top-0 z-10 rounded border border-steel-700 bg-steel-100 p-2 text-sm text-walnut-900" role="status" data-testid="label-focus">
          <b>
            {row.label} {row.name}
          </b>{" "}
          ×{row.qty} · {fmt.len(row.lengthMm)} x {fmt.len(row.widthMm)} x {fmt.len(row.thicknessMm)} · {row.materialName} · goes into {row.fixtures.map((f) => `${f.letter} ×${f.qty}`).join(", ")}
          <span className="block text-xs">
            Setups:{" "}
            {row.setupIds.map((id, i) => (
              <span key={id}>
                {i > 0 && ", "}
                <a className="underline" href={`#setup-${id}`}>
                  {setups.get(id)?.order}. {setups.get(id)?.title}
                </a>
              </span>
            ))}
            {" · "}Steps: {build.steps.filter((s) => s.parts.some((p) => p.label === row.label)).map((s) => s.order).join(", ")}
            {" · "}Highlighted on the parts list, sheet maps and boards too.{" "}
            <button type="button" className="underline" onClick={() => select(null)}>
              Clear
            </button>
          </span>
        </div>
      )}
      {build.notes.length > 0 && (
        <ul className="rounded border border-amberline-500 bg-amberline-100 p-2 text-sm text-walnut-900">
          {build.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
      <section aria-labelledby="build-setups">
        <h3 id="build-setups" className="text-base font-semibold text-walnut-900">
          Setups: set each machine once, cut every piece that needs it
        </h3>
        <p className="text-xs text-walnut-700">
          {build.setups.length} setups in run order. Make a test cut on scrap at each and measure it before the real pieces (practice). Pencil each piece&apos;s label on it as it comes off the saw. The saw maker&apos;s manual governs guarding and setup.
        </p>
        {GROUPS.map((g) => {
          const list: Setup[] = build.setups.filter((s) => g.kinds.includes(s.kind));
          if (!list.length) return null;
          return (
            <div key={g.title} className="mt-3">
              <h4 className="text-sm font-semibold text-walnut-900">
                {g.title} ({list.length})
              </h4>
              <p className="mb-1 text-xs text-walnut-500">{g.why}</p>
              <div className="grid gap-2 lg:grid-cols-2">
                {list.map((s) => (
                  <SetupCard key={s.id} setup={s} materialName={materialName} />
                ))}
              </div>
            </div>
          );
        })}
      </section>
      {build.stopTables.length > 0 && (
        <section aria-labelledby="build-stops" className="flex flex-col gap-3">
          <h3 id="build-stops" className="text-base font-semibold text-walnut-900">
            Stop tables
          </h3>
          {build.stopTables.map((t) => (
            <StopTableView key={t.fixtureId} table={t} fmt={fmt} />
          ))}
        </section>
      )}
      <section aria-labelledby="build-steps">
        <h3 id="build-steps" className="text-base font-semibold text-walnut-900">
          Build order
        </h3>
        <StepList steps={build.steps} setups={setups} />
      </section>
      <section aria-labelledby="build-rows">
        <h3 id="build-rows" className="text-base font-semibold text-walnut-900">
          Cut list by label
        </h3>
        <p className="text-xs text-walnut-700">
          Identical pieces share one label; the letter is the first fixture that uses them ({build.fixtures.slice(0, 6).map((f) => `${f.letter} ${f.name}`).join(", ")}
          {build.fixtures.length > 6 ? ", ..." : ""}).
        </p>
        <CutRowsTable rows={build.rows} fixtures={build.fixtures} fmt={fmt} />
      </section>
      <p className="sr-only" aria-live="polite">
        {row ? `Showing ${row.label}` : ""}
      </p>
      {selected && !row && <LabelChip label={selected} />}
    </div>
  );
}
