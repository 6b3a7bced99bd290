"use client";
import { useMemo, useState } from "react";
import type { CutRow } from "@/lib/engine/build";
import { describeItem, stepItem } from "@/lib/engine/shop/progress";
import { formatLength } from "@/lib/engine/units/format-length";
import type { ShopSource } from "@/lib/client/shop/local-store";
import { useOfflineReady, useWakeLock } from "@/lib/client/shop/offline";
import { useShopData } from "@/lib/client/shop/use-shop-data";
import { Cautions } from "./Cautions";
import { ProgressBar } from "./ProgressBar";
import { SetupCard } from "./SetupCard";
import { StepCard } from "./StepCard";
import { StopTables } from "./StopTables";
import { SyncStatus } from "./SyncStatus";

type Tab = "cut" | "stops" | "build";
const TABS: { id: Tab; label: string }[] = [
  { id: "cut", label: "Cut" },
  { id: "stops", label: "Stops" },
  { id: "build", label: "Build" },
];

/** Said once at the top of the shop view, whatever the plan. */
const SHOP_CAUTIONS = [
  "Read your saw's manual before each new setup; keep the blade guard and riving knife on and use push sticks for narrow rips.",
  "Wear eye and hearing protection and run dust collection; wait for the blade to stop before reaching near it.",
];

/**
 * The plan on a phone at the saw: the next setup with the pieces it cuts, the stop tables and the
 * build steps, big type and large buttons, check-offs that survive a dropped network.
 */
export function ShopFloor({ source, planName }: { source: ShopSource; planName: string }) {
  const data = useShopData(source);
  const dataUrls = useMemo(
    () => (source.kind === "plan" ? [`/api/v1/plans/${source.planId}/build`, `/api/v1/plans/${source.planId}/progress`] : [`/api/v1/shared/${source.token}/build`]),
    [source],
  );
  const offlineReady = useOfflineReady(dataUrls);
  const awake = useWakeLock();
  const [tab, setTab] = useState<Tab>("cut");
  const [showAll, setShowAll] = useState(false);
  const answer = data.answer;
  const units = answer?.units ?? "mm";
  const precision = answer?.precision ?? 16;
  const fmt = useMemo(() => (mm: number) => formatLength(mm, { units, precision }), [units, precision]);
  const rows = useMemo(() => new Map<string, CutRow>((answer?.build.rows ?? []).map((r) => [r.label, r])), [answer]);

  if (!answer || !data.progress) {
    return (
      <div className="mx-auto max-w-xl px-4 py-8 text-lg" data-testid="shop-floor">
        <h1 className="text-2xl font-bold text-walnut-900">{planName}</h1>
        <p className="mt-2 text-walnut-700" role="status">
          {data.loading ? "Loading the setups and steps…" : data.online ? (data.problem ?? "Could not load the plan's setups.") : "Offline, and this plan has not been opened on this phone before: open it once with a network."}
        </p>
      </div>
    );
  }
  const { build } = answer;
  const progress = data.progress;
  const setupOf = new Map(build.setups.map((s) => [s.id, s]));
  const stepOf = new Map(build.steps.map((st) => [st.id, st]));
  const orderOf = (id: string) => setupOf.get(id)?.order ?? stepOf.get(id)?.order;
  const stepDone = new Map(progress.steps.map((p) => [p.stepId, p.done]));
  const nextIndex = progress.setups.findIndex((s) => s.setupId === progress.nextSetupId);
  const shown = showAll ? progress.setups : progress.setups.filter((_, i) => i === nextIndex);

  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 px-3 pb-28 pt-4" data-testid="shop-floor">
      <header className="flex flex-col gap-2">
        <p className="text-sm font-semibold uppercase tracking-wide text-walnut-500">At the saw{awake ? " · screen stays on" : ""}</p>
        <h1 className="text-3xl font-bold leading-tight text-walnut-900">{planName}</h1>
        <SyncStatus online={data.online} waiting={data.waiting} lastSynced={data.lastSynced} problem={data.problem} shared={source.kind === "share"} offlineReady={offlineReady} />
        <ProgressBar done={progress.overall.done} total={progress.overall.total} label="Whole build" />
      </header>
      <Cautions items={SHOP_CAUTIONS} title="Every time" />
      {build.notes.length > 0 && (
        <details className="rounded-lg bg-amberline-100 px-3 py-2 text-base text-walnut-900">
          <summary className="min-h-10 cursor-pointer py-1 font-semibold">
            {build.notes.length} note{build.notes.length === 1 ? "" : "s"} on the cut list
          </summary>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {build.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </details>
      )}
      <nav aria-label="Shop view sections" className="grid grid-cols-3 gap-2">
        {TABS.map((t) => (
          <button key={t.id} type="button" aria-pressed={tab === t.id} onClick={() => setTab(t.id)} className="min-h-14 rounded-lg border-2 border-walnut-700 text-xl font-bold text-walnut-900 aria-pressed:bg-walnut-700 aria-pressed:text-paper">
            {t.label}
          </button>
        ))}
      </nav>

      {tab === "cut" && (
        <div className="flex flex-col gap-4">
          {progress.nextSetupId === null && <p className="rounded-lg bg-pine-100 px-3 py-3 text-lg font-semibold text-pine-700">Every piece is cut. On to the build steps.</p>}
          {shown.map((sp) => {
            const setup = setupOf.get(sp.setupId);
            return setup ? <SetupCard key={sp.setupId} setup={setup} progress={sp} rows={rows} fmt={fmt} onCut={(item) => void data.checkOff(item)} next={sp.setupId === progress.nextSetupId} /> : null;
          })}
          <button type="button" onClick={() => setShowAll((v) => !v)} className="min-h-12 rounded-lg border-2 border-walnut-300 text-lg font-semibold text-walnut-900">
            {showAll ? "Show the next setup only" : `Show all ${progress.setups.length} setups`}
          </button>
          {!showAll && (
            <ol className="flex flex-col gap-2" aria-label="All setups in order">
              {progress.setups.map((sp) => {
                const setup = setupOf.get(sp.setupId);
                return (
                  <li key={sp.setupId}>
                    <ProgressBar done={sp.done} total={sp.total} label={setup ? `${setup.order}. ${setup.title}` : sp.setupId} />
                  </li>
                );
              })}
            </ol>
          )}
        </div>
      )}
      {tab === "stops" && <StopTables tables={build.stopTables} fmt={fmt} />}
      {tab === "build" && (
        <div className="flex flex-col gap-4">
          {build.steps.map((st) => (
            <StepCard key={st.id} step={st} done={stepDone.get(st.id) ?? false} onDone={() => void data.checkOff(stepItem(st.id))} setupTitle={(id) => setupOf.get(id)?.title ?? id} />
          ))}
        </div>
      )}

      {progress.orphans.length > 0 && (
        <section aria-labelledby="orphans" className="rounded-xl border-2 border-steel-500 bg-steel-100 p-4 text-steel-700" data-testid="orphans">
          <h2 id="orphans" className="text-lg font-bold">Recorded, but no longer in the plan</h2>
          <p className="text-base">The plan changed after these were checked off. They are kept; nothing was lost.</p>
          <ul className="mt-1 list-disc pl-5 text-base">
            {progress.orphans.map((o) => (
              <li key={o.item}>
                {describeItem(o.item)} ({o.count})
              </li>
            ))}
          </ul>
        </section>
      )}

      <div className="fixed inset-x-0 bottom-0 border-t-2 border-walnut-300 bg-paper p-3">
        <div className="mx-auto max-w-xl">
          <button type="button" onClick={() => void data.undo()} disabled={!data.lastItem} className="min-h-14 w-full rounded-lg border-2 border-walnut-700 bg-white text-lg font-bold text-walnut-900 disabled:border-walnut-100 disabled:text-walnut-500">
            {data.lastItem ? `Undo last check-off (${describeItem(data.lastItem, orderOf)})` : "Undo last check-off"}
          </button>
        </div>
      </div>
    </div>
  );
}
