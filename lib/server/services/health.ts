import "server-only";
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { getOrm } from "../db";

export interface Health {
  ok: boolean;
  db: "up" | "down";
  /** "pending": the database lacks a migration this build ships; "unknown" while the database is down. */
  migrations: "current" | "pending" | "unknown";
}

/** Each part of the check gives up after this, so a hung database still gets a quick answer. */
const PART_TIMEOUT_MS = 2_000;
const MIGRATION_FILE = /^(Migration\d+[\w-]*)\.(ts|js|mjs|cjs)$/;

function withTimeout<T>(p: Promise<T>, ms: number): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error("health check timed out")), ms);
  });
  return Promise.race([p, late]).finally(() => clearTimeout(timer));
}

let shipped: string[] | undefined;
/** The migrations this build ships (the files the MikroORM CLI runs), read once per process. */
function shippedMigrations(): string[] {
  shipped ??= readdirSync(join(process.cwd(), "migrations"))
    .map((f) => MIGRATION_FILE.exec(f)?.[1])
    .filter((n): n is string => !!n);
  return shipped;
}

/**
 * Whether the database answers and has every migration applied: one query on the migrator's own
 * table (names without extension, as MikroORM records them). No secrets, no details of errors.
 */
export async function checkHealth(): Promise<Health> {
  let executed: Set<string>;
  try {
    const orm = await withTimeout(getOrm(), PART_TIMEOUT_MS);
    const rows = await withTimeout(
      orm.em.getConnection().execute<{ name: string }[]>("select name from mikro_orm_migrations"),
      PART_TIMEOUT_MS,
    ).catch((e: unknown) => {
      // A database without the migrator's table has every migration pending, but it is up.
      if ((e as { code?: unknown }).code === "42P01" || /mikro_orm_migrations.*does not exist/.test(String((e as Error).message))) return [];
      throw e;
    });
    executed = new Set(rows.map((r) => r.name.replace(/\.(ts|js|mjs|cjs)$/, "")));
  } catch {
    return { ok: false, db: "down", migrations: "unknown" };
  }
  const pending = shippedMigrations().some((m) => !executed.has(m));
  return { ok: !pending, db: "up", migrations: pending ? "pending" : "current" };
}
