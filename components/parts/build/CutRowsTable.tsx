"use client";

import type { CutRow, FixtureLetter } from "@/lib/engine/build";
import type { Formatters } from "../format";
import { LabelChip } from "./LabelChip";
import { useLabels } from "./label-context";

/** The merged, labelled cut list: one row per kind of piece, with where each goes (per fixture, expandable). */
export function CutRowsTable({ rows, fixtures, fmt }: { rows: readonly CutRow[]; fixtures: readonly FixtureLetter[]; fmt: Formatters }) {
  const { selected } = useLabels();
  const nameOf = new Map(fixtures.map((f) => [f.fixtureId, f.name]));
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm tabular-nums" data-testid="cut-rows">
        <thead>
          <tr className="border-b border-walnut-300 text-left">
            <th scope="col" className="px-2 py-1">Label</th>
            <th scope="col" className="px-2 py-1">Part</th>
            <th scope="col" className="px-2 py-1">Qty</th>
            <th scope="col" className="px-2 py-1">Size (L x W x T)</th>
            <th scope="col" className="px-2 py-1">Material</th>
            <th scope="col" className="px-2 py-1">Goes into</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.label} className={`border-b border-walnut-100 align-top ${selected === r.label ? "bg-steel-100" : ""}`} data-row={r.label}>
              <td className="px-2 py-1">
                <LabelChip label={r.label} />
              </td>
              <td className="px-2 py-1">
                {r.name}
                {r.layers > 1 && <span className="block text-xs text-walnut-700">glued up from {r.layers} layers: {r.pieces} pieces to saw</span>}
              </td>
              <td className="px-2 py-1 font-semibold">{r.qty}</td>
              <td className="px-2 py-1 whitespace-nowrap">
                {fmt.len(r.lengthMm)} x {fmt.len(r.widthMm)} x {fmt.len(r.thicknessMm)}
              </td>
              <td className="px-2 py-1">{r.materialName}</td>
              <td className="px-2 py-1">
                {r.fixtures.length === 1 ? (
                  `${r.fixtures[0].letter}: ${nameOf.get(r.fixtures[0].fixtureId) ?? r.fixtures[0].fixtureId}`
                ) : (
                  <details>
                    <summary className="cursor-pointer">{r.fixtures.map((f) => `${f.letter} ×${f.qty}`).join(", ")}</summary>
                    <ul className="text-xs">
                      {r.fixtures.map((f) => (
                        <li key={f.fixtureId}>
                          {f.letter}: {nameOf.get(f.fixtureId) ?? f.fixtureId} ×{f.qty}
                        </li>
                      ))}
                    </ul>
                  </details>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
