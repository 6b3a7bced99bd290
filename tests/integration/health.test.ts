/** GET /api/health for load balancers: no session, no secrets, the database and migrations named. */
import { describe, it, expect } from "vitest";
import { BASE_URL, hasServer } from "./helpers/client";

describe.skipIf(!hasServer)("health check", () => {
  it("answers 200 with the database up and migrations current, to anyone, never cached", async () => {
    const r = await fetch(`${BASE_URL}/api/health`);
    expect(r.status).toBe(200);
    expect(await r.json()).toEqual({ ok: true, db: "up", migrations: "current" });
    expect(r.headers.get("cache-control")).toMatch(/no-store/);
    expect(r.headers.get("set-cookie")).toBeNull();
  });

  it("answers only GET", async () => {
    const r = await fetch(`${BASE_URL}/api/health`, { method: "POST", headers: { "content-type": "application/json", origin: BASE_URL }, body: "{}" });
    expect(r.status).toBe(405);
  });
});
