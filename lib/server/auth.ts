import "server-only";
import type { AuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { UserSchema, type AccountRole } from "@/entities/User";
import { requestEm } from "./db";
import { env } from "./env";
import { checkPassword } from "./passwords";
import { attemptKeys, clearAccount, isLimited, recordFailure } from "./rate-limit";

const credentials = z.object({ email: z.string().trim().toLowerCase().email(), password: z.string().min(1).max(200) });

function clientIp(headers: Record<string, unknown> | undefined): string {
  const fwd = headers?.["x-forwarded-for"];
  const first = typeof fwd === "string" ? fwd.split(",")[0]?.trim() : undefined;
  return first || (typeof headers?.["x-real-ip"] === "string" ? (headers["x-real-ip"] as string) : "local");
}

/** Sign-in by e-mail and password; JWT sessions carry the account id and role. */
export function authOptions(): AuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: 30 * 24 * 3600 },
    pages: { signIn: "/signin" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(raw, req) {
          const parsed = credentials.safeParse(raw);
          if (!parsed.success) return null;
          const { email, password } = parsed.data;
          const em = await requestEm();
          const keys = attemptKeys(email, clientIp(req?.headers as Record<string, unknown> | undefined));
          if (await isLimited(em, keys)) throw new Error("too_many_attempts");
          const user = await em.findOne(UserSchema, { email }, { populate: ["passwordHash"] });
          const ok = user ? await checkPassword(password, user.passwordHash) : false;
          if (!user || !ok) {
            await recordFailure(em, keys);
            return null;
          }
          await clearAccount(em, email);
          return { id: user.id, email: user.email, name: user.name, role: user.role };
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.uid = user.id;
          token.role = (user as { role?: AccountRole }).role ?? "member";
        }
        return token;
      },
      session({ session, token }) {
        if (session.user) {
          session.user.id = token.uid as string;
          session.user.role = (token.role as AccountRole) ?? "member";
        }
        return session;
      },
    },
  };
}
