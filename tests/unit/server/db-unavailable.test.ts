/**
 * Which errors mean "PostgreSQL is not there right now" (answered 503 with Retry-After) rather
 * than a bug (500) or bad input: SQLSTATE class 08 and 57P01-57P03 (PostgreSQL documentation,
 * Appendix A "PostgreSQL Error Codes"), the socket errors of a refused or dropped connection, and the
 * pool's own timeouts, looked for through the ORM's wrappers.
 */
import { describe, it, expect } from "vitest";
import { databaseUnavailable } from "@/lib/server/db-unavailable";

const withCode = (code: string, message = "x") => Object.assign(new Error(message), { code });

describe("databaseUnavailable", () => {
  it("recognises a crashed, restarting or unreachable server", () => {
    for (const code of ["57P01", "57P02", "57P03", "08006", "08001", "53300", "ECONNREFUSED", "ECONNRESET"]) {
      expect(databaseUnavailable(withCode(code)), code).toBe(true);
    }
    expect(databaseUnavailable(new Error("Connection terminated unexpectedly"))).toBe(true);
    expect(databaseUnavailable(new Error("Knex: Timeout acquiring a connection. The pool is probably full."))).toBe(true);
  });

  it("looks through the ORM's wrappers and aggregate errors", () => {
    const driver = Object.assign(new Error("update plan set ... - connect ECONNREFUSED"), { previous: withCode("ECONNREFUSED") });
    expect(databaseUnavailable(driver)).toBe(true);
    expect(databaseUnavailable(new Error("outer", { cause: withCode("57P01") }))).toBe(true);
    expect(databaseUnavailable(new AggregateError([new Error("a"), withCode("ECONNREFUSED")]))).toBe(true);
  });

  it("leaves query errors and bugs alone", () => {
    for (const code of ["23505", "42601", "22P02", "40001"]) expect(databaseUnavailable(withCode(code)), code).toBe(false);
    expect(databaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
    for (const v of [null, undefined, "ECONNREFUSED", 503, {}]) expect(databaseUnavailable(v)).toBe(false);
  });

  it("stops on a wrapper that refers to itself", () => {
    const loop: Error & { cause?: unknown } = new Error("loop");
    loop.cause = loop;
    expect(databaseUnavailable(loop)).toBe(false);
  });
});
