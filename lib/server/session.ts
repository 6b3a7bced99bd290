import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { getServerSession } from "next-auth";
import { UserSchema, type User } from "@/entities/User";
import { authOptions } from "./auth";
import { forbidden, unauthorized } from "./errors";

/** The signed-in account, read fresh from the database (its role is authoritative here, not the cookie's). */
export async function currentUser(em: EntityManager): Promise<User | null> {
  const session = await getServerSession(authOptions());
  const id = session?.user?.id;
  if (!id) return null;
  return em.findOne(UserSchema, { id });
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
