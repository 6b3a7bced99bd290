import type { EntityManager } from "@mikro-orm/postgresql";
import { UniqueConstraintViolationException } from "@mikro-orm/core";
import { z } from "zod";
import { ACCOUNT_ROLES, UserSchema, type AccountRole, type User } from "@/entities/User";
import { invalid, notFound, tooMany } from "../errors";
import { checkPassword, hashPassword, passwordProblem } from "../passwords";
import { recordFailure, signInGate } from "../rate-limit";
import { endSessions, forgetState } from "../session-state";

export interface AccountView {
  id: string;
  email: string;
  name: string;
  role: AccountRole;
  createdAt: string;
  emailVerified: boolean;
  disabled: boolean;
}

export const accountView = (u: User): AccountView => ({ id: u.id, email: u.email, name: u.name, role: u.role, createdAt: u.createdAt.toISOString(), emailVerified: !!u.emailVerifiedAt, disabled: !!u.disabledAt });

/** An administrator's change to an account: its role, and/or disabled (true ends its sessions and refuses sign-in). */
export const adminAccountBody = z
  .object({ role: z.enum(ACCOUNT_ROLES).optional(), disabled: z.boolean().optional() })
  .refine((b) => b.role !== undefined || b.disabled !== undefined, { message: "Give a role or disabled.", path: ["role"] });

/** A signed-in account changing its own password: the current one proves it is the owner. */
export const passwordChangeBody = z.object({
  currentPassword: z.string().min(1, "Enter your current password.").max(200),
  newPassword: z.string().min(1, "Choose a new password.").max(200),
});

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

/** An administrator changes an account's role or disables it (every session of it ends) or enables it again. */
export async function changeAccount(em: EntityManager, admin: User, userId: string, input: z.infer<typeof adminAccountBody>): Promise<AccountView> {
  const user = await em.findOne(UserSchema, { id: userId });
  if (!user) throw notFound("That account");
  if (user.id === admin.id && input.role !== undefined && input.role !== "admin") throw invalid("You cannot remove your own administrator role.", { role: "Ask another administrator to change your role." });
  if (user.id === admin.id && input.disabled) throw invalid("You cannot disable your own account.", { disabled: "Ask another administrator to do this." });
  if (input.role !== undefined) user.role = input.role;
  const disabling = input.disabled === true && !user.disabledAt;
  if (input.disabled !== undefined) user.disabledAt = input.disabled ? (user.disabledAt ?? new Date()) : null;
  await em.flush();
  // Open sessions read the role and the disabled mark from the account: no instance may serve an old copy.
  forgetState(user.id);
  if (disabling) await endSessions(em, user.id);
  return accountView(user);
}

/**
 * Changes the signed-in account's password after checking the current one, and ends every session
 * of the account; answers the new session version so the caller's own browser can stay signed in.
 */
export async function changePassword(em: EntityManager, user: User, input: z.infer<typeof passwordChangeBody>, address: string): Promise<number> {
  const row = await em.findOneOrFail(UserSchema, { id: user.id }, { populate: ["passwordHash"] });
  // Guessing the current password here counts like failed sign-ins (a borrowed session must not make it cheaper).
  const gate = await signInGate(em, row.email, address);
  if (gate.kind !== "open") throw tooMany(`Several wrong passwords were tried. Wait ${gate.seconds} seconds and try again.`);
  if (!(await checkPassword(input.currentPassword, row.passwordHash))) {
    await recordFailure(em, row.email, address);
    throw invalid("Your current password is not right.", { currentPassword: "That is not your current password." });
  }
  const problem = passwordProblem(input.newPassword, row.email);
  if (problem) throw invalid("Choose a stronger password.", { newPassword: problem });
  if (input.newPassword === input.currentPassword) throw invalid("Choose a password you have not been using.", { newPassword: "That is your current password." });
  row.passwordHash = await hashPassword(input.newPassword);
  await em.flush();
  return endSessions(em, row.id);
}
