import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";
import pino from "pino";
import { REDACT_PATHS, describeError } from "./log-safe";

/** The request a log line belongs to; route() opens one scope per request. */
interface RequestScope {
  requestId: string;
}

const g = globalThis as unknown as { __bwLog?: pino.Logger; __bwLogScope?: AsyncLocalStorage<RequestScope> };

/**
 * One scope store per process, like the logger: the server bundles this module more than once (the
 * instrumentation hook and the route bundles), and the logger's mixin must read the same store that
 * route() writes, or request ids vanish from the log.
 */
const scope = (g.__bwLogScope ??= new AsyncLocalStorage<RequestScope>());

/**
 * The server's logger: one JSON line per event, with the request id of the request it belongs to.
 * Log errors through logError (never the raw error object: driver errors carry SQL with its parameters).
 */
export const log: pino.Logger = (g.__bwLog ??= pino({
  level: process.env.LOG_LEVEL ?? "info",
  base: { pid: process.pid },
  redact: { paths: REDACT_PATHS, censor: "[redacted]" },
  mixin() {
    const s = scope.getStore();
    return s ? { requestId: s.requestId } : {};
  },
}));

/** Runs fn with every log line inside it tagged with the request id. */
export function withRequestScope<T>(requestId: string, fn: () => T): T {
  return scope.run({ requestId }, fn);
}

/** The id of the request being served, if any. */
export function currentRequestId(): string | undefined {
  return scope.getStore()?.requestId;
}

/** Logs a caught error by class, code and a message with SQL and its parameters removed. */
export function logError(msg: string, e: unknown, extra: Record<string, unknown> = {}): void {
  log.error({ ...extra, error: describeError(e) }, msg);
}
