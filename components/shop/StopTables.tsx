import type { BuildStopTable } from "@/lib/engine/build";

/** Each stop track's table: cut length, where the stop goes from the blade, what the tape reads, the parts; rows out of reach flagged. */
export function StopTables({ tables, fmt }: { tables: readonly BuildStopTable[]; fmt: (mm: number) => string }) {
  if (tables.length === 0) return <p className="text-lg text-walnut-700">The plan has no stop track. Add one beside the saw station to get a stop table here.</p>;
  return (
    <div className="flex flex-col gap-4">
      {tables.map((t) => (
        <section key={t.fixtureId} aria-labelledby={`track-${t.fixtureId}`} className="rounded-xl border-2 border-walnut-100 bg-white p-4">
          <h2 id={`track-${t.fixtureId}`} className="text-2xl font-bold text-walnut-900">
            {t.letter} · {t.name}
          </h2>
          <p className="text-base text-walnut-700">
            Track on the {t.side} of the blade (as you face the saw) · kerf {fmt(t.kerfMm)}, {t.kerfSide === "away" ? "falls away from the track" : "falls toward the track"} · tape offset {fmt(t.tapeOffsetMm)} · reach {fmt(t.minCutMm)} to {fmt(t.maxCutMm)}
          </p>
          {t.notes.map((n) => (
            <p key={n} className="mt-1 text-base font-semibold text-amberline-700">
              {n}
            </p>
          ))}
          <table className="mt-3 w-full text-left text-lg" data-testid="stop-table">
            <thead className="text-sm uppercase tracking-wide text-walnut-500">
              <tr>
                <th scope="col" className="py-1">Cut length</th>
                <th scope="col">Tape reads</th>
                <th scope="col">Parts</th>
              </tr>
            </thead>
            <tbody>
              {t.rows.map((r) => (
                <tr key={`${r.cutLengthMm}-${r.source}`} className={`border-t border-walnut-100 ${r.inReach ? "" : "text-brick-700"}`}>
                  <td className="py-2 font-bold">{fmt(r.cutLengthMm)}</td>
                  <td>{r.inReach ? fmt(r.tapeReadingMm) : "out of reach"}</td>
                  <td className="text-base">
                    {r.labels.join(", ") || (r.source === "typed" ? "typed length" : "")}
                    {r.qty > 0 ? ` ×${r.qty}` : ""}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  );
}
