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
