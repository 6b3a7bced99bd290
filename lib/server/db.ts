import "server-only";
import { MikroORM } from "@mikro-orm/postgresql";
import type { EntityManager } from "@mikro-orm/postgresql";
import config from "../../mikro-orm.config";
import { env } from "./env";

const g = globalThis as unknown as { __bwOrm?: Promise<MikroORM> };

/**
 * The one ORM instance of this process (cached on globalThis for dev reloads). A failed start is
 * not cached, so the next request tries again. Connections that PostgreSQL drops (a restart, a
 * crash) are discarded by the pool itself (knex marks a connection that errored and validates it
 * before handing it out); the timeouts in mikro-orm.config.ts make requests fail fast meanwhile.
 */
export function getOrm(): Promise<MikroORM> {
  if (!g.__bwOrm) {
    g.__bwOrm = MikroORM.init({ ...config, clientUrl: env().DATABASE_URL }).catch((e: unknown) => {
      g.__bwOrm = undefined;
      throw e;
    });
  }
  return g.__bwOrm;
}

/** A fresh EntityManager for one request; never share it across requests. */
export async function requestEm(): Promise<EntityManager> {
  return (await getOrm()).em.fork();
}

/** Closes the pool (on shutdown), so PostgreSQL sees the connections end rather than drop. */
export async function closeOrm(): Promise<void> {
  const orm = g.__bwOrm;
  g.__bwOrm = undefined;
  if (orm) await (await orm.catch(() => null))?.close();
}

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
