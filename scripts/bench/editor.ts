/**
 * Editor suite, in Chromium against a running app (BW_BASE_URL, default http://127.0.0.1:3000;
 * skipped when none answers): script time of one drag step (pointer move -> snap -> document edit
 * -> incremental re-derive and re-check -> instance matrices; then React's updates) at 50, 300 and
 * 600 fixtures from the seeded generator (goal: median <= 8 ms at 300); plan page load at 300
 * fixtures; JavaScript the browser loads for the plan route and the landing page.
 */
import { chromium, type Page } from "@playwright/test";
import type { BenchTable } from "../bench";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import { fmt } from "./timing";

export const order = 90;

const BASE = process.env.BW_BASE_URL ?? "http://127.0.0.1:3000";
const SIZES = [50, 300, 600];
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
const DRAG_IN_PAGE = `async (steps) => {
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

/** Encoded bytes of JavaScript the page loaded, KiB. */
async function scriptKiB(page: Page): Promise<number> {
  const bytes = (await page.evaluate(`performance.getEntriesByType("resource").filter((e) => e.name.split("?")[0].endsWith(".js")).reduce((a, e) => a + (e.encodedBodySize || e.transferSize), 0)`)) as number;
  return Math.round(bytes / 1024);
}

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
  try {
    await page.goto(`${BASE}/`);
    await page.waitForLoadState("networkidle");
    const landingKiB = await scriptKiB(page);
    await page.goto(`${BASE}/signin`);
    await page.getByLabel("E-mail").fill("robin@demo.benchwright.test");
    await page.getByLabel("Password").fill("sawdust-and-pine-42");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/plans$/, { timeout: 60_000 });
    let planKiB = 0;
    for (const n of SIZES) {
      const res = await page.request.post(`${BASE}/api/v1/plans`, { data: { name: `Bench ${n} fixtures`, document: generatePlan(n, 7) } });
      if (!res.ok()) throw new Error(`creating the ${n}-fixture plan failed: ${res.status()} ${await res.text()}`);
      const id = ((await res.json()) as { plan: { id: string } }).plan.id;
      const t0 = Date.now();
      await page.goto(`${BASE}/plans/${id}`);
      await page.waitForFunction(`(window.__bwFrames ?? 0) > 2 && !!window.__bwScreen`, null, { timeout: 120_000 });
      const loadMs = Date.now() - t0;
      if (n === 300) planKiB = await scriptKiB(page);
      loads.push([n, loadMs]);
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
      { title: "Editor page load and JavaScript", note: "Load: from navigation to the canvas drawing its first frames, production build, warm server. JavaScript: encoded bytes of .js files the browser loaded on first load (plan route includes the 3D view chunk).", columns: ["measure", "value"], rows: [...loads.map(([n, ms]) => [`plan page load, ${n} fixtures (ms)`, ms]), ["plan route JavaScript (KiB)", planKiB], ["landing page JavaScript (KiB)", landingKiB]] },
    ];
  } finally {
    await browser.close();
  }
}
