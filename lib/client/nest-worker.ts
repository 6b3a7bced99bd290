/**
 * Web Worker that runs the sheet nesting off the main thread. It posts progress now and then
 * and the result at the end; to cancel, the page terminates the worker (a running search cannot
 * read messages), keeping the last finished result.
 */
import type { Part } from "@/lib/engine/fixtures/types";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import type { NestOptions, NestProgress, NestResult } from "@/lib/engine/nesting/types";
import type { Material } from "@/lib/engine/plan/schema";

export interface NestRequest {
  id: number;
  parts: Part[];
  materials: Material[];
  options: Omit<NestOptions, "onProgress">;
}

export type NestReply = { id: number; type: "progress"; progress: NestProgress } | { id: number; type: "done"; result: NestResult } | { id: number; type: "error"; message: string };

/** Runs one request, reporting at most every `everyMs`. Exported so tests and the no-worker fallback use the same path. */
export function runNestRequest(req: NestRequest, post: (r: NestReply) => void, everyMs = 100): void {
  let last = 0;
  try {
    const result = nestSheets(req.parts, req.materials, {
      ...req.options,
      onProgress: (progress) => {
        const now = performance.now();
        if (now - last >= everyMs) {
          last = now;
          post({ id: req.id, type: "progress", progress });
        }
      },
    });
    post({ id: req.id, type: "done", result });
  } catch (e) {
    post({ id: req.id, type: "error", message: e instanceof Error ? e.message : String(e) });
  }
}

interface WorkerScope {
  postMessage(m: unknown): void;
  onmessage: ((e: MessageEvent<NestRequest>) => void) | null;
}

const scope = globalThis as unknown as Partial<WorkerScope> & { document?: unknown };
// Only wire up inside a worker (no document), not when a test imports this module.
if (typeof scope.document === "undefined" && typeof scope.postMessage === "function" && "onmessage" in scope) {
  scope.onmessage = (e) => runNestRequest(e.data, (r) => scope.postMessage?.(r));
}
