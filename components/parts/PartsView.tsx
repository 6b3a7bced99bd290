"use client";

import { useEffect, useMemo, useState } from "react";
import { buildPlan } from "@/lib/engine/build";
import { useNesting } from "@/lib/client/useNesting";
import { planBoards } from "@/lib/engine/boards/plan-boards";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { partsCsv } from "@/lib/engine/shopping/csv";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import type { PriceItem } from "@/lib/engine/shopping/price-schema";
import { buildShoppingList } from "@/lib/engine/shopping/shopping-list";
import { BoardLayouts } from "./BoardLayouts";
import { BuildPanel } from "./build/BuildPanel";
import { LabelContext, type LabelState } from "./build/label-context";
import { formatters } from "./format";
import { planNestOptions } from "@/lib/engine/nesting/plan-nest";
import type { OffcutInput } from "@/lib/engine/nesting/types";
import { OffcutsForm } from "./OffcutsForm";
import { PartsTable, type PartRow } from "./PartsTable";
import { PriceListEditor } from "./PriceListEditor";
import { planParts } from "./plan-parts";
import { SheetMapsPanel } from "./SheetMapsPanel";
import { downloadText, ShoppingPanel } from "./ShoppingPanel";

const TABS = [
  { id: "parts", label: "Parts" },
  { id: "build", label: "Build" },
  { id: "sheets", label: "Sheet maps" },
  { id: "boards", label: "Boards" },
  { id: "shopping", label: "Shopping" },
] as const;
type TabId = (typeof TABS)[number]["id"];

/** The account's prices, or the example list when signed out or not yet saved. */
function usePrices(): { items: PriceItem[]; mine: boolean; set: (items: PriceItem[], mine: boolean) => void } {
  const [state, setState] = useState<{ items: PriceItem[]; mine: boolean }>({ items: DEFAULT_PRICE_LIST.items, mine: false });
  useEffect(() => {
    let live = true;
    fetch("/api/v1/prices")
      .then((r) => (r.ok ? r.json() : null))
      .then((b: { prices?: { items: PriceItem[]; isDefault: boolean } } | null) => {
        if (live && b?.prices) setState({ items: b.prices.items, mine: !b.prices.isDefault });
      })
      .catch(() => undefined);
    return () => {
      live = false;
    };
  }, []);
  return { ...state, set: (items, mine) => setState({ items, mine }) };
}

/** Parts list, sheet maps, board plan and shopping list of a plan, in tabs; printing shows them all. */
export function PartsView({ plan }: { plan: PlanDocument }) {
  const [tab, setTab] = useState<TabId>("parts");
  const [allowance, setAllowance] = useState(10);
  const fmt = useMemo(() => formatters(plan.settings), [plan.settings]);
  const { parts, hardware, fixtures } = useMemo(() => planParts(plan), [plan]);
  const build = useMemo(() => buildPlan(plan, { parts, fixtures }), [plan, parts, fixtures]);
  const [selected, setSelected] = useState<string | null>(null);
  const labels = useMemo<LabelState>(() => ({ labelOf: build.labelOf, selected, select: setSelected }), [build.labelOf, selected]);
  const rows = useMemo<PartRow[]>(() => {
    const names = new Map(plan.materials.map((m) => [m.id, m.name]));
    const fixtureName = new Map(build.fixtures.map((f) => [f.fixtureId, `${f.letter}: ${f.name}`]));
    return parts.map((p) => ({ ...p, label: build.labelOf[p.id] ?? "", fixtureLabel: fixtureName.get(p.fixtureId) ?? p.fixtureId, materialName: names.get(p.materialId) ?? p.materialId }));
  }, [parts, plan.materials, build]);
  const [offcuts, setOffcuts] = useState<OffcutInput[]>([]);
  const nestOptions = useMemo(() => planNestOptions(plan.settings.kerfMm, { offcuts }), [plan.settings.kerfMm, offcuts]);
  const nesting = useNesting(parts, plan.materials, nestOptions);
  const boards = useMemo(() => planBoards(parts, plan.materials, { kerfMm: plan.settings.kerfMm }), [parts, plan.materials, plan.settings.kerfMm]);
  const prices = usePrices();
  const shopping = useMemo(
    () => buildShoppingList({ parts, hardware, sheets: nesting.result?.materials ?? [], boards, materials: plan.materials }, prices.items, { wasteAllowancePct: allowance }),
    [parts, hardware, nesting.result, boards, plan.materials, prices.items, allowance],
  );

  return (
    <LabelContext.Provider value={labels}>
      <div className="flex flex-col gap-4" data-testid="parts-view">
        <div className="no-print flex flex-wrap gap-1 border-b border-walnut-300">
          {/* Only tabs inside the tablist (WCAG: a tablist owns tabs only); the file buttons sit beside it. */}
          <div role="tablist" aria-label="Parts and materials" className="flex flex-wrap gap-1">
            {TABS.map((t) => (
              <button
                key={t.id}
                type="button"
                role="tab"
                id={`parts-tab-${t.id}`}
                aria-selected={tab === t.id}
                aria-controls={`parts-panel-${t.id}`}
                onClick={() => setTab(t.id)}
                className={`rounded-t-md px-3 py-1.5 text-sm ${tab === t.id ? "bg-walnut-700 text-paper" : "text-walnut-700 hover:bg-paper-deep"}`}
              >
                {t.label}
              </button>
            ))}
          </div>
          <span className="flex-1" />
          <button type="button" onClick={() => downloadText("parts-list.csv", partsCsv(parts, plan.materials, { ...plan.settings, labelOf: build.labelOf }))} className="mb-1 rounded-md border border-walnut-300 px-3 py-1 text-sm">
            Parts CSV
          </button>
          <button type="button" onClick={() => window.print()} className="mb-1 rounded-md border border-walnut-300 px-3 py-1 text-sm">
            Print
          </button>
        </div>
        {TABS.map((t) => (
          <section
            key={t.id}
            role="tabpanel"
            id={`parts-panel-${t.id}`}
            aria-labelledby={`parts-tab-${t.id}`}
            className={`${tab === t.id ? "block" : "hidden"} print:block print:break-before-page first-of-type:print:break-before-auto`}
          >
            <h2 className="mb-2 hidden text-lg font-semibold print:block">{t.label}</h2>
            {t.id === "parts" && (parts.length ? <PartsTable rows={rows} fmt={fmt} /> : <p className="text-sm text-walnut-500">Add fixtures to the plan to see their parts.</p>)}
            {t.id === "build" && <BuildPanel build={build} fmt={fmt} />}
            {t.id === "sheets" && (
              <div className="flex flex-col gap-4">
                <OffcutsForm offcuts={offcuts} onChange={setOffcuts} materials={plan.materials} settings={plan.settings} fmt={fmt} />
                <SheetMapsPanel nesting={nesting} kerfMm={plan.settings.kerfMm} fmt={fmt} />
              </div>
            )}
            {t.id === "boards" && <BoardLayouts plan={boards} fmt={fmt} />}
            {t.id === "shopping" && (
              <div className="flex flex-col gap-4">
                <ShoppingPanel list={shopping} allowancePct={allowance} onAllowance={setAllowance} pricesAreMine={prices.mine} />
                <PriceListEditor key={prices.mine ? "mine" : "examples"} items={prices.items} onSaved={prices.set} />
              </div>
            )}
          </section>
        ))}
      </div>
    </LabelContext.Provider>
  );
}
