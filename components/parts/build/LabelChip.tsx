"use client";

import { useLabels } from "./label-context";

/** A part label as a button: click to see that part everywhere (pressed while it is the one shown). */
export function LabelChip({ label, qty, note }: { label: string; qty?: number; note?: string }) {
  const { selected, select } = useLabels();
  const on = selected === label;
  return (
    <button
      type="button"
      onClick={() => select(on ? null : label)}
      aria-pressed={on}
      title={note}
      data-label={label}
      className={`inline-flex items-baseline gap-1 rounded border px-1.5 py-0.5 font-mono text-xs font-semibold tabular-nums ${on ? "border-steel-700 bg-steel-700 text-white" : "border-walnut-300 bg-white text-walnut-900 hover:border-walnut-700"}`}
    >
      {label}
      {qty !== undefined && <span className="font-normal">×{qty}</span>}
    </button>
  );
}

/** Chips for every label on a sheet or board, counted: "On this sheet: A3 ×2, B5 ×1". */
export function LabelsOn({ partIds, what }: { partIds: readonly string[]; what: string }) {
  const { labelOf } = useLabels();
  const counts = new Map<string, number>();
  for (const id of partIds) {
    const l = labelOf[id];
    if (l) counts.set(l, (counts.get(l) ?? 0) + 1);
  }
  if (counts.size === 0) return null;
  return (
    <p className="mt-1 flex flex-wrap items-center gap-1 text-xs text-walnut-700">
      <span>On this {what}:</span>
      {[...counts.entries()].map(([l, n]) => (
        <LabelChip key={l} label={l} qty={n} />
      ))}
    </p>
  );
}
