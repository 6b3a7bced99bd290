"use client";

import { useState } from "react";
import type { PriceItem } from "@/lib/engine/shopping/price-schema";

interface Props {
  items: PriceItem[];
  /** Called with the saved list (or the examples after a reset). */
  onSaved: (items: PriceItem[], mine: boolean) => void;
}

type Row = PriceItem & { dollars: string };

const toRows = (items: PriceItem[]): Row[] => items.map((i) => ({ ...i, dollars: (i.priceCents / 100).toFixed(2) }));

/** Edit my price list: what each item costs and what one purchase unit covers. Saved to my account. */
export function PriceListEditor({ items, onSaved }: Props) {
  const [rows, setRows] = useState<Row[]>(() => toRows(items));
  const [status, setStatus] = useState<string | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});

  const set = (i: number, patch: Partial<Row>) => setRows((rs) => rs.map((r, k) => (k === i ? { ...r, ...patch } : r)));

  async function save() {
    setStatus("Saving...");
    setErrors({});
    const body = {
      currency: "USD",
      items: rows.map((r) => {
        const cents = Math.round(Number(r.dollars) * 100);
        const changed = cents !== r.priceCents || !r.example;
        return { key: r.key, name: r.name, unit: r.unit, packSize: Number(r.packSize), priceCents: Number.isFinite(cents) ? cents : -1, example: r.example && !changed };
      }),
    };
    const res = await fetch("/api/v1/prices", { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    const json = (await res.json().catch(() => null)) as { prices?: { items: PriceItem[] }; error?: { message: string; fields?: Record<string, string> } } | null;
    if (res.ok && json?.prices) {
      setRows(toRows(json.prices.items));
      onSaved(json.prices.items, true);
      setStatus("Saved.");
    } else {
      setErrors(json?.error?.fields ?? {});
      setStatus(res.status === 401 ? "Sign in to keep your own prices." : (json?.error?.message ?? "Could not save."));
    }
  }

  async function reset() {
    const res = await fetch("/api/v1/prices", { method: "DELETE" });
    const json = (await res.json().catch(() => null)) as { prices?: { items: PriceItem[] } } | null;
    if (res.ok && json?.prices) {
      setRows(toRows(json.prices.items));
      onSaved(json.prices.items, false);
      setStatus("Back to the example prices.");
    } else setStatus(res.status === 401 ? "Sign in to keep your own prices." : "Could not reset.");
  }

  return (
    <details className="no-print rounded border border-walnut-100 bg-white/60 p-3 text-sm">
      <summary className="cursor-pointer font-semibold text-walnut-900">My price list</summary>
      <p className="mt-2 text-xs text-walnut-500">
        A key is a material id (ply-18) or a hardware key; a key ending in * covers every key that starts with it (slide-* for all slide lengths). &quot;Covers&quot; is how much of the need one unit buys: screws per box, mm per roll, m² per sheet.
      </p>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full border-collapse">
          <thead>
            <tr className="text-left text-walnut-700">
              <th className="px-1">Key</th>
              <th className="px-1">Item</th>
              <th className="px-1">Unit</th>
              <th className="px-1">Covers</th>
              <th className="px-1">Price, USD</th>
              <th className="px-1" />
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i}>
                {(["key", "name", "unit", "packSize", "dollars"] as const).map((f) => {
                  const field = f === "dollars" ? "priceCents" : f;
                  const err = errors[`items.${i}.${field}`];
                  return (
                    <td key={f} className="px-1 py-0.5">
                      <input
                        aria-label={`${f} of row ${i + 1}`}
                        aria-invalid={err ? true : undefined}
                        title={err}
                        value={String(r[f])}
                        inputMode={f === "packSize" || f === "dollars" ? "decimal" : undefined}
                        onChange={(e) => set(i, f === "packSize" ? { packSize: Number(e.target.value) } : ({ [f]: e.target.value } as Partial<Row>))}
                        className={`w-full rounded border px-1 ${err ? "border-brick-500" : "border-walnut-100"}`}
                      />
                    </td>
                  );
                })}
                <td className="px-1">
                  {r.example && <span className="text-xs text-amberline-700">example</span>}
                  <button type="button" aria-label={`Remove row ${i + 1}`} onClick={() => setRows((rs) => rs.filter((_, k) => k !== i))} className="ml-1 text-brick-700">
                    ×
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <button type="button" onClick={() => setRows((rs) => [...rs, { key: "", name: "", unit: "each", packSize: 1, priceCents: 0, example: false, dollars: "0.00" }])} className="rounded-md border border-walnut-300 px-3 py-1">
          Add a price
        </button>
        <button type="button" onClick={save} className="rounded-md bg-walnut-700 px-3 py-1 text-paper">
          Save my prices
        </button>
        <button type="button" onClick={reset} className="rounded-md border border-walnut-300 px-3 py-1">
          Use the examples
        </button>
        {status && (
          <span role="status" className="text-walnut-700">
            {status}
          </span>
        )}
      </div>
    </details>
  );
}
