import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException } from "@mikro-orm/core";
import { UserSchema, type AccountRole, type User } from "@/entities/User";
import { invalid, notFound } from "../errors";
import { hashPassword, passwordProblem } from "../passwords";

export interface AccountView {
  id: string;
  email: string;
  name: string;
  role: AccountRole;
  createdAt: string;
  emailVerified: boolean;
}

export const accountView = (u: User): AccountView => ({ id: u.id, email: u.email, name: u.name, role: u.role, createdAt: u.createdAt.toISOString(), emailVerified: !!u.emailVerifiedAt });

/** Creates a member account; the password must pass the strength rule. */
export async function signUp(em: EntityManager, input: { name: string; email: string; password: string }): Promise<AccountView> {
  const email = input.email.trim().toLowerCase();
  const problem = passwordProblem(input.password, email);
  if (problem) throw invalid("Choose a stronger password.", { password: problem });
  if (await em.count(UserSchema, { email })) throw invalid("That e-mail already has an account.", { email: "That e-mail already has an account: sign in instead." });
  const user = em.create(UserSchema, { email, name: input.name.trim(), passwordHash: await hashPassword(input.password), role: "member" });
  try {
    await em.flush();
  } catch (e) {
    if (e instanceof UniqueConstraintViolationException) throw invalid("That e-mail already has an account.", { email: "That e-mail already has an account: sign in instead." });
    throw e;
  }
  return accountView(user);
}

export async function listAccounts(em: EntityManager): Promise<AccountView[]> {
  const rows = await em.find(UserSchema, {}, { orderBy: { createdAt: "asc" }, limit: 1000 });
  return rows.map(accountView);
}

export async function setRole(em: EntityManager, admin: User, userId: string, role: AccountRole): Promise<AccountView> {
  const user = await em.findOne(UserSchema, { id: userId });
  if (!user) throw notFound("That account");
  if (user.id === admin.id && role !== "admin") throw invalid("You cannot remove your own administrator role.", { role: "Ask another administrator to change your role." });
  user.role = role;
  await em.flush();
  return accountView(user);
}
