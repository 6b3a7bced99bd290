"use client";

import type { NestingState } from "@/lib/client/useNesting";
import type { Formatters } from "./format";
import { LabelsOn } from "./build/LabelChip";
import { CutList, SheetMap } from "./SheetMap";

/** Sheet maps for every sheet material, with the search's progress and a cancel button. */
export function SheetMapsPanel({ nesting, kerfMm, fmt }: { nesting: NestingState; kerfMm: number; fmt: Formatters }) {
  const { result, progress, running, cancelled, error } = nesting;
  return (
    <div className="flex flex-col gap-6">
      <div className="no-print flex flex-wrap items-center gap-3 text-sm" aria-live="polite">
        {running ? (
          <>
            <progress max={1} value={progress?.fraction ?? 0} className="w-48" aria-label="Nesting progress" />
            <span>
              Laying out sheets{progress ? `: ${progress.materialId}, best ${progress.bestSheets} (fewest possible ${progress.lowerBound}), ${progress.attempts} layouts tried` : "..."}
            </span>
            <button type="button" onClick={nesting.cancel} className="rounded-md border border-brick-500 px-3 py-1 text-brick-700">
              Cancel
            </button>
          </>
        ) : cancelled ? (
          <>
            <span>Stopped. {result ? "Showing the last finished layout." : ""}</span>
            <button type="button" onClick={nesting.rerun} className="rounded-md border border-walnut-300 px-3 py-1">
              Run again
            </button>
          </>
        ) : result ? (
          <span className="text-walnut-500">Laid out in {Math.round(result.elapsedMs)} ms.</span>
        ) : null}
        {error && <span className="text-brick-700">The layout failed: {error}</span>}
      </div>
      {result?.materials.length === 0 && <p className="text-sm text-walnut-500">No sheet-good parts in this plan.</p>}
      {result?.materials.map((m) => (
        <section key={`${m.materialId}-${m.thicknessMm}`} className="flex flex-col gap-4" data-testid="sheet-material">
          <header>
            <h3 className="font-semibold text-walnut-900">
              {m.materialName} · {fmt.len(m.thicknessMm)}
            </h3>
            <p className="text-sm text-walnut-700">
              {m.sheetsUsed} sheet{m.sheetsUsed === 1 ? "" : "s"} of {fmt.size(m.sheetLengthMm, m.sheetWidthMm)}
              {m.offcutsUsed > 0 && ` and ${m.offcutsUsed} of your offcuts`} · fewest possible {m.lowerBound} · yield {m.yieldPct.toFixed(1)}% · waste {fmt.area(m.wasteMm2)}
            </p>
          </header>
          {m.unplaced.length > 0 && (
            <div role="alert" className="rounded border border-brick-500 bg-brick-100 p-3 text-sm text-brick-700">
              {m.unplaced.map((u) => (
                <span key={u.partId} className="block">
                  {u.qty} x {u.name}: {u.reason}
                </span>
              ))}
            </div>
          )}
          {m.sheets.map((s) => (
            <div key={s.index} className="break-inside-avoid">
              <SheetMap sheet={s} kerfMm={kerfMm} fmt={fmt} title={`${m.materialName}, sheet ${s.index} of ${m.sheets.length}`} />
              <LabelsOn partIds={s.placements.map((p) => p.partId)} what="sheet" />
              <CutList sheet={s} fmt={fmt} />
            </div>
          ))}
        </section>
      ))}
      <p className="text-xs text-walnut-500">
        Cuts run edge to edge: rip the sheet into strips first, then crosscut each strip. Kerf {fmt.len(kerfMm)}; factory edges trimmed. Grain arrows run along the sheet&apos;s length. Green hatching marks offcuts worth keeping.
        Saw safely: use the blade guard and riving knife, a push stick, and support long or wide panels (see the checks).
      </p>
    </div>
  );
}
