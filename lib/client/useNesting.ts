"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Part } from "@/lib/engine/fixtures/types";
import type { NestOptions, NestProgress, NestResult } from "@/lib/engine/nesting/types";
import type { Material } from "@/lib/engine/plan/schema";
import { runNestRequest } from "./nest-worker";
import type { NestReply, NestRequest } from "./nest-worker";

export interface NestingState {
  result: NestResult | null;
  progress: NestProgress | null;
  running: boolean;
  cancelled: boolean;
  error: string | null;
  /** Stop the running search; the last finished result stays. */
  cancel: () => void;
  /** Run again with the same inputs (after a cancel). */
  rerun: () => void;
}

/**
 * Nest sheets in a Web Worker whenever the parts, materials or options change (debounced),
 * with progress and cancel. Falls back to running on the main thread where workers are missing.
 */
export function useNesting(parts: readonly Part[], materials: readonly Material[], options: Omit<NestOptions, "onProgress">, debounceMs = 250): NestingState {
  const [result, setResult] = useState<NestResult | null>(null);
  const [progress, setProgress] = useState<NestProgress | null>(null);
  const [running, setRunning] = useState(false);
  const [cancelled, setCancelled] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [runCount, setRunCount] = useState(0);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  // One key for the inputs, so a new array with the same content does not restart the search.
  const key = JSON.stringify({ parts, materials, options });
  const input = useMemo(() => JSON.parse(key) as Omit<NestRequest, "id">, [key]);
  const busy = useRef(false);

  const stopWorker = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  useEffect(() => {
    const id = ++seq.current;
    const req: NestRequest = { id, ...input };
    const onReply = (r: NestReply) => {
      if (r.id !== seq.current) return;
      if (r.type === "progress") setProgress(r.progress);
      else {
        busy.current = false;
        setRunning(false);
        setProgress(null);
        if (r.type === "done") setResult(r.result);
        else setError(r.message);
      }
    };
    const timer = setTimeout(() => {
      setRunning(true);
      setCancelled(false);
      setError(null);
      if (typeof Worker === "undefined") {
        busy.current = true;
        runNestRequest(req, onReply);
        return;
      }
      // A worker busy with stale inputs cannot be interrupted: replace it.
      if (busy.current) stopWorker();
      busy.current = true;
      if (!worker.current) {
        try {
          worker.current = new Worker(new URL("./nest-worker.ts", import.meta.url), { type: "module" });
        } catch {
          // No module workers here (old browser, strict CSP): run on the main thread instead.
          runNestRequest(req, onReply);
          return;
        }
      }
      worker.current.onmessage = (e: MessageEvent<NestReply>) => onReply(e.data);
      worker.current.onerror = (e) => onReply({ id, type: "error", message: e.message || "The nesting worker failed." });
      worker.current.postMessage(req);
    }, debounceMs);
    return () => clearTimeout(timer);
  }, [input, runCount, debounceMs, stopWorker]);

  useEffect(() => stopWorker, [stopWorker]);

  const cancel = useCallback(() => {
    seq.current++;
    busy.current = false;
    stopWorker();
    setRunning(false);
    setProgress(null);
    setCancelled(true);
  }, [stopWorker]);

  const rerun = useCallback(() => setRunCount((n) => n + 1), []);

  return { result, progress, running, cancelled, error, cancel, rerun };
}
