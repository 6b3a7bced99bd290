// SQLSTATE classes and codes that mean "the database is not there right now", not "bad query":
// 08 connection exception, 57P01-57P03 shutdown / crash / starting up, 53300 too many connections.
const UNAVAILABLE_SQLSTATE = /^(08...|57P0[123]|53300)$/;
const UNAVAILABLE_ERRNO = new Set(["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "EHOSTUNREACH", "ENOTFOUND"]);
const UNAVAILABLE_TEXT = /Connection terminated|Timeout acquiring a connection|connection timeout|the database system is (starting up|shutting down|in recovery mode)|Client has encountered a connection error/i;

/**
 * True when an error means the database cannot be reached at the moment (worth a 503 and a retry),
 * looking through the ORM's wrappers (`cause`, `previous`) to the driver's error.
 */
export function databaseUnavailable(e: unknown, depth = 0): boolean {
  if (!e || typeof e !== "object" || depth > 4) return false;
  const err = e as { code?: unknown; message?: unknown; cause?: unknown; previous?: unknown };
  if (typeof err.code === "string" && (UNAVAILABLE_SQLSTATE.test(err.code) || UNAVAILABLE_ERRNO.has(err.code))) return true;
  if (typeof err.message === "string" && UNAVAILABLE_TEXT.test(err.message)) return true;
  if (e instanceof AggregateError && e.errors.some((x) => databaseUnavailable(x, depth + 1))) return true;
  return databaseUnavailable(err.cause, depth + 1) || databaseUnavailable(err.previous, depth + 1);
}
