import type { EntityManager } from "@mikro-orm/postgresql";
import { LoginAttemptSchema } from "@/entities/LoginAttempt";
import { env } from "./env";

/** Keys a failed sign-in counts against: the account and the client address. */
export const attemptKeys = (email: string, ip: string) => [`acct:${email.toLowerCase()}`, `ip:${ip}`];

/**
 * True when a key has reached its failure limit within the window (kept in PostgreSQL, so it holds
 * across instances). An address gets a larger allowance than an account: many people can share one.
 */
export async function isLimited(em: EntityManager, keys: string[]): Promise<boolean> {
  const { AUTH_MAX_FAILURES, AUTH_MAX_FAILURES_PER_IP, AUTH_WINDOW_MINUTES } = env();
  const since = new Date(Date.now() - AUTH_WINDOW_MINUTES * 60_000);
  for (const key of keys) {
    const n = await em.count(LoginAttemptSchema, { key, createdAt: { $gte: since } });
    if (n >= (key.startsWith("ip:") ? AUTH_MAX_FAILURES_PER_IP : AUTH_MAX_FAILURES)) return true;
  }
  return false;
}

export async function recordFailure(em: EntityManager, keys: string[]): Promise<void> {
  for (const key of keys) em.create(LoginAttemptSchema, { key });
  await em.flush();
}

/** A successful sign-in clears the account's failures (the address keeps its count). */
export async function clearAccount(em: EntityManager, email: string): Promise<void> {
  await em.nativeDelete(LoginAttemptSchema, { key: `acct:${email.toLowerCase()}` });
}
