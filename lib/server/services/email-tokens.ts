import type { EntityManager } from "@mikro-orm/postgresql";
import { EmailTokenSchema, type EmailToken } from "@/entities/EmailToken";
import { UserSchema, type User } from "@/entities/User";
import { invalid, notFound, tooMany } from "../errors";
import { resetMessage, verifyMessage } from "../mail/templates";
import { hashPassword, passwordProblem } from "../passwords";
import { endSessions } from "../session-state";
import { appLink, sendMail } from "./mail";
import { hashToken, newToken, tokenShape } from "./tokens";

export const RESET_MINUTES = 60;
export const VERIFY_HOURS = 48;
/** Messages of one purpose an account may be sent per hour. */
const MAX_PER_HOUR = 5;

async function issue(em: EntityManager, user: User, purpose: EmailToken["purpose"], lifetimeMs: number): Promise<string | null> {
  const since = new Date(Date.now() - 3_600_000);
  if ((await em.count(EmailTokenSchema, { user: user.id, purpose, createdAt: { $gte: since } })) >= MAX_PER_HOUR) return null;
  const { token, hash } = newToken();
  em.create(EmailTokenSchema, { user, purpose, tokenHash: hash, expiresAt: new Date(Date.now() + lifetimeMs) });
  return token;
}

/**
 * Sends a reset link when the address has an account. The answer is the same either way, so the
 * endpoint does not reveal who has an account; past the hourly limit nothing more is sent.
 */
export async function requestReset(em: EntityManager, email: string): Promise<void> {
  const user = await em.findOne(UserSchema, { email: email.trim().toLowerCase() });
  if (!user) return;
  const token = await issue(em, user, "reset", RESET_MINUTES * 60_000);
  if (!token) return;
  await sendMail(user.email, resetMessage({ name: user.name, url: appLink(`/reset/${token}`), expiresMinutes: RESET_MINUTES }));
  await em.flush();
}

async function usable(em: EntityManager, token: string, purpose: EmailToken["purpose"]): Promise<EmailToken> {
  const gone = () => notFound(purpose === "reset" ? "That password link (it may have been used or expired)" : "That confirmation link (it may have expired)");
  if (!tokenShape.test(token)) throw gone();
  const row = await em.findOne(EmailTokenSchema, { tokenHash: hashToken(token), purpose }, { populate: ["user"] });
  if (!row || row.usedAt || row.expiresAt <= new Date()) throw gone();
  return row;
}

/** Whether a reset link can still be used (for the reset page). */
export async function checkResetToken(em: EntityManager, token: string): Promise<{ email: string }> {
  const row = await usable(em, token, "reset");
  return { email: row.user.email };
}

/** Sets the new password, spends every open reset link of the account and ends all its sessions. */
export async function confirmReset(em: EntityManager, token: string, password: string): Promise<void> {
  const row = await usable(em, token, "reset");
  const problem = passwordProblem(password, row.user.email);
  if (problem) throw invalid("Choose a stronger password.", { password: problem });
  const user = await em.findOneOrFail(UserSchema, { id: row.user.id }, { populate: ["passwordHash"] });
  user.passwordHash = await hashPassword(password);
  // Following the link proves the address too.
  user.emailVerifiedAt ??= new Date();
  const now = new Date();
  await em.nativeUpdate(EmailTokenSchema, { user: user.id, purpose: "reset", usedAt: null }, { usedAt: now });
  row.usedAt = now;
  await em.flush();
  await endSessions(em, user.id);
}

/** Sends an address-confirmation link to the signed-in account (nothing when already confirmed). */
export async function requestVerify(em: EntityManager, user: User): Promise<{ sent: boolean; verified: boolean }> {
  if (user.emailVerifiedAt) return { sent: false, verified: true };
  const token = await issue(em, user, "verify", VERIFY_HOURS * 3_600_000);
  if (!token) throw tooMany("Several confirmation messages were sent in the last hour. Check your inbox, or try again later.");
  await sendMail(user.email, verifyMessage({ name: user.name, url: appLink(`/verify/${token}`), expiresHours: VERIFY_HOURS }));
  await em.flush();
  return { sent: true, verified: false };
}

/** Marks the address confirmed. */
export async function confirmVerify(em: EntityManager, token: string): Promise<{ email: string }> {
  const row = await usable(em, token, "verify");
  const user = await em.findOneOrFail(UserSchema, { id: row.user.id });
  user.emailVerifiedAt ??= new Date();
  row.usedAt = new Date();
  await em.flush();
  return { email: user.email };
}
