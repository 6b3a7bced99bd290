"use client";

import type { BuildStopTable } from "@/lib/engine/build";
import type { Formatters } from "../format";
import { LabelChip } from "./LabelChip";

/** One stop track's stop table: each cut length, where the stop face goes, what the tape reads, rows out of reach flagged. */
export function StopTableView({ table, fmt, compact = false }: { table: BuildStopTable; fmt: Formatters; compact?: boolean }) {
  const id = `stop-table-${table.fixtureId}`;
  return (
    <section aria-labelledby={id} className="break-inside-avoid" data-testid="stop-table">
      <h4 id={id} className="font-semibold text-walnut-900">
        {table.letter}: {table.name} (stop table)
      </h4>
      <p className="text-xs text-walnut-700">
        Track to the {table.side} of the blade · kerf {fmt.len(table.kerfMm)} {table.kerfSide === "toward" ? "toward the track (stops sit one kerf further out)" : "away from the track"} · stick the tape on so it reads{" "}
        <b>{fmt.len(table.tapeOffsetMm)}</b> at the track&apos;s near end, then it reads the cut length at the stop face · sets cuts from {fmt.len(table.minCutMm)} to {fmt.len(table.maxCutMm)}
      </p>
      {table.notes.map((n) => (
        <p key={n} className="mt-1 rounded border border-amberline-500 bg-amberline-100 px-2 py-1 text-xs text-walnut-900">
          {n}
        </p>
      ))}
      {table.rows.length > 0 && (
        <table className="mt-1 w-full border-collapse text-sm tabular-nums">
          <thead>
            <tr className="border-b border-walnut-300 text-left">
              <th scope="col" className="px-2 py-1">Cut length</th>
              {!compact && <th scope="col" className="px-2 py-1">Stop face from the blade</th>}
              <th scope="col" className="px-2 py-1">From the track&apos;s end</th>
              {!compact && <th scope="col" className="px-2 py-1">Tape reads</th>}
              <th scope="col" className="px-2 py-1">Parts</th>
            </tr>
          </thead>
          <tbody>
            {table.rows.map((r, i) => (
              <tr key={`${r.source}-${i}`} className={`border-b border-walnut-100 ${r.inReach ? "" : "bg-brick-100"}`} data-in-reach={r.inReach}>
                <td className="px-2 py-1 font-semibold">{fmt.len(r.cutLengthMm)}</td>
                {!compact && <td className="px-2 py-1">{fmt.len(r.fromBladeMm)}</td>}
                <td className="px-2 py-1">{r.inReach ? fmt.len(r.fromTrackStartMm) : <span className="font-semibold text-brick-700">out of reach</span>}</td>
                {!compact && <td className="px-2 py-1">{r.inReach ? fmt.len(r.tapeReadingMm) : "-"}</td>}
                <td className="px-2 py-1">
                  {r.source === "plan" ? (
                    <span className="flex flex-wrap gap-1">
                      {r.labels.map((l) => (
                        <LabelChip key={l} label={l} />
                      ))}
                      <span className="text-xs text-walnut-700">{r.qty} {r.qty === 1 ? "piece" : "pieces"}</span>
                    </span>
                  ) : (
                    <span className="text-xs text-walnut-500">typed on the track</span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
