import { test, expect, type BrowserContext, type Page } from "@playwright/test";
import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { signIn } from "./steps";

/*
 * The pages work under their Content-Security-Policy (and Permissions-Policy): the editor (3D view over WebGL, elevation,
 * the sheet-nesting worker, the price list), a wall photo uploaded to storage and shown, and the
 * shared read-only page, with no policy violation reported by Chromium.
 */

declare global {
  interface Window {
    __bwFrames?: number;
    __cspViolations?: string[];
  }
}

/** Collects every policy report in the context: console messages and securitypolicyviolation events. */
async function watchPolicy(context: BrowserContext): Promise<() => Promise<string[]>> {
  const seen: string[] = [];
  await context.addInitScript(() => {
    window.__cspViolations = [];
    document.addEventListener("securitypolicyviolation", (e) => window.__cspViolations!.push(`${e.violatedDirective} blocked ${e.blockedURI || "(inline)"} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`));
  });
  const onPage = (page: Page) => {
    page.on("console", (m) => {
      if (/Content Security Policy|Content-Security-Policy|Permissions-Policy|Refused to (load|execute|apply|connect|create|frame)/i.test(m.text())) seen.push(`${m.type()}: ${m.text()}`);
    });
    page.on("pageerror", (e) => {
      if (/Content Security Policy|EvalError/i.test(e.message)) seen.push(`pageerror: ${e.message}`);
    });
  };
  context.pages().forEach(onPage);
  context.on("page", onPage);
  return async () => {
    const fromPages: string[] = [];
    for (const p of context.pages()) if (!p.isClosed()) fromPages.push(...(await p.evaluate(() => window.__cspViolations ?? []).catch(() => [])));
    return [...seen, ...fromPages];
  };
}

const drawn = (page: Page) => expect.poll(() => page.evaluate(() => window.__bwFrames ?? 0), { timeout: 30_000 }).toBeGreaterThan(2);

test("the editor and the shared page run under their policy with no violations", async ({ browser }) => {
  test.setTimeout(240_000);
  const context = await browser.newContext();
  const violations = await watchPolicy(context);
  const page = await context.newPage();

  const email = `csp-${randomUUID().slice(0, 8)}@example.test`;
  expect((await page.request.post("/api/v1/account", { data: { name: "Kit Larch", email, password: "Larch-and-yew-63" } })).status()).toBe(201);
  await signIn(page, email, "Larch-and-yew-63");
  const walls = [
    { id: "w1", label: "Door wall", lengthMm: 6100 },
    { id: "w2", label: "Side wall", lengthMm: 7300 },
    { id: "w3", label: "Back wall", lengthMm: 6100 },
    { id: "w4", label: "House wall", lengthMm: 7300 },
  ];
  const fixtures = [
    { id: "run-1", kind: "base-cabinet", label: "Drawer run", placement: { mode: "wall", wallId: "w3", offsetMm: 900, elevationMm: 0 }, params: {} },
    { id: "bench-1", kind: "workbench", label: "Bench", placement: { mode: "wall", wallId: "w2", offsetMm: 1500, elevationMm: 0 }, params: {} },
  ];
  const created = await page.request.post("/api/v1/plans", { data: { name: "Policy shop", document: { schemaVersion: 1, room: { walls }, fixtures } } });
  expect(created.status()).toBe(201);
  const planId = (await created.json()).plan.id as string;

  // The policy is on the page, with a nonce Next copied onto its scripts.
  const res = await page.goto(`/plans/${planId}`);
  const csp = res?.headers()["content-security-policy"] ?? "";
  expect(csp).toContain("'strict-dynamic'");
  expect(csp).toContain("frame-ancestors 'none'");
  await expect(page.getByTestId("plan-canvas").locator("canvas")).toBeVisible();
  await drawn(page);

  // The views: 3D (WebGL), elevation, plan.
  for (const view of ["3D", "Elevation", "Plan"]) {
    await page.getByRole("button", { name: view, exact: true }).click();
    await page.waitForTimeout(500);
  }
  // Parts: a lazily loaded chunk, the price list fetch, and the sheet-nesting worker.
  await page.getByRole("tab", { name: "Parts" }).click();
  await page.getByRole("tab", { name: "Sheet maps" }).click();
  await expect(page.getByTestId("sheet-map").first()).toBeVisible({ timeout: 60_000 });

  // A wall photo: the browser PUTs it to storage with a presigned URL, then shows it from there.
  await page.goto(`/plans/${planId}/share`);
  const jpeg = await sharp({ create: { width: 320, height: 240, channels: 3, background: "#9a7b5a" } }).jpeg().toBuffer();
  await page.locator('input[type="file"]').setInputFiles({ name: "wall.jpg", mimeType: "image/jpeg", buffer: jpeg });
  await expect(page.getByRole("img", { name: /^Wall photo / })).toBeVisible();
  expect(await page.getByRole("img", { name: /^Wall photo / }).evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);

  // A read-only link, opened by a visitor in a fresh browser context.
  await page.getByLabel("Note (who it is for)").fill("policy check");
  await page.getByRole("button", { name: "Make a link" }).click();
  const url = await page.getByTestId("new-link").inputValue();
  const visitor = await browser.newContext();
  const visitorViolations = await watchPolicy(visitor);
  const vp = await visitor.newPage();
  const shared = await vp.goto(new URL(url).pathname);
  expect(shared?.status()).toBe(200);
  expect(shared?.headers()["content-security-policy"]).toContain("'strict-dynamic'");
  await expect(vp.getByTestId("read-only-note")).toBeVisible();
  for (const tab of ["Plan", "Elevations", "Checks", "Parts"]) {
    await vp.getByRole("tab", { name: tab, exact: true }).click();
    await vp.waitForTimeout(400);
  }
  await vp.getByRole("tab", { name: "3D", exact: true }).click();
  await expect(vp.locator("canvas").first()).toBeVisible();
  await drawn(vp);

  expect(await violations()).toEqual([]);
  expect(await visitorViolations()).toEqual([]);
  await visitor.close();
  await context.close();
});

test("an inline script without the nonce is refused (the policy is enforced, not just sent)", async ({ page }) => {
  const reports: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) reports.push(m.text());
  });
  await page.goto("/");
  const ran = await page.evaluate(async () => {
    const w = window as unknown as { __injected?: boolean };
    const s = document.createElement("div");
    // Parser-inserted markup, as an injected fragment would be.
    s.innerHTML = '<img src="x" onerror="window.__injected = true">';
    document.body.appendChild(s);
    await new Promise((r) => setTimeout(r, 300));
    return w.__injected === true;
  });
  expect(ran).toBe(false);
  await expect.poll(() => reports.length).toBeGreaterThan(0);
});
