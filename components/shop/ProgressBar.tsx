/** A thick progress bar with its count in words (readable at arm's length). */
export function ProgressBar({ done, total, label }: { done: number; total: number; label: string }) {
  const pct = total > 0 ? Math.round((done / total) * 100) : 0;
  return (
    <div className="flex flex-col gap-1">
      <div className="flex justify-between text-base font-semibold text-walnut-900">
        <span>{label}</span>
        <span data-testid="progress-count">
          {done} of {total}
        </span>
      </div>
      <div role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={total} aria-valuenow={done} className="h-4 overflow-hidden rounded-full bg-walnut-100">
        <div className={`h-full ${done >= total && total > 0 ? "bg-pine-500" : "bg-amberline-500"}`} style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}
