"use client";

import { shoppingCsv } from "@/lib/engine/shopping/csv";
import type { ShoppingList } from "@/lib/engine/shopping/types";
import { money } from "./format";

/** Offer text as a file download. */
export function downloadText(name: string, text: string, type = "text/csv;charset=utf-8") {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

const fmtQty = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(n < 10 ? 2 : 0));

/** The shopping list with quantities, prices and totals; the waste allowance is editable. */
export function ShoppingPanel({ list, allowancePct, onAllowance, pricesAreMine }: { list: ShoppingList; allowancePct: number; onAllowance: (pct: number) => void; pricesAreMine: boolean }) {
  return (
    <div className="flex flex-col gap-3">
      <div className="no-print flex flex-wrap items-end gap-4 text-sm">
        <label className="flex flex-col gap-1">
          <span className="text-walnut-700">Waste allowance, %</span>
          <input type="number" min={0} max={100} step={1} value={allowancePct} onChange={(e) => onAllowance(Math.max(0, Math.min(100, Number(e.target.value) || 0)))} className="w-24 rounded border border-walnut-300 bg-white px-2 py-1" />
        </label>
        <button type="button" onClick={() => downloadText("shopping-list.csv", shoppingCsv(list))} className="rounded-md border border-walnut-300 px-3 py-1">
          Download CSV
        </button>
      </div>
      {list.usesExamplePrices && (
        <p className="rounded border border-amberline-500 bg-amberline-100 p-2 text-sm text-amberline-700">
          {pricesAreMine ? "Some prices" : "Prices"} are examples made up for the demo, in US dollars. Enter what your supplier charges under your price list.
        </p>
      )}
      <p className="text-xs text-walnut-500">
        Sheets and boards come from the sheet maps and board plan (kerf and trim counted). The allowance of {list.wasteAllowancePct}% is added to measured items: banding, laminate, cement, track, glue and finish.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" data-testid="shopping-table">
          <thead>
            <tr className="border-b border-walnut-300 text-left">
              <th className="px-2 py-1">Item</th>
              <th className="px-2 py-1 text-right">Need</th>
              <th className="px-2 py-1 text-right">Buy</th>
              <th className="px-2 py-1 text-right">Each</th>
              <th className="px-2 py-1 text-right">Total</th>
            </tr>
          </thead>
          <tbody>
            {list.lines.map((l) => (
              <tr key={l.id} className="break-inside-avoid border-b border-walnut-100">
                <td className="px-2 py-1">
                  {l.name}
                  {l.note && <span className="block text-xs text-walnut-500">{l.note}</span>}
                </td>
                <td className="px-2 py-1 text-right">
                  {l.needUnit === "mm" ? `${fmtQty(l.needQty / 1000)} m` : `${fmtQty(l.needQty)} ${l.needUnit}`}
                  {l.allowanceApplied && <span className="block text-xs text-walnut-500">+{list.wasteAllowancePct}%</span>}
                </td>
                <td className="px-2 py-1 text-right">
                  {l.buyQty} {l.buyUnit}
                </td>
                <td className="px-2 py-1 text-right">
                  {money(l.unitPriceCents)}
                  {l.examplePrice && <span className="block text-xs text-amberline-700">example</span>}
                </td>
                <td className="px-2 py-1 text-right">{money(l.totalCents)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            {list.totals.map((t) => (
              <tr key={t.group} className="text-walnut-700">
                <td className="px-2 py-1" colSpan={4}>
                  {t.label}
                </td>
                <td className="px-2 py-1 text-right">{money(t.totalCents)}</td>
              </tr>
            ))}
            <tr className="border-t-2 border-walnut-700 font-semibold">
              <td className="px-2 py-1" colSpan={4}>
                Total
              </td>
              <td className="px-2 py-1 text-right" data-testid="shopping-total">
                {money(list.totalCents)}
              </td>
            </tr>
          </tfoot>
        </table>
      </div>
      {list.missingPrices.length > 0 && <p className="text-sm text-brick-700">No price for: {list.missingPrices.join(", ")}. Add them to your price list; they are left out of the totals.</p>}
    </div>
  );
}
