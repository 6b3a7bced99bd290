/**
 * PostgreSQL killed with SIGKILL in the middle of saves, brought back by the supervisor that
 * scripts/test.sh (like npm start) runs it under: every acknowledged save is there afterwards, and
 * the app answers again without anyone restarting it. It kills the database, so test.sh runs it on
 * its own after the other vitest files (BW_FAULT_TEST=1), only on a server that run started.
 */
import { describe, it, expect, afterAll } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import pg from "pg";
import { BASE_URL, Client, DEMO, DEMO_PASSWORD, hasServer, newMember } from "./helpers/client";

const PG_DATA = process.env.BW_PG_DATA ?? "";
const enabled = hasServer && process.env.BW_FAULT_TEST === "1" && PG_DATA !== "" && !!process.env.DATABASE_URL;

const PLANS = 4;
/** Saves keep going this long after the database answers again. */
const AFTER_RECOVERY_MS = 2_000;
/** The whole outage, kill to healthy again, must fit in this (the supervisor restarts after 0.5 s). */
const RECOVERY_LIMIT_MS = 30_000;

const doc = (wallMm: number) => ({
  schemaVersion: 1,
  room: { walls: [{ id: "a", lengthMm: wallMm }, { id: "b", lengthMm: 5000 }, { id: "c", lengthMm: wallMm }, { id: "d", lengthMm: 5000 }] },
});
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const postmasterPid = () => Number(readFileSync(join(PG_DATA, "postmaster.pid"), "utf8").split("\n")[0]);

async function health(): Promise<{ status: number; body: { ok?: boolean; db?: string } | null }> {
  try {
    const r = await fetch(`${BASE_URL}/api/health`, { signal: AbortSignal.timeout(5_000) });
    return { status: r.status, body: (await r.json().catch(() => null)) as { ok?: boolean; db?: string } | null };
  } catch {
    return { status: 0, body: null };
  }
}

/** One sign-in through the form, answering only its status (401 is "wrong e-mail or password"). */
async function signInStatus(): Promise<number> {
  const c = new Client();
  const csrf = await c.get<{ csrfToken: string }>("/api/auth/csrf");
  const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email: DEMO.member, password: DEMO_PASSWORD, json: "true" });
  const r = await c.raw("/api/auth/callback/credentials", { method: "POST", body: form, headers: { "content-type": "application/x-www-form-urlencoded" } });
  return r.status;
}

interface Acked {
  version: number;
  wallMm: number;
}

/** Saves one plan over and over; records every save the server acknowledged (200) with what it held. */
async function saveLoop(c: Client, id: string, seed: number, until: () => boolean, acked: Acked[], statuses: Map<number, number>) {
  let version = 1;
  let n = 0;
  while (!until()) {
    const wallMm = 3000 + seed * 10_000 + ++n;
    let status = 0;
    try {
      const r = await c.put(`/api/v1/plans/${id}`, { document: doc(wallMm), version });
      status = r.status;
      if (r.status === 200) {
        version = r.body.plan.version;
        acked.push({ version, wallMm });
      } else if (r.status === 409) {
        // An earlier save went through although its answer was lost: carry on from the stored version.
        version = r.body.error.currentVersion;
      }
    } catch {
      /* the request itself failed: the app is still there, so this should not happen; counted as 0 */
    }
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
    if (status !== 200) await sleep(100);
  }
}

describe.skipIf(!enabled)("PostgreSQL killed during saves (SIGKILL), restarted by the supervisor", () => {
  const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
  db.on("error", () => undefined); // it dies with the server on purpose
  afterAll(async () => {
    await db.end().catch(() => undefined);
  });

  it("health answers 503 naming pending migrations while one is not applied", async () => {
    await db.connect();
    const last = await db.query<{ id: number; name: string }>("select id, name from mikro_orm_migrations order by id desc limit 1");
    const row = last.rows[0]!;
    await db.query("delete from mikro_orm_migrations where id = $1", [row.id]);
    try {
      const h = await health();
      expect(h.status).toBe(503);
      expect(h.body).toEqual({ ok: false, db: "up", migrations: "pending" });
    } finally {
      await db.query("insert into mikro_orm_migrations (id, name) values ($1, $2)", [row.id, row.name]);
    }
    expect((await health()).status).toBe(200);
  });

  it("keeps every acknowledged save, answers 503 (not a wrong password) while down, and recovers by itself", { timeout: 90_000 }, async () => {
    const { client } = await newMember("fault");
    const ids: string[] = [];
    for (let i = 0; i < PLANS; i++) {
      const r = await client.post("/api/v1/plans", { name: `Fault ${i}`, document: doc(3000) });
      expect(r.status).toBe(201);
      ids.push(r.body.plan.id);
    }
    expect((await health()).status).toBe(200);

    let done = false;
    const acked = ids.map(() => [] as Acked[]);
    const statuses = new Map<number, number>();
    const loops = ids.map((id, i) => saveLoop(client, id, i, () => done, acked[i]!, statuses));

    await sleep(1_500);
    const before = acked.reduce((s, a) => s + a.length, 0);
    expect(before).toBeGreaterThan(0);
    const oldPid = postmasterPid();
    process.kill(oldPid, "SIGKILL");
    const killedAt = Date.now();

    // While it is down: sign-in says "try again" (503), never "wrong password" (401); health says 503.
    const signIns: number[] = [];
    const healthDown: number[] = [];
    let healthy = false;
    while (!healthy && Date.now() - killedAt < RECOVERY_LIMIT_MS) {
      const [s, h] = await Promise.all([signInStatus(), health()]);
      signIns.push(s);
      if (h.status !== 200) healthDown.push(h.status);
      healthy = h.status === 200 && h.body?.ok === true;
      if (!healthy) await sleep(200);
    }
    const outageMs = Date.now() - killedAt;
    expect(healthy, `the app did not answer healthy within ${RECOVERY_LIMIT_MS / 1000} s of the kill`).toBe(true);
    expect(healthDown.length, "health never reported the outage").toBeGreaterThan(0);
    expect(healthDown.every((s) => s === 503)).toBe(true);
    expect(signIns).not.toContain(401);
    expect(signIns).toContain(503);

    // The supervisor started a new postmaster.
    expect(postmasterPid()).not.toBe(oldPid);

    const ackedAtRecovery = acked.reduce((s, a) => s + a.length, 0);
    await sleep(AFTER_RECOVERY_MS);
    done = true;
    await Promise.all(loops);
    const total = acked.reduce((s, a) => s + a.length, 0);
    // Saves go through again after the restart, without restarting the app.
    expect(total).toBeGreaterThan(ackedAtRecovery);
    // Nothing but success, a stale version after a lost answer, or "try again" (503 with
    // Retry-After): never a 500 ("something broke") nor a 4xx for good input.
    for (const s of statuses.keys()) expect([200, 409, 503], JSON.stringify(Object.fromEntries(statuses))).toContain(s);

    // Every acknowledged save is in the database: the current document, or the revision it became.
    // (A fresh connection: the one from before the kill died with the server.)
    const after = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await after.connect();
    for (let i = 0; i < PLANS; i++) {
      const cur = await after.query<{ version: number; wall: string }>(`select version, document->'room'->'walls'->0->>'lengthMm' as wall from plan where id = $1`, [ids[i]]);
      const revs = await after.query<{ version: number; wall: string }>(`select version, document->'room'->'walls'->0->>'lengthMm' as wall from plan_revision where plan_id = $1`, [ids[i]]);
      const stored = new Map<number, number>([[cur.rows[0]!.version, Number(cur.rows[0]!.wall)], ...revs.rows.map((r) => [r.version, Number(r.wall)] as [number, number])]);
      for (const a of acked[i]!) expect(stored.get(a.version), `plan ${i} version ${a.version}`).toBe(a.wallMm);
    }
    await after.end();
    console.log(`fault test: ${total} acknowledged saves (${before} before the kill), healthy again ${(outageMs / 1000).toFixed(1)} s after the kill; answers ${JSON.stringify(Object.fromEntries(statuses))}`);
  });
});
