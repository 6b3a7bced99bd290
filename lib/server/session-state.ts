import type { EntityManager } from "@mikro-orm/postgresql";
import type { AccountRole, User } from "@/entities/User";

/**
 * A session cookie carries the account's session version from the moment it was issued. The
 * session is live only while the account exists, is not disabled and still has that version;
 * raising the version (sign-out, password reset or change, an administrator's disable) ends every
 * session issued before, on every device and every instance.
 */
export interface SessionClaims {
  uid: string;
  sv: number | undefined;
}

export interface LiveAccount {
  sessionVersion: number;
  disabled: boolean;
  role: AccountRole;
}

/** How long one instance may reuse a read of an account's session state (other instances see a change within this). */
export const STATE_TTL_MS = 1000;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const cache = new Map<string, { at: number; state: LiveAccount | null }>();

export const isLive = (claims: SessionClaims, state: Pick<LiveAccount, "sessionVersion" | "disabled"> | null): boolean =>
  !!state && !state.disabled && typeof claims.sv === "number" && claims.sv === state.sessionVersion;

export const liveOf = (u: Pick<User, "sessionVersion" | "disabledAt" | "role">): LiveAccount => ({ sessionVersion: u.sessionVersion, disabled: !!u.disabledAt, role: u.role });

/** The account's session state: one primary-key read, reused for at most STATE_TTL_MS (unless `fresh`). */
export async function accountState(em: EntityManager, uid: string, opts: { fresh?: boolean } = {}): Promise<LiveAccount | null> {
  if (!UUID.test(uid)) return null;
  const now = Date.now();
  const hit = cache.get(uid);
  if (hit && !opts.fresh && now - hit.at < STATE_TTL_MS) return hit.state;
  const rows = await em.getConnection().execute<{ session_version: number; disabled_at: Date | null; role: AccountRole }[]>(
    `select session_version, disabled_at, role from app_user where id = ?`,
    [uid],
  );
  const row = rows[0];
  const state = row ? { sessionVersion: Number(row.session_version), disabled: !!row.disabled_at, role: row.role } : null;
  if (cache.size > 10_000) cache.clear();
  cache.set(uid, { at: now, state });
  return state;
}

/** Ends every session of the account (raises its session version); answers the new version. */
export async function endSessions(em: EntityManager, uid: string): Promise<number> {
  const rows = await em.getConnection().execute<{ session_version: number }[]>(
    `update app_user set session_version = session_version + 1 where id = ? returning session_version`,
    [uid],
  );
  cache.delete(uid);
  // A loaded copy keeps its old number; flushes write changed columns only, so it is never written back.
  return Number(rows[0]?.session_version ?? 0);
}

/** Drops this instance's cached state of an account (after a change made through the ORM). */
export const forgetState = (uid: string) => cache.delete(uid);
