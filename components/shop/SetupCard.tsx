import type { CutRow, Setup } from "@/lib/engine/build";
import type { SetupProgress } from "@/lib/engine/shop/progress";
import { Cautions } from "./Cautions";
import { ProgressBar } from "./ProgressBar";

interface Props {
  setup: Setup;
  progress: SetupProgress;
  rows: ReadonlyMap<string, CutRow>;
  fmt: (mm: number) => string;
  onCut: (item: string) => void;
  next?: boolean;
}

/** One machine setup: what to set, its cautions first, then every piece cut at it with a large check-off button each. */
export function SetupCard({ setup, progress, rows, fmt, onCut, next }: Props) {
  const done = progress.done >= progress.total;
  return (
    <section aria-labelledby={`setup-${setup.id}`} className={`flex flex-col gap-3 rounded-xl border-2 bg-white p-4 ${next ? "border-walnut-700" : "border-walnut-100"}`} data-testid="setup-card" data-setup={setup.id}>
      <header>
        <p className="text-sm font-semibold uppercase tracking-wide text-walnut-500">
          {next ? "Next setup · " : ""}Setup {setup.order}
        </p>
        <h2 id={`setup-${setup.id}`} className="text-2xl font-bold leading-tight text-walnut-900">
          {setup.title}
        </h2>
        {setup.kerfSide && <p className="mt-1 text-base text-walnut-700">Kerf: {setup.kerfSide}</p>}
      </header>
      <Cautions items={setup.cautions} />
      {setup.testCut && (
        <p className="rounded-lg bg-steel-100 px-3 py-2 text-base text-steel-700">
          <span className="font-semibold">Test cut first:</span> {setup.testCut}
        </p>
      )}
      {setup.tools.length > 0 && <p className="text-base text-walnut-700">Tools: {setup.tools.join(", ")}</p>}
      <ProgressBar done={progress.done} total={progress.total} label={done ? "All pieces cut" : "Pieces cut"} />
      <ul className="flex flex-col gap-2">
        {progress.items.map((it) => {
          const row = rows.get(it.label);
          const where = setup.items.find((i) => i.label === it.label)?.where;
          const full = it.done >= it.total;
          return (
            <li key={it.item} className="flex items-center gap-3 rounded-lg border border-walnut-100 p-2" data-testid="setup-piece" data-label={it.label}>
              <span className="min-w-14 rounded-md bg-walnut-700 px-2 py-1 text-center text-xl font-bold text-paper">{it.label}</span>
              <div className="min-w-0 flex-1">
                <p className="truncate text-lg font-semibold text-walnut-900">{row?.name ?? it.label}</p>
                <p className="text-base text-walnut-700">
                  {row ? `${fmt(row.lengthMm)} × ${fmt(row.widthMm)} × ${fmt(row.thicknessMm)} · ${row.materialName}` : ""}
                  {where ? ` · ${where}` : ""}
                </p>
              </div>
              <button
                type="button"
                disabled={full}
                onClick={() => onCut(it.item)}
                className="min-h-14 min-w-24 rounded-lg bg-pine-700 px-3 text-lg font-bold text-white disabled:bg-pine-100 disabled:text-pine-700"
              >
                <span className="sr-only">{it.label}: </span>
                {full ? "Done" : "Cut +1"}
                <span className="block text-sm font-semibold">
                  {it.done} of {it.total}
                </span>
              </button>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
