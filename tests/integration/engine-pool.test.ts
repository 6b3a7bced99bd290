/**
 * Engine work runs in the server's worker pool: a plan over the time limit answers 503 while other
 * requests keep being served, a worker that runs out of memory answers 413 and is replaced, the
 * anonymous analyze endpoint is rate-limited by address, and the largest plan's answer stays bounded.
 * The misbehaving plans use the worker's test hooks, which only npm test's server has (BW_TEST_HOOKS=1).
 */
import { randomInt } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { PLAN_LIMITS } from "@/lib/engine/plan/limits";
import { BASE_URL, hasServer } from "./helpers/client";

/** The analyze answer's bound (lib/server/engine-pool/engine.ts MAX_ANALYSIS_BYTES). */
const MAX_ANALYSIS_BYTES = 2_000_000;

/** A documentation-range address of its own for each test, so their rate-limit windows never meet. */
const ownAddress = () => `2001:db8::${randomInt(1, 0xffff).toString(16)}:${randomInt(1, 0xffff).toString(16)}`;

function analyze(body: unknown, headers: Record<string, string> = {}, address = ownAddress()) {
  return fetch(`${BASE_URL}/api/v1/analyze`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-bw-test-client-address": address, ...headers },
    body: JSON.stringify(body),
  });
}

const small = () => newPlanDocument();

let hooksOn = false;

beforeAll(async () => {
  if (!hasServer) return;
  // With test hooks on, a spin past a 300 ms limit answers 503; without them the header is ignored.
  const probe = await analyze(small(), { "x-bw-test-hook": "spin", "x-bw-test-time-limit-ms": "300" });
  await probe.text();
  hooksOn = probe.status === 503;
  if (!hooksOn) console.warn("engine-pool.test.ts: the server has no test hooks (BW_TEST_HOOKS=1); the over-time and out-of-memory cases are skipped.");
}, 60_000);

describe.skipIf(!hasServer)("engine work in the worker pool", () => {
  it("answers 503 in words for a plan over the time limit, and serves other requests meanwhile", async (ctx) => {
    if (!hooksOn) ctx.skip();
    const order: string[] = [];
    const slow = analyze(small(), { "x-bw-test-hook": "spin", "x-bw-test-time-limit-ms": "6000" }).then(async (r) => {
      order.push("analyze");
      return { status: r.status, body: await r.json(), retryAfter: r.headers.get("retry-after") };
    });
    // Give the spin time to start in a worker, then ask for a route that needs no engine.
    await new Promise((r) => setTimeout(r, 500));
    const other = fetch(`${BASE_URL}/api/v1/schema/plan`).then(async (r) => {
      order.push("schema");
      return { status: r.status, body: await r.json() };
    });
    const [a, s] = await Promise.all([slow, other]);
    expect(s.status).toBe(200);
    expect(typeof s.body).toBe("object");
    expect(a.status).toBe(503);
    expect(a.body.error.code).toBe("too_slow");
    expect(a.body.error.message).toMatch(/^This plan takes too long to analyse on the server \(over 6 s\)/);
    expect(a.body.error.message).not.toMatch(/abort|worker|stack/i);
    // The schema route finished while the analysis still spun: the web thread never ran it.
    expect(order).toEqual(["schema", "analyze"]);
    // The pool answers the next analysis as usual.
    const next = await analyze(small());
    expect(next.status).toBe(200);
    expect((await next.json()).summary.fixtures).toBe(0);
  }, 60_000);

  it("answers 413 when a worker runs out of memory, and the next analysis is served", async (ctx) => {
    if (!hooksOn) ctx.skip();
    const r = await analyze(small(), { "x-bw-test-hook": "hog" });
    const body = await r.json();
    expect(r.status).toBe(413);
    expect(body.error.code).toBe("too_large");
    expect(body.error.message).toMatch(/more memory to analyse than the server gives one request/);
    const next = await analyze(small());
    expect(next.status).toBe(200);
  }, 120_000);

  it("limits anonymous analyses per address: 429 with Retry-After and a message past the allowance", async () => {
    // Windows are whole minutes of the clock: start early in one, so all 61 requests fall in it.
    const leftMs = 60_000 - (Date.now() % 60_000);
    if (leftMs < 20_000) await new Promise((r) => setTimeout(r, leftMs + 500));
    const address = ownAddress();
    const statuses: number[] = [];
    // Bodies that fail validation still count (the limit is checked before the body is read) and cost no engine time.
    for (let i = 0; i < 60; i++) {
      const r = await analyze({}, {}, address);
      await r.text();
      statuses.push(r.status);
    }
    expect(new Set(statuses)).toEqual(new Set([422]));
    const over = await analyze(small(), {}, address);
    const body = await over.json();
    expect(over.status).toBe(429);
    expect(body.error.code).toBe("too_many_requests");
    expect(body.error.message).toMatch(/^Too many analyses from your address: 60 a minute without signing in\. Try again in \d+ s/);
    const retry = Number(over.headers.get("retry-after"));
    expect(retry).toBeGreaterThanOrEqual(1);
    expect(retry).toBeLessThanOrEqual(60);
    // Another address is not held back by it.
    expect((await analyze(small())).status).toBe(200);
  }, 120_000);

  it(`keeps the answer for the largest plan (${PLAN_LIMITS.fixtures} cabinets stacked in one place) under the size bound`, async () => {
    const doc = { ...newPlanDocument(), fixtures: Array.from({ length: PLAN_LIMITS.fixtures }, (_, i) => ({ id: `f${i}`, kind: "base-cabinet", placement: { mode: "wall", wallId: "w3", offsetMm: 100 }, params: {} })) };
    const r = await analyze(doc);
    const text = await r.text();
    expect(r.status).toBe(200);
    expect(Buffer.byteLength(text)).toBeLessThanOrEqual(MAX_ANALYSIS_BYTES);
    const a = JSON.parse(text);
    expect(a.summary.fixtures).toBe(PLAN_LIMITS.fixtures);
    // Every pair of the stacked cabinets collides; the list is cut and says how much is left out.
    expect(a.summary.conflicts).toBeGreaterThan(40_000);
    expect(a.findings.length).toBeLessThanOrEqual(PLAN_LIMITS.analysisFindings);
    expect(a.findings.length + a.omittedFindings).toBeGreaterThan(40_000);
  }, 120_000);

  it("refuses an anonymous body over the anonymous cap with 413", async () => {
    const doc = { ...newPlanDocument(), name: "x".repeat(600_000) };
    const r = await analyze(doc);
    const body = await r.json();
    expect(r.status).toBe(413);
    expect(body.error.message).not.toMatch(/stack|internal/i);
  });
});
