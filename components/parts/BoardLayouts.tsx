import { nominalWidthName } from "@/lib/engine/boards/stock";
import type { BoardPlan } from "@/lib/engine/boards/types";
import { LabelsOn } from "./build/LabelChip";
import { useLabels } from "./build/label-context";
import type { Formatters } from "./format";

/** The board plan: each board drawn to scale with its pieces in cutting order and what is left. */
export function BoardLayouts({ plan, fmt }: { plan: BoardPlan; fmt: Formatters }) {
  const { labelOf, selected } = useLabels();
  if (plan.groups.length === 0 && plan.unplaced.length === 0) return <p className="text-sm text-walnut-500">No solid-wood parts in this plan.</p>;
  return (
    <div className="flex flex-col gap-6">
      {plan.groups.map((g) => {
        const longest = Math.max(...g.boards.map((b) => b.lengthMm));
        const width = nominalWidthName(g.stockWidthMm, g.thicknessMm) ?? fmt.len(g.stockWidthMm);
        return (
          <section key={`${g.materialId}-${g.thicknessMm}-${g.stockWidthMm}`} className="break-inside-avoid" data-testid="board-group">
            <h3 className="font-semibold text-walnut-900">
              {g.materialName}, {width} ({fmt.len(g.stockWidthMm)} wide, {fmt.len(g.thicknessMm)} thick)
            </h3>
            <p className="text-sm text-walnut-700">
              {g.boards.length} boards, {fmt.len(g.totalLengthMm)} in all · fewest possible {g.lowerBound} · yield {g.yieldPct.toFixed(0)}%
            </p>
            <LabelsOn partIds={g.boards.flatMap((b) => b.cuts.map((c) => c.partId))} what="stock" />
            <ul className="mt-2 flex flex-col gap-2">
              {g.boards.map((b) => (
                <li key={b.index} className="break-inside-avoid">
                  <div className="text-xs text-walnut-700">
                    Board {b.index}: {fmt.len(b.lengthMm)}
                    {b.leftoverMm > 0 && ` · left over ${fmt.len(b.leftoverMm)}`}
                  </div>
                  <svg viewBox={`0 0 ${longest} 120`} className="h-10 w-full max-w-4xl" role="img" aria-label={`Board ${b.index}: ${b.cuts.map((c) => c.name).join(", ")}`}>
                    <rect x={0} y={10} width={b.lengthMm} height={100} fill={`url(#bh-${g.materialId}-${g.stockWidthMm.toFixed(0)}-${b.index})`} stroke="#2a1c12" strokeWidth={3} />
                    <defs>
                      <pattern id={`bh-${g.materialId}-${g.stockWidthMm.toFixed(0)}-${b.index}`} width={30} height={30} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                        <line x1={0} y1={0} x2={0} y2={30} stroke="#b89c80" strokeWidth={4} />
                      </pattern>
                    </defs>
                    {b.cuts.map((c) => {
                      const label = labelOf[c.partId];
                      const hit = label !== undefined && label === selected;
                      return (
                        <g key={c.pieceKey} data-label={label}>
                          <rect x={c.offsetMm} y={10} width={c.lengthMm} height={100} fill={hit ? "#e5e9ee" : "#fdf0cf"} stroke={hit ? "#36414e" : "#4b3423"} strokeWidth={hit ? 10 : 3} />
                          <title>{`${label ? `${label} ` : ""}${c.name}: ${fmt.len(c.lengthMm)} x ${fmt.len(c.widthMm)}`}</title>
                          {c.lengthMm > 500 ? (
                            <text x={c.offsetMm + c.lengthMm / 2} y={70} fontSize={48} textAnchor="middle" fill="#2a1c12">
                              {label && <tspan fontWeight="bold">{label} </tspan>}
                              {c.name} {fmt.len(c.lengthMm)}
                            </text>
                          ) : (
                            label &&
                            c.lengthMm > 40 * label.length && (
                              <text x={c.offsetMm + c.lengthMm / 2} y={70} fontSize={48} fontWeight="bold" textAnchor="middle" fill="#2a1c12">
                                {label}
                              </text>
                            )
                          )}
                        </g>
                      );
                    })}
                  </svg>
                </li>
              ))}
            </ul>
          </section>
        );
      })}
      {plan.unplaced.length > 0 && (
        <div role="alert" className="rounded border border-brick-500 bg-brick-100 p-3 text-sm text-brick-700">
          Not planned:{" "}
          {plan.unplaced.map((u) => (
            <span key={u.partId} className="block">
              {u.qty} x {u.name}: {u.reason}
            </span>
          ))}
        </div>
      )}
    </div>
  );
}
