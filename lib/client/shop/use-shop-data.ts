"use client";
import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import type { BuildResult } from "@/lib/engine/build";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { shopProgress, sumCounts, type ShopProgress } from "@/lib/engine/shop/progress";
import { addCheck, checksOf, dropChecks, newId, readSnapshot, sourceKey, writeSnapshot, type LocalCheck, type ShopSource } from "./local-store";

/** What GET .../build answers. */
export interface BuildAnswer {
  units: PlanDocument["settings"]["units"];
  precision: PlanDocument["settings"]["precision"];
  build: BuildResult;
}

/** What GET .../progress answers. */
export interface ProgressAnswer {
  items: { item: string; count: number; by: string[]; lastAt: string }[];
  checks: number;
  serverTime: string;
}

export interface ShopData {
  answer: BuildAnswer | null;
  progress: ShopProgress | null;
  online: boolean;
  /** Check-offs made here that the server does not have yet (plans only). */
  waiting: number;
  lastSynced: string | null;
  /** A problem in words (nothing lost: check-offs stay queued). */
  problem: string | null;
  loading: boolean;
  checkOff: (item: string) => Promise<void>;
  /** Takes back the last check-off made on this page (as a -1 of its own, so it syncs like any other). */
  undo: () => Promise<void>;
  /** The item of the check-off undo would take back. */
  lastItem: string | null;
}

const POLL_MS = 20_000;
const BATCH = 500;

function endpoints(s: ShopSource) {
  return s.kind === "plan"
    ? { build: `/api/v1/plans/${s.planId}/build`, progress: `/api/v1/plans/${s.planId}/progress` as string | null }
    : { build: `/api/v1/shared/${s.token}/build`, progress: null };
}

async function getJson<T>(url: string): Promise<{ ok: true; data: T } | { ok: false; status: number }> {
  try {
    const r = await fetch(url, { headers: { accept: "application/json" }, cache: "no-store" });
    if (!r.ok) return { ok: false, status: r.status };
    return { ok: true, data: (await r.json()) as T };
  } catch {
    return { ok: false, status: 0 };
  }
}

const problemFor = (status: number) =>
  status === 0 ? null : status === 401 ? "Your session has ended: sign in again to send your check-offs (they are kept here)." : status === 404 ? "This plan is no longer shared with you; your check-offs are kept on this phone." : `The server answered ${status}; your check-offs are kept and will be sent again.`;

function subscribeOnline(onChange: () => void): () => void {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}

/**
 * The shop view's data, offline first: the last build and progress read for this plan (or link)
 * open at once from the phone, then the network refreshes them. Check-offs are written to the phone
 * first and sent when the network allows (every 20 s, on reconnect, after each check-off); a
 * repeat is harmless since each carries its own id.
 */
export function useShopData(source: ShopSource): ShopData {
  const key = sourceKey(source);
  const urls = useMemo(() => endpoints(source), [source]);
  const [answer, setAnswer] = useState<BuildAnswer | null>(null);
  const [server, setServer] = useState<ProgressAnswer | null>(null);
  const [local, setLocal] = useState<LocalCheck[]>([]);
  const browserOnline = useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
  /** False after a request failed for want of a network (Wi-Fi up but nothing behind it), until one succeeds. */
  const [reachable, setOnline] = useState(true);
  const online = browserOnline && reachable;
  const [lastSynced, setLastSynced] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [loading, setLoading] = useState(true);
  const sending = useRef(false);
  const [history, setHistory] = useState<string[]>([]);

  const remember = useCallback(async (b: BuildAnswer | null, p: ProgressAnswer | null) => {
    const prev = await readSnapshot<BuildAnswer, ProgressAnswer>(key);
    const build = b ?? prev?.build;
    if (build) await writeSnapshot({ source: key, build, progress: p ?? prev?.progress ?? null, savedAt: new Date().toISOString() });
  }, [key]);

  const flush = useCallback(async () => {
    if (!urls.progress || sending.current) return;
    sending.current = true;
    try {
      const queued = (await checksOf(key)).filter((c) => !c.localOnly);
      for (let i = 0; i < queued.length; i += BATCH) {
        const batch = queued.slice(i, i + BATCH);
        let res: Response;
        try {
          res = await fetch(urls.progress, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ checks: batch.map(({ id, item, delta, madeAt }) => ({ id, item, delta, madeAt })) }) });
        } catch {
          setOnline(false);
          return;
        }
        if (!res.ok) {
          setProblem(problemFor(res.status));
          return;
        }
        const p = (await res.json()) as ProgressAnswer;
        await dropChecks(batch.map((c) => c.id));
        setLocal(await checksOf(key));
        setServer(p);
        await remember(null, p);
        setLastSynced(new Date().toISOString());
        setProblem(null);
      }
      setLocal(await checksOf(key));
    } finally {
      sending.current = false;
    }
  }, [key, remember, urls.progress]);

  const refresh = useCallback(async () => {
    const b = await getJson<BuildAnswer>(urls.build);
    const p = urls.progress ? await getJson<ProgressAnswer>(urls.progress) : null;
    if (b.ok) setAnswer(b.data);
    if (p?.ok) setServer(p.data);
    const failed = !b.ok ? b.status : p && !p.ok ? p.status : -1;
    setOnline(failed !== 0);
    if (failed > 0) setProblem(problemFor(failed));
    if (b.ok && (!p || p.ok)) {
      await remember(b.data, p?.ok ? p.data : null);
      setLastSynced(new Date().toISOString());
      if (failed < 0) setProblem(null);
    }
  }, [remember, urls.build, urls.progress]);

  useEffect(() => {
    let live = true;
    void (async () => {
      const snap = await readSnapshot<BuildAnswer, ProgressAnswer>(key).catch(() => undefined);
      if (live && snap) {
        setAnswer(snap.build);
        setServer(snap.progress);
        setLastSynced(snap.savedAt);
      }
      if (live) setLocal(await checksOf(key).catch(() => []));
      await flush();
      await refresh();
      if (live) setLoading(false);
    })();
    const tick = setInterval(() => void flush().then(refresh), POLL_MS);
    const up = () => {
      setOnline(true);
      void flush().then(refresh);
    };
    window.addEventListener("online", up);
    return () => {
      live = false;
      clearInterval(tick);
      window.removeEventListener("online", up);
    };
  }, [flush, key, refresh]);

  const record = useCallback(
    async (item: string, delta: 1 | -1) => {
      const c: LocalCheck = { id: newId(), source: key, item, delta, madeAt: new Date().toISOString(), localOnly: source.kind === "share" };
      await addCheck(c);
      setLocal((l) => [...l, c]);
      void flush();
    },
    [flush, key, source.kind],
  );
  const checkOff = useCallback(
    async (item: string) => {
      await record(item, 1);
      setHistory((h) => [...h, item]);
    },
    [record],
  );
  const undo = useCallback(async () => {
    const item = history.at(-1);
    if (!item) return;
    setHistory((h) => h.slice(0, -1));
    await record(item, -1);
  }, [history, record]);

  const progress = useMemo(() => (answer ? shopProgress(answer.build, sumCounts(server?.items ?? [], local)) : null), [answer, server, local]);
  const waiting = local.filter((c) => !c.localOnly).length;
  return { answer, progress, online, waiting, lastSynced, problem, loading: loading && !answer, checkOff, undo, lastItem: history.at(-1) ?? null };
}
