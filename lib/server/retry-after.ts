import { AppError } from "./errors";
import { toErrorResponse } from "./http";

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/**
 * Wraps a handler (inside route()) so that an AppError carrying `extra.retryAfterSeconds` (a full
 * worker queue, a rate limit) answers with a Retry-After header beside the usual JSON envelope.
 */
export function withRetryAfter<C>(fn: Handler<C>): Handler<C> {
  return async (req, ctx) => {
    try {
      return await fn(req, ctx);
    } catch (e) {
      const seconds = e instanceof AppError ? e.extra?.retryAfterSeconds : undefined;
      if (typeof seconds !== "number") throw e;
      const res = toErrorResponse(e);
      res.headers.set("retry-after", String(Math.max(1, Math.ceil(seconds))));
      return res;
    }
  };
}
