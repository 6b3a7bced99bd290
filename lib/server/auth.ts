import "server-only";
import type { AuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import type { AccountRole } from "@/entities/User";
import { clientAddress } from "./client-address";
import { requestEm } from "./db";
import { env } from "./env";
import { accountState, endSessions, isLive } from "./session-state";
import { SESSION_MAX_AGE_S } from "./session-token";
import { passwordSignIn } from "./sign-in";

const credentials = z.object({ email: z.string().trim().toLowerCase().email().max(254), password: z.string().min(1).max(200) });

/**
 * Error codes the sign-in step answers with (next-auth puts them in the answer's ?error=); the
 * route in app/api/auth maps them to statuses. Never an internal message: it would reach the URL.
 */
export const SIGN_IN_CODES = { wait: "wait_", capped: "too_many_attempts", disabled: "account_disabled", unavailable: "unavailable" } as const;

/** Thrown by the jwt callback when a cookie's session was ended; next-auth then clears the cookie. */
const SESSION_ENDED = "session_ended";

class SignInRefused extends Error {}

function headerBag(headers: unknown): Headers {
  const h = new Headers();
  if (headers && typeof headers === "object") for (const [k, v] of Object.entries(headers as Record<string, unknown>)) if (typeof v === "string") h.set(k, v);
  return h;
}

async function authorize(raw: unknown, headers: unknown) {
  const parsed = credentials.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  try {
    const em = await requestEm();
    const r = await passwordSignIn(em, email, password, clientAddress(headerBag(headers)));
    switch (r.kind) {
      case "ok":
        return { id: r.user.id, email: r.user.email, name: r.user.name, role: r.user.role, sessionVersion: r.user.sessionVersion };
      case "wrong":
        return null;
      case "wait":
        throw new SignInRefused(`${SIGN_IN_CODES.wait}${r.seconds}`);
      case "address_capped":
        throw new SignInRefused(SIGN_IN_CODES.capped);
      case "disabled":
        throw new SignInRefused(SIGN_IN_CODES.disabled);
    }
  } catch (e) {
    if (e instanceof SignInRefused) throw e;
    console.error("sign-in could not be checked:", e instanceof Error ? e.name : "unknown error");
    throw new SignInRefused(SIGN_IN_CODES.unavailable);
  }
}

/** Sign-in by e-mail and password; JWT sessions carry the account id, role and session version. */
export function authOptions(): AuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_S },
    pages: { signIn: "/signin" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        authorize: (raw, req) => authorize(raw, req?.headers),
      }),
    ],
    callbacks: {
      async jwt({ token, user }) {
        if (user) {
          const u = user as { id: string; role?: AccountRole; sessionVersion?: number };
          token.uid = u.id;
          token.role = u.role ?? "member";
          token.sv = u.sessionVersion;
          return token;
        }
        // Every later read of the cookie (the session endpoint) checks the account again.
        const uid = typeof token.uid === "string" ? token.uid : null;
        const state = uid ? await accountState(await requestEm(), uid) : null;
        if (!uid || !state || !isLive({ uid, sv: typeof token.sv === "number" ? token.sv : undefined }, state)) throw new Error(SESSION_ENDED);
        token.role = state.role;
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
    events: {
      /** Signing out ends every session of the account, not only this browser's cookie. */
      async signOut({ token }) {
        const uid = typeof token?.uid === "string" ? token.uid : null;
        if (!uid) return;
        const em = await requestEm();
        const state = await accountState(em, uid, { fresh: true });
        if (isLive({ uid, sv: typeof token.sv === "number" ? token.sv : undefined }, state)) await endSessions(em, uid);
      },
    },
    logger: {
      error(code, metadata) {
        const m = metadata as { message?: unknown; error?: { message?: unknown } } | undefined;
        const message = typeof m?.message === "string" ? m.message : typeof m?.error?.message === "string" ? m.error.message : "";
        // An ended session is an expected answer, not a fault.
        if (code === "JWT_SESSION_ERROR" && message === SESSION_ENDED) return;
        console.error(`auth: ${code}${message ? `: ${message.slice(0, 200)}` : ""}`);
      },
      warn(code) {
        console.warn(`auth: ${code}`);
      },
      debug() {},
    },
  };
}
