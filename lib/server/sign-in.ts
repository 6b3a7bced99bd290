import type { EntityManager } from "@mikro-orm/postgresql";
import { UserSchema, type User } from "@/entities/User";
import { verifyPassword } from "./passwords";
import { clearPair, recordFailure, signInGate } from "./rate-limit";

export type SignInOutcome =
  | { kind: "ok"; user: User }
  | { kind: "wrong" }
  | { kind: "disabled" }
  | { kind: "wait"; seconds: number }
  | { kind: "address_capped"; seconds: number };

/**
 * One password sign-in from `address`. Known and unknown e-mails do the same work (one account
 * read, one bcrypt compare at the stored cost, one failure recorded), so neither the answer nor its
 * timing says whether an account exists. A disabled account is only reported to someone who gave
 * its right password.
 */
export async function passwordSignIn(em: EntityManager, email: string, password: string, address: string): Promise<SignInOutcome> {
  const gate = await signInGate(em, email, address);
  if (gate.kind !== "open") return gate;
  const user = await em.findOne(UserSchema, { email }, { populate: ["passwordHash"] });
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!user || !ok) {
    await recordFailure(em, email, address);
    return { kind: "wrong" };
  }
  await clearPair(em, email, address);
  if (user.disabledAt) return { kind: "disabled" };
  return { kind: "ok", user };
}
