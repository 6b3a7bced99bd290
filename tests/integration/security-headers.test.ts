/** Security headers on a page and on API answers, read from the running production build. */
import { describe, it, expect } from "vitest";
import { BASE_URL, hasServer } from "./helpers/client";

const get = (path: string, init: RequestInit = {}) => fetch(BASE_URL + path, { redirect: "manual", ...init });

function directives(csp: string | null): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const part of (csp ?? "").split(";")) {
    const [name, ...values] = part.trim().split(/\s+/);
    if (name) out.set(name, values);
  }
  return out;
}

function expectCommon(h: Headers) {
  expect(h.get("x-content-type-options")).toBe("nosniff");
  expect(h.get("x-frame-options")).toBe("DENY");
  expect(["same-origin", "strict-origin-when-cross-origin", "no-referrer", "strict-origin"]).toContain(h.get("referrer-policy"));
  const pp = h.get("permissions-policy") ?? "";
  for (const off of ["camera=()", "microphone=()", "geolocation=()", "payment=()", "usb=()"]) expect(pp).toContain(off);
  expect(pp).toContain("screen-wake-lock=(self)");
}

describe.skipIf(!hasServer)("security headers", () => {
  it("a page: a nonce policy that runs only its own scripts, cannot be framed, and a fresh nonce per answer", async () => {
    const a = await get("/");
    expect(a.status).toBe(200);
    expectCommon(a.headers);
    const csp = directives(a.headers.get("content-security-policy"));
    const script = csp.get("script-src") ?? [];
    expect(script).toContain("'strict-dynamic'");
    expect(script.some((s) => /^'nonce-[A-Za-z0-9+/=]{16,}'$/.test(s))).toBe(true);
    expect(script).not.toContain("'unsafe-inline'");
    expect(script).not.toContain("'unsafe-eval'");
    expect(csp.get("frame-ancestors")).toEqual(["'none'"]);
    expect(csp.get("object-src")).toEqual(["'none'"]);
    expect(csp.get("base-uri")).toEqual(["'self'"]);
    expect(csp.get("default-src")).toEqual(["'self'"]);
    // Next puts the nonce on its own inline scripts.
    const html = await a.text();
    const nonce = script.find((s) => s.startsWith("'nonce-"))!.slice(7, -1);
    expect(html).toContain(`nonce="${nonce}"`);
    const b = await get("/");
    expect(b.headers.get("content-security-policy")).not.toBe(a.headers.get("content-security-policy"));
  });

  it("the sign-in redirect of a signed-in page still works and carries the headers", async () => {
    const r = await get("/plans");
    expect(r.status).toBe(307);
    expect(r.headers.get("location")).toContain("/signin?callbackUrl=%2Fplans");
    expectCommon(r.headers);
  });

  it("an API answer (success and error): a policy that lets nothing load or run", async () => {
    for (const path of ["/api/v1/schema/plan", "/api/v1/plans"]) {
      const r = await get(path);
      expectCommon(r.headers);
      const csp = directives(r.headers.get("content-security-policy"));
      expect(csp.get("default-src")).toEqual(["'none'"]);
      expect(csp.get("frame-ancestors")).toEqual(["'none'"]);
      expect(csp.has("script-src")).toBe(false);
    }
  });
});
