import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { UserSchema, type User } from "@/entities/User";
import { forbidden, unauthorized } from "./errors";
import { isLive, liveOf } from "./session-state";
import { readSessionClaims } from "./session-token";

/**
 * The signed-in account, read fresh from the database in one primary-key read (its role is
 * authoritative here, not the cookie's). A cookie from before the account's last sign-out, password
 * reset or change, or of a disabled account, is no session.
 */
export async function currentUser(em: EntityManager): Promise<User | null> {
  const claims = await readSessionClaims();
  if (!claims) return null;
  const user = await em.findOne(UserSchema, { id: claims.uid });
  return user && isLive(claims, liveOf(user)) ? user : null;
}

/** The signed-in account, or 401. */
export async function requireUser(em: EntityManager): Promise<User> {
  const user = await currentUser(em);
  if (!user) throw unauthorized();
  return user;
}

/** An account with the admin role, or 401/403. */
export async function requireAdmin(em: EntityManager): Promise<User> {
  const user = await requireUser(em);
  if (user.role !== "admin") throw forbidden("Only an administrator can do this.");
  return user;
}
