/**
 * Load suite, over loopback against a running app (BW_BASE_URL, default http://127.0.0.1:3000;
 * skipped when none answers) and its PostgreSQL (DATABASE_URL, the app's own database):
 * autocannon drives GET plan, analyze of the demo plan and PUT saves on 50 plans with 50 requests
 * in flight, a few seconds each; beside them, a raw node-postgres loop does the same save
 * transaction (lock, revision, update) in a scratch schema of that database, in the same run.
 * The suite signs up its own account, creates its plans through the API and deletes the account
 * (with its plans and revisions) at the end. Goal: save p99 <= 100 ms at 50 in flight and at least
 * 25% of the raw baseline's throughput.
 */
import autocannon from "autocannon";
import pg from "pg";
import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import type { BenchTable } from "../bench";
import config from "../../mikro-orm.config";
import { demoPlan } from "../../lib/engine/demo/demo-plan";
import { parsePlan } from "../../lib/engine/plan/parse";
import { fmt } from "./timing";

export const order = 95;

const BASE = (process.env.BW_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const DATABASE_URL = process.env.DATABASE_URL ?? config.clientUrl ?? "";
/** The raw baseline uses as many connections as the app's pool. */
const POOL = Number(process.env.DB_POOL_MAX ?? config.pool?.max ?? 10);
const PLANS = 50;
const IN_FLIGHT = 50;
const SECONDS = Number(process.env.BW_BENCH_LOAD_SECONDS ?? 5);
const WARM_SECONDS = 2;
/** Analysis is engine work of a tenth of a second or more per request: fewer at once, so answers arrive within a run. */
const ANALYZE_IN_FLIGHT = 8;

/** Cookies and the Origin header a browser would send; write routes check both. */
class Session {
  private jar = new Map<string, string>();
  headers(extra: Record<string, string> = {}): Record<string, string> {
    const cookie = [...this.jar].map(([k, v]) => `${k}=${v}`).join("; ");
    return { origin: BASE, ...(cookie ? { cookie } : {}), ...extra };
  }
  async fetch(path: string, init: { method?: string; body?: string; type?: string } = {}): Promise<Response> {
    const res = await fetch(BASE + path, {
      method: init.method ?? "GET",
      body: init.body,
      headers: this.headers(init.body !== undefined ? { "content-type": init.type ?? "application/json" } : {}),
      redirect: "manual",
      signal: AbortSignal.timeout(30_000),
    });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const eq = pair.indexOf("=");
      this.jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
    }
    return res;
  }
  async json<T>(path: string, method: string, body?: unknown): Promise<T> {
    const res = await this.fetch(path, { method, body: body === undefined ? undefined : JSON.stringify(body) });
    if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${(await res.text()).slice(0, 300)}`);
    return (await res.json()) as T;
  }
}

async function reachable(): Promise<boolean> {
  try {
    return (await fetch(`${BASE}/api/auth/csrf`, { signal: AbortSignal.timeout(15_000) })).ok;
  } catch {
    return false;
  }
}

/** A fresh account, signed in through the credentials flow. */
async function signUp(): Promise<{ session: Session; email: string }> {
  const s = new Session();
  const email = `load-bench-${randomUUID().slice(0, 8)}@example.test`;
  const password = "Load-bench-walnut-2026!";
  await s.json("/api/v1/account", "POST", { name: "Load bench", email, password });
  const { csrfToken } = await s.json<{ csrfToken: string }>("/api/auth/csrf", "GET");
  const form = new URLSearchParams({ csrfToken, email, password, json: "true" }).toString();
  await s.fetch("/api/auth/callback/credentials", { method: "POST", body: form, type: "application/x-www-form-urlencoded" });
  const who = await s.json<{ user?: { id: string } }>("/api/auth/session", "GET");
  if (!who.user?.id) throw new Error("load bench: sign-in failed");
  return { session: s, email };
}

/**
 * CPU time the app's process has used, ms, when BW_BENCH_SERVER_PID names it (Linux /proc): on a
 * machine shared with other work, CPU per request is steadier than wall-clock throughput.
 */
function serverCpuMs(): number {
  const pid = process.env.BW_BENCH_SERVER_PID;
  if (!pid) return NaN;
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100;
  } catch {
    return NaN;
  }
}

interface Measured {
  ok: number;
  other: number;
  perSecond: number;
  p50: number;
  p99: number;
  /** The app's CPU time per answer, ms (NaN unless BW_BENCH_SERVER_PID is set). */
  cpuMs: number;
}

type Run = autocannon.Result & { serverCpuMs: number };

function fromAutocannon(r: Run): Measured {
  const ok = r["2xx"];
  const all = ok + r.non2xx;
  return { ok, other: r.non2xx + r.errors + r.timeouts, perSecond: ok / r.duration, p50: r.latency.p50, p99: r.latency.p99, cpuMs: r.serverCpuMs / Math.max(1, all) };
}

async function cannon(opts: Omit<autocannon.Options, "url">, seconds: number): Promise<Run> {
  const cpu0 = serverCpuMs();
  const r = await autocannon({ connections: IN_FLIGHT, pipelining: 1, timeout: 30, ...opts, url: BASE, duration: seconds });
  const cpu = serverCpuMs() - cpu0;
  if (process.env.BW_BENCH_DEBUG) process.stderr.write(`load: ${JSON.stringify(r.statusCodeStats)} errors=${r.errors} timeouts=${r.timeouts} server cpu/req=${(cpu / Math.max(1, r["2xx"])).toFixed(2)} ms\n`);
  return Object.assign(r, { serverCpuMs: cpu });
}

/** Saves with 50 in flight, each on a plan no other request holds, at the version its last answer gave. */
async function saveRun(session: Session, plans: Map<string, number>, docs: string[], seconds: number): Promise<Measured> {
  const free = [...plans.keys()];
  let turn = 0;
  const r = await cannon(
    {
      requests: [
        {
          method: "PUT",
          headers: session.headers({ "content-type": "application/json" }),
          setupRequest: (req, context) => {
            const id = free.pop();
            if (!id) throw new Error("load bench: more saves in flight than plans");
            (context as { planId?: string }).planId = id;
            const doc = docs[turn++ % docs.length];
            return { ...req, path: `/api/v1/plans/${id}`, body: `{"version":${plans.get(id)},"document":${doc}}` };
          },
          onResponse: (status, body, context) => {
            const id = (context as { planId: string }).planId;
            const answer = JSON.parse(body) as { plan?: { version: number }; error?: { currentVersion?: number } };
            const version = answer.plan?.version ?? answer.error?.currentVersion;
            if (version) plans.set(id, version);
            free.push(id);
          },
        },
      ],
    },
    seconds,
  );
  await resync(session, plans);
  return fromAutocannon(r);
}

/**
 * Saves still in flight when a run stops are cut off on our side but may land on the server: wait
 * until the versions stop moving, then take them from the plan list.
 */
async function resync(session: Session, plans: Map<string, number>): Promise<void> {
  let last = "";
  for (let i = 0; i < 50; i++) {
    await new Promise((r) => setTimeout(r, 200));
    const { plans: listed } = await session.json<{ plans: { id: string; version: number }[] }>("/api/v1/plans", "GET");
    const now = listed.map((p) => `${p.id}:${p.version}`).sort().join(",");
    for (const p of listed) if (plans.has(p.id)) plans.set(p.id, p.version);
    if (now === last) return;
    last = now;
  }
}

const pct = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))] ?? NaN;

/** The same save as one raw transaction per request: lock the row, copy it into a revision, update it. */
async function rawRun(pool: pg.Pool, schema: string, version: Map<string, number>, authorId: string, docs: string[], seconds: number): Promise<Measured> {
  const times: number[] = [];
  const until = performance.now() + seconds * 1000;
  let turn = 0;
  let other = 0;
  const worker = async (id: string) => {
    while (performance.now() < until) {
      const t0 = performance.now();
      const c = await pool.connect();
      try {
        await c.query("BEGIN");
        const row = await c.query(`SELECT version FROM ${schema}.plan WHERE id = $1 FOR UPDATE`, [id]);
        if (row.rows[0]?.version !== version.get(id)) throw new Error("raw baseline: version moved");
        await c.query(
          `INSERT INTO ${schema}.plan_revision (id, created_at, plan_id, version, name, document, author_id) SELECT $1, now(), id, version, name, document, $2 FROM ${schema}.plan WHERE id = $3`,
          [randomUUID(), authorId, id],
        );
        await c.query(`UPDATE ${schema}.plan SET document = $1, version = version + 1, updated_at = now() WHERE id = $2`, [docs[turn++ % docs.length], id]);
        await c.query("COMMIT");
        version.set(id, version.get(id)! + 1);
        times.push(performance.now() - t0);
      } catch {
        other++;
        await c.query("ROLLBACK").catch(() => undefined);
      } finally {
        c.release();
      }
    }
  };
  const t0 = performance.now();
  await Promise.all([...version.keys()].map(worker));
  const elapsed = (performance.now() - t0) / 1000;
  times.sort((a, b) => a - b);
  return { ok: times.length, other, perSecond: times.length / elapsed, p50: pct(times, 0.5), p99: pct(times, 0.99), cpuMs: NaN };
}

/** A scratch schema holding copies of the plan tables, with the bench account's plans in it. */
async function scratch(pool: pg.Pool, authorId: string, doc: string): Promise<{ schema: string; version: Map<string, number> }> {
  const schema = `bench_load_${process.pid}`;
  await pool.query(`CREATE SCHEMA ${schema}`);
  await pool.query(`CREATE TABLE ${schema}.plan (LIKE public.plan INCLUDING ALL)`);
  await pool.query(`CREATE TABLE ${schema}.plan_revision (LIKE public.plan_revision INCLUDING ALL)`);
  await pool.query(`ALTER TABLE ${schema}.plan_revision ADD FOREIGN KEY (plan_id) REFERENCES ${schema}.plan (id) ON DELETE CASCADE, ADD FOREIGN KEY (author_id) REFERENCES public.app_user (id) ON DELETE CASCADE`);
  const ids = Array.from({ length: PLANS }, () => randomUUID());
  for (const id of ids) {
    await pool.query(`INSERT INTO ${schema}.plan (id, created_at, owner_id, name, units, document, version, updated_at) VALUES ($1, now(), $2, 'Raw baseline', 'in', $3, 1, now())`, [id, authorId, doc]);
  }
  return { schema, version: new Map(ids.map((id) => [id, 1])) };
}

const row = (what: string, inFlight: number, m: Measured | undefined, note = ""): (string | number)[] =>
  m ? [what, inFlight, m.ok, m.other, Math.round(m.perSecond), fmt(m.p50), fmt(m.p99), Number.isNaN(m.cpuMs) ? "-" : fmt(m.cpuMs), note] : [what, inFlight, "-", "-", "-", "-", "-", "-", "not run"];

/** BW_BENCH_LOAD_ONLY=save,raw (any of get, analyze, save, raw) runs only those parts, for quick loops. */
const only = new Set((process.env.BW_BENCH_LOAD_ONLY ?? "get,analyze,save,raw").split(",").map((x) => x.trim()));

export async function run(): Promise<BenchTable[]> {
  const title = `Load: requests over loopback, ${SECONDS} s each`;
  const columns = ["request", "in flight", "answered 2xx", "other answers or errors", "per second", "p50 ms", "p99 ms", "app CPU ms per answer", "note"];
  if (!(await reachable())) return [{ title, note: `Skipped: no app answered at ${BASE} (start it with npm start, or set BW_BASE_URL and DATABASE_URL).`, columns, rows: [] }];

  const loadBefore = loadavg()[0];
  const { session, email } = await signUp();
  // The document as the editor holds it (defaults filled in), in two variants so saves alternate.
  const parsed = parsePlan(demoPlan());
  if (!parsed.ok) throw new Error("load bench: the demo plan does not validate");
  const demo = parsed.plan;
  const docs = [JSON.stringify(demo), JSON.stringify({ ...demo, room: { ...demo.room, ceilingHeightMm: demo.room.ceilingHeightMm + 10 } })];
  const plans = new Map<string, number>();
  for (let i = 0; i < PLANS; i++) {
    const created = await session.json<{ plan: { id: string; version: number } }>("/api/v1/plans", "POST", { name: `Load bench ${i + 1}`, document: demo });
    plans.set(created.plan.id, created.plan.version);
  }
  const ids = [...plans.keys()];
  const pool = new pg.Pool({ connectionString: DATABASE_URL, max: POOL });
  const authorId = (await pool.query<{ id: string }>("SELECT id FROM app_user WHERE email = $1", [email])).rows[0].id;
  const raw = await scratch(pool, authorId, docs[0]);
  try {
    let g = 0;
    const getPlan = (seconds: number) =>
      cannon({ requests: [{ method: "GET", headers: session.headers(), setupRequest: (req) => ({ ...req, path: `/api/v1/plans/${ids[g++ % ids.length]}` }) }] }, seconds);
    const analyzeBody = JSON.stringify(demo);
    const analyze = (seconds: number) =>
      cannon({ connections: ANALYZE_IN_FLIGHT, requests: [{ method: "POST", path: "/api/v1/analyze", headers: session.headers({ "content-type": "application/json" }), body: analyzeBody }] }, seconds);

    let saves: Measured | undefined;
    let base: Measured | undefined;
    let reads: Measured | undefined;
    let analyses: Measured | undefined;
    if (only.has("save")) {
      await saveRun(session, plans, docs, WARM_SECONDS);
      saves = await saveRun(session, plans, docs, SECONDS);
    }
    if (only.has("raw")) {
      await rawRun(pool, raw.schema, raw.version, authorId, docs, WARM_SECONDS);
      base = await rawRun(pool, raw.schema, raw.version, authorId, docs, SECONDS);
    }
    if (only.has("get")) {
      await getPlan(WARM_SECONDS);
      reads = fromAutocannon(await getPlan(SECONDS));
    }
    if (only.has("analyze")) {
      await analyze(WARM_SECONDS);
      analyses = fromAutocannon(await analyze(SECONDS));
    }

    const loadAfter = loadavg()[0];
    const share = saves && base ? saves.perSecond / base.perSecond : NaN;
    const goal = saves && saves.p99 <= 100 && share >= 0.25 ? "met" : "missed";
    return [
      {
        title,
        note:
          `Against ${BASE}, signed in as an account of the suite's own, with ${PLANS} plans holding the demo plan (${docs[0].length} bytes of JSON, defaults filled in). ` +
          `Saves: each request takes a plan no other request holds, at the version its last answer gave, so every save should be accepted (any other answer counts against it). ` +
          `Raw baseline: node-postgres (pg) with ${POOL} connections (the app's pool size), ${IN_FLIGHT} loops each doing BEGIN, SELECT ... FOR UPDATE, INSERT the revision from the row, UPDATE, COMMIT, on copies of the plan tables in a scratch schema of the same database. ` +
          `Machine load (1-minute average, ${cpus().length} cores): ${loadBefore.toFixed(1)} before, ${loadAfter.toFixed(1)} after. ` +
          `Goal: save p99 <= 100 ms at ${IN_FLIGHT} in flight and >= 25% of the raw baseline's throughput; this run: ${Number.isNaN(share) ? "-" : (share * 100).toFixed(1) + "%"}, goal ${goal}.`,
        columns,
        rows: [
          row("GET /api/v1/plans/[id]", IN_FLIGHT, reads),
          row("POST /api/v1/analyze (demo plan)", ANALYZE_IN_FLIGHT, analyses, "signed in"),
          row("PUT /api/v1/plans/[id] (save)", IN_FLIGHT, saves, Number.isNaN(share) ? "" : `${(share * 100).toFixed(1)}% of raw`),
          row("raw pg save transaction (baseline)", IN_FLIGHT, base, "1.00"),
        ],
      },
    ];
  } finally {
    await pool.query(`DROP SCHEMA IF EXISTS ${raw.schema} CASCADE`);
    await pool.query("DELETE FROM app_user WHERE email = $1", [email]);
    await pool.end();
  }
}
