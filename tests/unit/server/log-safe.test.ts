import { describe, expect, it } from "vitest";
import { describeError, scrubMessage } from "@/lib/server/log-safe";

const HASH = "$2b$12$abcdefghijklmnopqrstuuABCDEFGHIJKLMNOPQRSTUVWXYZ01234";

/** The shape a database driver error reaches us in: the statement with its values, then the database's message. */
function driverError() {
  const e = new Error(
    `insert into "user" ("id", "email", "password_hash") values ('3f1c9a7e-0d2b-4c1e-9a55-1b2c3d4e5f60', 'robin@example.test', '${HASH}') - duplicate key value violates unique constraint "user_email_unique"`,
  ) as Error & Record<string, unknown>;
  class UniqueConstraintViolationException extends Error {}
  const wrapped = Object.assign(new UniqueConstraintViolationException(e.message), { code: "23505", constraint: "user_email_unique", table: "user", detail: "Key (email)=(robin@example.test) already exists." });
  wrapped.stack = `UniqueConstraintViolationException: ${e.message}\n    at insert (driver.js:1:1)\n    at flush (orm.js:2:2)`;
  return wrapped;
}

describe("what of an error reaches the log", () => {
  it("keeps the class, SQLSTATE, constraint and the database's sentence; drops the statement and its values", () => {
    const d = describeError(driverError());
    expect(d).toMatchObject({ class: "UniqueConstraintViolationException", code: "23505", constraint: "user_email_unique", table: "user" });
    expect(d.message).toBe('duplicate key value violates unique constraint "user_email_unique"');
    const all = JSON.stringify(d);
    expect(all).not.toContain("$2b$");
    expect(all).not.toContain("robin@example.test");
    expect(all).not.toContain("insert into");
    expect(d.stack).toBe("    at insert (driver.js:1:1)\n    at flush (orm.js:2:2)");
  });

  it("masks quoted literals, hashes and long tokens in any message", () => {
    expect(scrubMessage(`bad value '${"x".repeat(5)}' near ${HASH}`)).toBe("bad value '?' near [hash]");
    expect(scrubMessage("token AbCdEfGhIjKlMnOpQrStUvWxYz0123456789_- refused")).toBe("token [masked] refused");
    expect(scrubMessage("select 1 from t where a = 'secret'")).toBe("(statement omitted)");
    expect(scrubMessage("y".repeat(2000)).length).toBeLessThan(600);
  });

  it("describes values that are not errors without printing them", () => {
    expect(describeError({ password: "hunter2" })).toEqual({ class: "object", message: "a non-error value was thrown" });
  });
});

describe("pino redaction of secret keys", () => {
  it("censors passwords, hashes, tokens, cookies and authorization at the first three levels", async () => {
    const { default: pino } = await import("pino");
    const { REDACT_PATHS } = await import("@/lib/server/log-safe");
    const lines: string[] = [];
    const logger = pino({ redact: { paths: REDACT_PATHS, censor: "[redacted]" } }, { write: (s: string) => void lines.push(s) });
    logger.info(
      {
        password: "hunter2-pine",
        user: { email: "robin@example.test", passwordHash: HASH },
        req: { headers: { cookie: "next-auth.session-token=abc", authorization: "Bearer xyz", "set-cookie": "a=b" } },
        body: { token: "tok-123", currentPassword: "old-one", newPassword: "new-one" },
        fine: "kept",
      },
      "a line",
    );
    const out = JSON.parse(lines[0]) as Record<string, any>;
    expect(out.password).toBe("[redacted]");
    expect(out.user).toEqual({ email: "robin@example.test", passwordHash: "[redacted]" });
    expect(out.req.headers).toEqual({ cookie: "[redacted]", authorization: "[redacted]", "set-cookie": "[redacted]" });
    expect(out.body).toEqual({ token: "[redacted]", currentPassword: "[redacted]", newPassword: "[redacted]" });
    expect(out.fine).toBe("kept");
    expect(lines[0]).not.toContain("hunter2");
    expect(lines[0]).not.toContain("$2b$");
  });
});
