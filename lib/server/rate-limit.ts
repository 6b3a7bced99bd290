import type { EntityManager } from "@mikro-orm/postgresql";
import { LoginAttemptSchema } from "@/entities/LoginAttempt";
import { env } from "./env";

/**
 * Sign-in limits, kept in PostgreSQL so they hold across instances. Failures count against two
 * keys: the account and address together ("pair"), and the address alone ("ip").
 *
 * - A pair gets AUTH_MAX_FAILURES free tries in the window; after that each further try from that
 *   pair must wait a delay that doubles with every failure (AUTH_DELAY_BASE_SECONDS, 2x, 4x, ...,
 *   at most AUTH_DELAY_MAX_SECONDS after the last failure). There is no lock: once the wait is over
 *   the right password signs in, and the right password from any other address is never held up
 *   by failures elsewhere, so nobody can shut an owner out of their account by guessing.
 * - An address that fails AUTH_MAX_FAILURES_PER_IP times in the window (a spray across many
 *   accounts) is refused until its failures age out of the window.
 */
export const pairKey = (email: string, address: string) => `pair:${email.trim().toLowerCase()}|${address}`;
export const addressKey = (address: string) => `ip:${address}`;

export type SignInGate = { kind: "open" } | { kind: "wait"; seconds: number } | { kind: "address_capped"; seconds: number };

/** Seconds a pair must still wait after `failures` failures, the last at `lastAt` (0 when it may try now). */
export function pairWaitSeconds(failures: number, lastAt: Date | null, now: Date, limits = delayLimits()): number {
  if (failures < limits.free || !lastAt) return 0;
  const delay = Math.min(limits.maxSeconds, limits.baseSeconds * 2 ** Math.min(failures - limits.free, 30));
  return Math.max(0, Math.ceil((lastAt.getTime() + delay * 1000 - now.getTime()) / 1000));
}

function delayLimits() {
  const e = env();
  return { free: e.AUTH_MAX_FAILURES, baseSeconds: e.AUTH_DELAY_BASE_SECONDS, maxSeconds: e.AUTH_DELAY_MAX_SECONDS };
}

interface KeyCount {
  key: string;
  n: number;
  first: Date | null;
  last: Date | null;
}

async function counts(em: EntityManager, keys: string[], since: Date): Promise<Map<string, KeyCount>> {
  const rows = await em
    .getConnection()
    .execute<{ key: string; n: string | number; first: Date | string | null; last: Date | string | null }[]>(
      `select key, count(*) as n, min(created_at) as first, max(created_at) as last from login_attempt where key in (?, ?) and created_at >= ? group by key`,
      [keys[0], keys[1], since],
    );
  const out = new Map<string, KeyCount>();
  for (const r of rows) out.set(r.key, { key: r.key, n: Number(r.n), first: r.first ? new Date(r.first) : null, last: r.last ? new Date(r.last) : null });
  return out;
}

/** Whether a sign-in from `address` for `email` may be checked now (one indexed query). */
export async function signInGate(em: EntityManager, email: string, address: string, now = new Date()): Promise<SignInGate> {
  const { AUTH_MAX_FAILURES_PER_IP, AUTH_WINDOW_MINUTES } = env();
  const windowMs = AUTH_WINDOW_MINUTES * 60_000;
  const pair = pairKey(email, address);
  const ip = addressKey(address);
  const c = await counts(em, [pair, ip], new Date(now.getTime() - windowMs));
  const byAddress = c.get(ip);
  if (byAddress && byAddress.n >= AUTH_MAX_FAILURES_PER_IP) {
    // Refused until the oldest failure in the window ages out.
    const seconds = byAddress.first ? Math.max(1, Math.ceil((byAddress.first.getTime() + windowMs - now.getTime()) / 1000)) : AUTH_WINDOW_MINUTES * 60;
    return { kind: "address_capped", seconds };
  }
  const p = c.get(pair);
  const seconds = p ? pairWaitSeconds(p.n, p.last, now) : 0;
  return seconds > 0 ? { kind: "wait", seconds } : { kind: "open" };
}

/** Counts one failed sign-in against the pair and the address. */
export async function recordFailure(em: EntityManager, email: string, address: string): Promise<void> {
  em.create(LoginAttemptSchema, { key: pairKey(email, address) });
  em.create(LoginAttemptSchema, { key: addressKey(address) });
  await em.flush();
  // Now and then, drop rows long out of every window so the table stays small.
  if (Math.random() < 0.02) {
    const before = new Date(Date.now() - 2 * env().AUTH_WINDOW_MINUTES * 60_000);
    await em.nativeDelete(LoginAttemptSchema, { createdAt: { $lt: before } });
  }
}

/** A successful sign-in clears that pair's failures (the address keeps its count). */
export async function clearPair(em: EntityManager, email: string, address: string): Promise<void> {
  await em.nativeDelete(LoginAttemptSchema, { key: pairKey(email, address) });
}
