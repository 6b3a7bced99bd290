/** Cautions first, in a band that cannot be missed. */
export function Cautions({ items, title = "Before you start" }: { items: readonly string[]; title?: string }) {
  if (items.length === 0) return null;
  return (
    <div className="rounded-lg border-2 border-amberline-500 bg-amberline-100 p-3 text-walnut-900" role="note" aria-label={title}>
      <p className="text-sm font-bold uppercase tracking-wide text-amberline-700">{title}</p>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-base">
        {items.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </div>
  );
}
