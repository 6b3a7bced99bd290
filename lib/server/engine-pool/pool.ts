import Piscina from "piscina";
import { AppError } from "../errors";

/** Sizes of the pool: small, for a 2-core machine that also runs the web process and PostgreSQL. */
export interface EnginePoolOptions {
  /** The bundled worker (see worker-file.ts). */
  filename: string;
  minThreads?: number;
  maxThreads?: number;
  /** Tasks waiting beyond the running ones; one more answers 503 busy. */
  maxQueue?: number;
  /** Old-generation heap of each worker, MB: a task that needs more kills its worker (the pool starts a new one). */
  heapMb?: number;
}

export const POOL_DEFAULTS = { minThreads: 1, maxThreads: 2, maxQueue: 16, heapMb: 384 } as const;

/** Seconds a client is told to wait when the pool is full. */
export const BUSY_RETRY_SECONDS = 5;

export interface RunOptions {
  /** Longest the task may take, queue wait included, ms; past it the worker is ended and the call answers 503. */
  timeLimitMs: number;
  /** The request's signal: a client that goes away ends its task too. */
  signal?: AbortSignal;
  /** What the task does to the plan, in words for the error message: "analyse", "turn into a parts list". */
  doing: string;
}

/** The errors a pool call answers with: plain words, never the worker's own message. */
export const poolErrors = {
  tooSlow: (doing: string, ms: number) =>
    new AppError(503, "too_slow", `This plan takes too long to ${doing} on the server (over ${Math.round(ms / 1000)} s), so it was stopped. A plan with fewer fixtures answers faster (the editor also runs the checks in your browser).`),
  tooBig: (doing: string) =>
    new AppError(413, "too_large", `This plan needs more memory to ${doing} than the server gives one request, so it was stopped. A plan with fewer fixtures or parts will fit.`),
  busy: () =>
    new AppError(503, "busy", `The server is busy with other plans; try again in ${BUSY_RETRY_SECONDS} s.`, undefined, { retryAfterSeconds: BUSY_RETRY_SECONDS }),
  gone: () => new AppError(503, "cancelled", "The request was cancelled before the work finished."),
  unavailable: () => new AppError(503, "engine_unavailable", "The server's checks are not available right now; try again in a minute.", undefined, { retryAfterSeconds: 60 }),
};

const isAbort = (e: unknown) => e instanceof Error && (e.name === "AbortError" || /aborted/i.test(e.message));
const code = (e: unknown) => (e && typeof e === "object" && "code" in e ? String((e as { code: unknown }).code) : "");

/**
 * A worker-thread pool for engine work: each worker has a heap cap, each task a time limit, and the
 * queue a bound. A task that runs over its limit or out of memory ends its worker (piscina starts a
 * replacement), and the caller gets an AppError with a message in words; the web thread never runs
 * the work itself.
 */
export class EnginePool {
  private readonly piscina: Piscina;
  readonly maxQueue: number;

  constructor(opts: EnginePoolOptions) {
    const o = { ...POOL_DEFAULTS, ...opts };
    this.maxQueue = o.maxQueue;
    this.piscina = new Piscina({
      filename: o.filename,
      minThreads: o.minThreads,
      maxThreads: o.maxThreads,
      maxQueue: o.maxQueue,
      idleTimeout: 30_000,
      resourceLimits: { maxOldGenerationSizeMb: o.heapMb, maxYoungGenerationSizeMb: 32, stackSizeMb: 4 },
    });
    // A worker that dies between tasks (it should not) must not take the process with it.
    this.piscina.on("error", () => undefined);
  }

  /** Runs the named task of the worker with `input`; resolves with its result or rejects with an AppError. */
  async run<I, O>(name: string, input: I, opts: RunOptions): Promise<O> {
    if (this.piscina.queueSize >= this.maxQueue) throw poolErrors.busy();
    const timer = new AbortController();
    const timeout = setTimeout(() => timer.abort(), opts.timeLimitMs);
    const signal = opts.signal ? AbortSignal.any([timer.signal, opts.signal]) : timer.signal;
    try {
      return (await this.piscina.run(input, { name, signal })) as O;
    } catch (e) {
      if (timer.signal.aborted) throw poolErrors.tooSlow(opts.doing, opts.timeLimitMs);
      if (opts.signal?.aborted && isAbort(e)) throw poolErrors.gone();
      if (code(e) === "ERR_WORKER_OUT_OF_MEMORY") throw poolErrors.tooBig(opts.doing);
      if (e instanceof Error && /queue is at limit|no task queue available/i.test(e.message)) throw poolErrors.busy();
      throw e;
    } finally {
      clearTimeout(timeout);
    }
  }

  /** Threads alive now (for tests and health). */
  get threads(): number {
    return this.piscina.threads.length;
  }

  async close(): Promise<void> {
    await this.piscina.destroy();
  }
}
