/**
 * Editor suite, in Chromium against a running app (BW_BASE_URL, default http://127.0.0.1:3000;
 * skipped when none answers): script time of one drag step (pointer move -> snap -> document edit
 * -> incremental re-derive and re-check -> instance matrices; then React's updates) at 50, 150 and
 * 300 fixtures (the plan cap; the API refuses more) from the seeded generator (goal: median <= 8 ms at 300); plan page load at 300
 * fixtures; JavaScript per route, split into first load (what the page's HTML names) and what loads
 * later (the 3D view, tabs opened on demand), against the goals of <= 350 kB first load for the plan
 * route and <= 120 kB for the landing page.
 */
import { chromium, type Page } from "@playwright/test";
import type { BenchTable } from "../bench";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import { fmt } from "./timing";

export const order = 90;

const BASE = process.env.BW_BASE_URL ?? "http://127.0.0.1:3000";
const SIZES = [50, 150, 300];
const STEPS = 60;

const stats = (xs: number[]) => {
  const t = [...xs].sort((a, b) => a - b);
  return { median: t[Math.floor(t.length / 2)], p95: t[Math.min(t.length - 1, Math.floor(t.length * 0.95))] };
};

async function reachable(): Promise<boolean> {
  try {
    const r = await fetch(`${BASE}/api/auth/csrf`, { signal: AbortSignal.timeout(15000) });
    return r.ok;
  } catch {
    return false;
  }
}

/**
 * In-page code that drags a wall fixture along its wall with synthetic pointer events and times
 * each step. Kept as source text: the TypeScript runner would wrap named functions in helpers the
 * page does not have.
 */
export const DRAG_IN_PAGE = `async (steps) => {
  const ed = window.__bwEditor;
  const canvas = document.querySelector("[data-testid=plan-canvas] canvas");
  const nextTask = () => new Promise((r) => { const ch = new MessageChannel(); ch.port1.onmessage = () => r(); ch.port2.postMessage(0); });
  const target = ed.doc.fixtures.find((f) => f.placement.mode === "wall");
  const body = ed.placed(target.id).body;
  const c = body.polygon.reduce((a, p) => ({ x: a.x + p.x / body.polygon.length, y: a.y + p.y / body.polygon.length }), { x: 0, y: 0 });
  const at = window.__bwScreen({ x: c.x, y: c.y, z: body.zMax });
  const ev = (type, x, y) => new PointerEvent(type, { clientX: x, clientY: y, button: 0, buttons: type === "pointerup" ? 0 : 1, pointerId: 7, bubbles: true, isPrimary: true, pointerType: "mouse" });
  canvas.dispatchEvent(ev("pointerdown", at.x, at.y));
  const sync = [];
  const withReact = [];
  const engine = [];
  for (let i = 1; i <= steps; i++) {
    const dx = (i % 40 < 20 ? i % 20 : 20 - (i % 20)) * 4;
    const t0 = performance.now();
    canvas.dispatchEvent(ev("pointermove", at.x + dx, at.y));
    const t1 = performance.now();
    engine.push(ed.derived.getState().lastMs);
    await Promise.resolve();
    await nextTask();
    sync.push(t1 - t0);
    withReact.push(performance.now() - t0);
  }
  canvas.dispatchEvent(ev("pointerup", at.x, at.y));
  return { sync, withReact, engine };
}`;

/** Drags a wall fixture back and forth (4 px a step) and returns each step's times, ms. */
async function dragSteps(page: Page): Promise<{ sync: number[]; withReact: number[]; engine: number[] }> {
  return page.evaluate(`(${DRAG_IN_PAGE})(${STEPS})`);
}

/** JavaScript of one page view, bytes as sent (gzip-encoded by the server). */
export interface ScriptBytes {
  /** Scripts the document's HTML names: its <script> tags and the chunks the inline RSC payload lists for hydration. */
  first: number;
  /** Scripts loaded afterwards: next/dynamic chunks (the 3D view) and anything else fetched later. */
  lazy: number;
  /** Scripts that arrived without gzip (should be none); their raw size is counted above. */
  unencoded: number;
}

/** Goals from the editor issue, in kB (1000 bytes) of gzip-encoded JavaScript. */
const GOAL_KB = { plan: 350, landing: 120 };

export const kib = (bytes: number) => (bytes / 1024).toFixed(1);
export const goalCell = (kB: number | null) => (kB === null ? "-" : `<= ${kB} kB (${(kB * 1000 / 1024).toFixed(1)} KiB)`);

/** Every .js the page has loaded so far: path, bytes on the wire (encoded body), decoded bytes. */
async function loadedScripts(page: Page): Promise<{ path: string; encoded: number; decoded: number }[]> {
  return page.evaluate(
    `performance.getEntriesByType("resource").filter((e) => new URL(e.name).pathname.endsWith(".js")).map((e) => ({ path: new URL(e.name).pathname, encoded: e.encodedBodySize, decoded: e.decodedBodySize }))`,
  );
}

/** Splits the scripts loaded so far into those the HTML names (first load) and the rest (lazy). */
async function scriptBytes(page: Page, html: string): Promise<ScriptBytes> {
  const out: ScriptBytes = { first: 0, lazy: 0, unencoded: 0 };
  for (const s of await loadedScripts(page)) {
    if (html.includes(s.path)) out.first += s.encoded;
    else out.lazy += s.encoded;
    // The server leaves bodies under 1 KiB uncompressed (the usual threshold); only larger ones count.
    if (s.decoded > 1024 && s.encoded >= s.decoded) out.unencoded += 1;
  }
  return out;
}

/** Opens `url`, waits until `ready` holds and the network is idle, and returns its JavaScript split. */
export async function measurePage(page: Page, url: string, ready?: string): Promise<ScriptBytes> {
  const res = await page.goto(url);
  if (!res) throw new Error(`no response for ${url}`);
  const html = await res.text();
  if (ready) await page.waitForFunction(ready, null, { timeout: 120_000 });
  await page.waitForLoadState("networkidle");
  return scriptBytes(page, html);
}

const scriptRow = (route: string, b: ScriptBytes, goalKB: number | null) => [route, kib(b.first), kib(b.lazy), kib(b.first + b.lazy), goalCell(goalKB), goalKB === null ? "-" : b.first <= goalKB * 1000 ? "yes" : "no"];

export async function run(): Promise<BenchTable[]> {
  const title = "Editor in Chromium: drag step, page load, JavaScript";
  if (!(await reachable())) return [{ title, note: `Skipped: no app answered at ${BASE} (start it with npm start, or set BW_BASE_URL).`, columns: ["measure", "value"], rows: [] }];
  const browser = await chromium.launch({
    executablePath: process.env.BW_CHROMIUM ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic", "--use-angle=swiftshader", "--enable-unsafe-swiftshader"],
  });
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  const rows: (string | number)[][] = [];
  const loads: (string | number)[][] = [];
  const js: (string | number)[][] = [];
  let unencoded = 0;
  const measured = (route: string, b: ScriptBytes, goalKB: number | null) => {
    unencoded = Math.max(unencoded, b.unencoded);
    js.push(scriptRow(route, b, goalKB));
  };
  try {
    measured("landing page /, signed out", await measurePage(page, `${BASE}/`), GOAL_KB.landing);
    measured("sign-in /signin", await measurePage(page, `${BASE}/signin`), null);
    await page.getByLabel("E-mail").fill("robin@demo.benchwright.test");
    await page.getByLabel("Password").fill("sawdust-and-pine-42");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/plans$/, { timeout: 60_000 });
    measured("my plans /plans", await measurePage(page, `${BASE}/plans`, `!!document.querySelector("main a[href^='/plans/']")`), null);
    for (const n of SIZES) {
      const res = await page.request.post(`${BASE}/api/v1/plans`, { data: { name: `Bench ${n} fixtures`, document: generatePlan(n, 7) } });
      if (!res.ok()) throw new Error(`creating the ${n}-fixture plan failed: ${res.status()} ${await res.text()}`);
      const id = ((await res.json()) as { plan: { id: string } }).plan.id;
      const t0 = Date.now();
      const nav = await page.goto(`${BASE}/plans/${id}`);
      await page.waitForFunction(`(window.__bwFrames ?? 0) > 2 && !!window.__bwScreen`, null, { timeout: 120_000 });
      const loadMs = Date.now() - t0;
      loads.push([n, loadMs]);
      if (n === SIZES[0]) {
        // The bytes do not depend on the plan's size; measured on the smallest plan, where the Parts tab's nesting is quick.
        const html = nav ? await nav.text() : "";
        await page.waitForLoadState("networkidle");
        const plan = await scriptBytes(page, html);
        measured(`plan editor /plans/[id], 3D view drawn (${n} fixtures)`, plan, GOAL_KB.plan);
        const chunk = page.waitForResponse((r) => new URL(r.url()).pathname.endsWith(".js"), { timeout: 60_000 });
        await page.getByRole("tab", { name: "Parts" }).click();
        await chunk;
        await page.waitForFunction(`!document.querySelector("[role=tabpanel]")?.textContent?.includes("Loading the parts")`, null, { timeout: 60_000 });
        await page.waitForLoadState("networkidle");
        const parts = await scriptBytes(page, html);
        js.push(["  then Parts tab opened (added)", "-", kib(parts.lazy - plan.lazy), kib(parts.first + parts.lazy), "-", "-"]);
        await page.getByRole("tab", { name: "Layout" }).click();
      }
      await page.evaluate(`window.__bwEditor.ui.setState({ view: "plan" })`);
      await page.waitForTimeout(800);
      await dragSteps(page); // warm-up
      const r = await dragSteps(page);
      const s = stats(r.sync);
      const a = stats(r.withReact);
      const e = stats(r.engine);
      rows.push([n, fmt(s.median), fmt(s.p95), fmt(e.median), fmt(a.median), fmt(a.p95)]);
      await page.request.delete(`${BASE}/api/v1/plans/${id}`);
    }
    return [
      { title: "Editor drag step in Chromium (ms)", note: `Median and p95 of ${STEPS} pointer moves dragging a wall fixture in plan view, seeded shops (generatePlan(n, 7)). "Handler" is the synchronous work (snap, edit, incremental derive and checks, instance matrices), "engine" the derive + check part of it; "to next task" also waits for React's panel updates and, on this software-GL machine, any frame drawn in between, so it is an upper bound. Goal: handler <= 8 ms at 300.`, columns: ["fixtures", "handler median", "handler p95", "engine median", "to next task median", "to next task p95"], rows },
      { title: "Editor page load", note: "From navigation to the canvas drawing its first frames, production build, warm server.", columns: ["fixtures", "plan page load (ms)"], rows: loads },
      {
        title: "JavaScript per route (gzip KiB)",
        note: "Production build served by `next start`, which gzips responses; sizes are the encoded bytes on the wire (Resource Timing encodedBodySize) of every .js the browser loaded, waiting for the network to go idle (and, in the editor, for the 3D view to draw). First load: scripts whose path appears in the route's HTML (its script tags and the chunk lists of the inline RSC payload, i.e. everything hydration needs). Lazy: scripts fetched later, on the editor the 3D view (three, react-three-fiber, drei, scene) loaded by next/dynamic with ssr: false. Goals (from the editor issue) are on first load, in kB of 1000 bytes." + (unencoded ? ` Warning: ${unencoded} script(s) arrived without gzip; their raw size is counted.` : ""),
        columns: ["route", "first load (KiB)", "lazy (KiB)", "total (KiB)", "goal, first load", "meets goal"],
        rows: js,
      },
    ];
  } finally {
    await browser.close();
  }
}
