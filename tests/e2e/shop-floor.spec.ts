/**
 * The shop view on a phone (touch, narrow viewport) in Chromium: it opens again with the network
 * off, check-offs made offline wait on the phone and sync when it returns, a second browser sees
 * them, a stranger's request is 404, and axe finds no WCAG 2.1 AA violation.
 */
import { test, expect, devices, type Page } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { wcagViolations } from "./axe";
import { signIn } from "./steps";

test.setTimeout(240_000);
const phone = { viewport: devices["Pixel 7"].viewport, hasTouch: true, isMobile: true, deviceScaleFactor: 2 };

async function demoPlanId(page: Page): Promise<string> {
  const { plans } = (await (await page.request.get("/api/v1/plans")).json()) as { plans: { id: string; name: string }[] };
  return plans.find((p) => p.name === "Two-car garage shop")!.id;
}
const totalChecks = async (page: Page, id: string) => ((await (await page.request.get(`/api/v1/plans/${id}/progress`)).json()) as { checks: number }).checks;

test("the shop view works offline on a phone and syncs its check-offs when the network returns", async ({ browser }) => {
  const ctx = await browser.newContext(phone);
  const page = await ctx.newPage();
  await signIn(page);
  const id = await demoPlanId(page);
  const before = await totalChecks(page, id);

  await page.goto(`/plans/${id}/shop`);
  const next = page.getByTestId("setup-card").first();
  await expect(next).toBeVisible({ timeout: 60_000 });
  await expect(next.getByText("Next setup")).toBeVisible();
  await expect(page.getByTestId("sync-status")).toContainText("saved for use without a network", { timeout: 60_000 });
  expect(await wcagViolations(page)).toEqual([]);

  await ctx.setOffline(true);
  await page.reload();
  await expect(page.getByTestId("setup-card").first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId("sync-status")).toContainText("Offline");

  const buttons = page.getByTestId("setup-card").first().getByRole("button", { name: /Cut \+1/ });
  for (let i = 0; i < 3; i++) await buttons.first().tap();
  await expect(page.getByTestId("sync-status")).toContainText("3 check-offs waiting to sync");
  await page.screenshot({ path: "tests/artifacts/shop-floor-phone-offline.png", fullPage: false });

  await ctx.setOffline(false);
  await page.evaluate(() => window.dispatchEvent(new Event("online")));
  await expect(page.getByTestId("sync-status")).toContainText("all check-offs synced", { timeout: 30_000 });
  expect(await totalChecks(page, id)).toBe(before + 3);

  // Another browser signed in to the same account sees them.
  const other = await browser.newContext(phone);
  const op = await other.newPage();
  await signIn(op);
  expect(await totalChecks(op, id)).toBe(before + 3);
  await op.goto(`/plans/${id}/shop`);
  await expect(op.getByTestId("setup-card").first()).toBeVisible({ timeout: 60_000 });
  await expect(op.getByTestId("sync-status")).toContainText("all check-offs synced");

  // Undo takes the last one back.
  await page.getByRole("button", { name: /Undo last check-off/ }).tap();
  await expect.poll(() => totalChecks(page, id), { timeout: 30_000 }).toBe(before + 4);

  // A stranger gets 404 from the page's data and its check-off route.
  const stranger = await browser.newContext();
  const email = `stranger-${randomUUID().slice(0, 8)}@example.test`;
  expect((await stranger.request.post("/api/v1/account", { data: { name: "Stranger", email, password: "Maple-and-yew-55" } })).status()).toBe(201);
  const sp = await stranger.newPage();
  await signIn(sp, email, "Maple-and-yew-55");
  expect((await sp.request.get(`/api/v1/plans/${id}/progress`)).status()).toBe(404);
  expect((await sp.goto(`/plans/${id}/shop`))?.status()).toBe(404);
  await Promise.all([ctx.close(), other.close(), stranger.close()]);
});
