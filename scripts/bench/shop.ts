/**
 * Shop view suite, in Chromium against a running app (BW_BASE_URL, default http://127.0.0.1:3000;
 * skipped when none answers), signed in as the demo member on the demo plan with a phone viewport:
 * the first-load JavaScript of /plans/[id]/shop (gzip, as the editor suite counts it; goal <= 120 kB)
 * and the time from a reload with the network off until the first setup shows, beside the same
 * reload online in the same run.
 */
import { chromium, devices, type BrowserContext } from "@playwright/test";
import type { BenchTable } from "../bench";
import { goalCell, kib, measurePage } from "./editor";
import { fmt } from "./timing";

export const order = 85;
const BASE = process.env.BW_BASE_URL ?? "http://127.0.0.1:3000";
const GOAL_KB = 120;
const RUNS = 5;

async function reachable(): Promise<boolean> {
  try {
    return (await fetch(`${BASE}/api/auth/csrf`, { signal: AbortSignal.timeout(15_000) })).ok;
  } catch {
    return false;
  }
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? NaN;

async function reloadTimes(ctx: BrowserContext, url: string, offline: boolean): Promise<number[]> {
  const page = await ctx.newPage();
  await page.goto(url);
  await page.getByTestId("sync-status").filter({ hasText: "saved for use without a network" }).waitFor({ timeout: 120_000 });
  await ctx.setOffline(offline);
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    await page.reload();
    await page.getByTestId("setup-card").first().waitFor({ timeout: 60_000 });
    times.push(performance.now() - t0);
  }
  await ctx.setOffline(false);
  await page.close();
  return times;
}

export async function run(): Promise<BenchTable[]> {
  const title = "Shop view on a phone (Chromium)";
  if (!(await reachable())) return [{ title, note: `Skipped: no app answered at ${BASE}.`, columns: ["measure", "value"], rows: [] }];
  const browser = await chromium.launch({ executablePath: process.env.BW_CHROMIUM ?? "/usr/bin/chromium", args: ["--no-sandbox", "--disable-background-networking", "--no-first-run", "--disable-quic"] });
  try {
    const ctx = await browser.newContext({ viewport: devices["Pixel 7"].viewport, hasTouch: true, isMobile: true });
    const page = await ctx.newPage();
    await page.goto(`${BASE}/signin`);
    await page.getByLabel("E-mail").fill("robin@demo.benchwright.test");
    await page.getByLabel("Password").fill("sawdust-and-pine-42");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/plans$/, { timeout: 60_000 });
    const { plans } = (await (await page.request.get(`${BASE}/api/v1/plans`)).json()) as { plans: { id: string; name: string }[] };
    const demo = plans.find((p) => p.name === "Two-car garage shop");
    if (!demo) return [{ title, note: "Skipped: the demo plan is not there (run the seed).", columns: ["measure", "value"], rows: [] }];
    const url = `${BASE}/plans/${demo.id}/shop`;
    const js = await measurePage(page, url, `!!document.querySelector("[data-testid=setup-card]")`);
    await page.close();
    const online = await reloadTimes(ctx, url, false);
    const offline = await reloadTimes(ctx, url, true);
    await ctx.close();
    return [
      {
        title,
        note: `Demo plan, signed in as its owner, Pixel 7 viewport with touch, production build. JavaScript: gzip bytes on the wire, first load as the editor suite counts it. Reloads: median of ${RUNS}, from reload to the first setup card, after the page was kept for offline use; online and offline in the same run.`,
        columns: ["measure", "value", "goal", "ratio"],
        rows: [
          ["first-load JavaScript (KiB)", kib(js.first), goalCell(GOAL_KB), (js.first / (GOAL_KB * 1000)).toFixed(2)],
          ["lazy JavaScript (KiB)", kib(js.lazy), "-", "-"],
          ["reload online until the first setup shows (ms)", fmt(median(online)), "-", "1.00"],
          ["reload offline until the first setup shows (ms)", fmt(median(offline)), "-", (median(offline) / median(online)).toFixed(2)],
        ],
      },
    ];
  } finally {
    await browser.close();
  }
}
