"use client";

import type { Setup } from "@/lib/engine/build";
import { STATION_INFO } from "@/lib/engine/build";
import { LabelChip } from "./LabelChip";
import { useLabels } from "./label-context";

const KIND_NAME: Record<Setup["kind"], string> = { rip: "Rip", crosscut: "Crosscut", dado: "Dado", rabbet: "Rabbet", groove: "Groove", "pocket-screw": "Pocket screws" };

/** One machine setup: the setting, every piece cut at it with quantities, tools, test cut, kerf side and cautions. */
export function SetupCard({ setup, materialName }: { setup: Setup; materialName: (id: string) => string }) {
  const { selected } = useLabels();
  const hit = selected !== null && setup.items.some((i) => i.label === selected);
  const mats = [...new Set(setup.items.map((i) => i.materialId))];
  return (
    <article id={`setup-${setup.id}`} aria-labelledby={`setup-${setup.id}-title`} className={`break-inside-avoid rounded border p-2 ${hit ? "border-steel-700 bg-steel-100" : "border-walnut-100 bg-white"}`} data-testid="setup" data-setup={setup.id}>
      <h4 id={`setup-${setup.id}-title`} className="text-sm font-semibold text-walnut-900">
        <span className="mr-1 text-walnut-500 tabular-nums">{setup.order}.</span>
        {setup.title}
        <span className="ml-2 text-xs font-normal text-walnut-700">
          {KIND_NAME[setup.kind]} · {STATION_INFO[setup.station].name} · {setup.totalQty} {setup.totalQty === 1 ? "piece" : "pieces"}
        </span>
      </h4>
      <ul className="mt-1 flex flex-wrap gap-1" aria-label="Pieces at this setting">
        {setup.items.map((i) => (
          <li key={i.label}>
            <LabelChip label={i.label} qty={i.qty} note={i.where} />
          </li>
        ))}
      </ul>
      {mats.length > 1 && <p className="mt-1 text-xs text-walnut-700">Stock: {mats.map(materialName).join(", ")}</p>}
      {setup.items.some((i) => i.where) && (
        <p className="mt-1 text-xs text-walnut-700">
          Where: {[...new Set(setup.items.map((i) => i.where).filter(Boolean))].join("; ")}
        </p>
      )}
      {setup.kerfSide && <p className="mt-1 text-xs text-walnut-700">{setup.kerfSide}</p>}
      <p className="mt-1 text-xs text-walnut-900">Test first: {setup.testCut}</p>
      <details className="mt-1 text-xs text-walnut-700">
        <summary className="cursor-pointer">Tools and cautions</summary>
        <p className="mt-1">Tools: {setup.tools.join(", ")}.</p>
        <ul className="mt-1 list-disc pl-4">
          {setup.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </details>
    </article>
  );
}
