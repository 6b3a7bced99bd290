import type { BuildResult } from "../build";

/**
 * Check-offs on the shop floor: one per piece cut at a setup ("cut:<setup id>:<label>") and one per
 * build step ("step:<step id>"). A check-off is +1 and its undo -1, so check-offs made on several
 * phones, online or not, add up in any order; a count is clamped to what the plan asks for.
 */
export const cutItem = (setupId: string, label: string) => `cut:${setupId}:${label}`;
export const stepItem = (stepId: string) => `step:${stepId}`;

/** What an item key may look like (the API refuses anything else). */
export const ITEM_PATTERN = /^(cut:[A-Za-z0-9._-]{1,60}:[A-Za-z0-9._-]{1,20}|step:[A-Za-z0-9._-]{1,120})$/;

export interface SetupProgress {
  setupId: string;
  done: number;
  total: number;
  /** Pieces cut per label at this setup, with the count asked for. */
  items: { label: string; item: string; done: number; total: number }[];
}

export interface ShopProgress {
  setups: SetupProgress[];
  steps: { stepId: string; item: string; done: boolean }[];
  /** Pieces and steps together. */
  overall: { done: number; total: number };
  /** The first setup in run order with pieces still to cut, or null when every piece is cut. */
  nextSetupId: string | null;
  /** Check-offs recorded against items the plan no longer has (a part removed, a setup renumbered): kept, shown, never lost. */
  orphans: { item: string; count: number }[];
}

const clamp = (n: number, max: number) => Math.max(0, Math.min(max, Math.round(n)));

/** Progress of a build from summed check-offs per item (any map: server totals plus those still waiting to sync). */
export function shopProgress(build: Pick<BuildResult, "setups" | "steps">, counts: ReadonlyMap<string, number>): ShopProgress {
  const known = new Set<string>();
  const setups = build.setups.map((s): SetupProgress => {
    const byLabel = new Map<string, number>();
    for (const it of s.items) byLabel.set(it.label, (byLabel.get(it.label) ?? 0) + it.qty);
    const items = [...byLabel].map(([label, total]) => {
      const item = cutItem(s.id, label);
      known.add(item);
      return { label, item, done: clamp(counts.get(item) ?? 0, total), total };
    });
    return { setupId: s.id, items, done: items.reduce((n, i) => n + i.done, 0), total: items.reduce((n, i) => n + i.total, 0) };
  });
  const steps = build.steps.map((st) => {
    const item = stepItem(st.id);
    known.add(item);
    return { stepId: st.id, item, done: (counts.get(item) ?? 0) > 0 };
  });
  const pieces = setups.reduce((a, s) => ({ done: a.done + s.done, total: a.total + s.total }), { done: 0, total: 0 });
  const orphans = [...counts].filter(([item, count]) => !known.has(item) && count > 0).map(([item, count]) => ({ item, count }));
  return {
    setups,
    steps,
    overall: { done: pieces.done + steps.filter((s) => s.done).length, total: pieces.total + steps.length },
    nextSetupId: setups.find((s) => s.done < s.total)?.setupId ?? null,
    orphans: orphans.sort((a, b) => a.item.localeCompare(b.item)),
  };
}

/** Adds check-off deltas into per-item sums (server totals first, then local ones not yet synced). */
export function sumCounts(...lists: readonly (readonly { item: string; count?: number; delta?: number }[])[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const list of lists) for (const c of list) out.set(c.item, (out.get(c.item) ?? 0) + (c.count ?? c.delta ?? 0));
  return out;
}

/**
 * An item in words: which part at which setup, or which step. `orderOf` gives a setup's or step's
 * number in the run order where the plan still has it; otherwise the recorded id is shown.
 */
export function describeItem(item: string, orderOf: (id: string) => number | undefined = () => undefined): string {
  const [kind, a = "", b] = item.split(":");
  const n = orderOf(a) ?? a;
  return kind === "cut" ? `${b} cut at setup ${n}` : `step ${n}`;
}
