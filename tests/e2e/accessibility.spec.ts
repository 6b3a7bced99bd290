/**
 * WCAG 2.1 A and AA (axe-core through @axe-core/playwright) on the pages each kind of user reaches:
 * signed out, the demo member (plans, the editor, sharing, presets), the instructor and the admin.
 * The shared page and walk-throughs are checked in their own specs.
 */
import { test, expect, type Page } from "@playwright/test";
import { wcagViolations } from "./axe";
import { DEMO, signIn } from "./steps";

test.setTimeout(240_000);

async function expectClean(page: Page, path: string, ready: (p: Page) => Promise<void>): Promise<void> {
  const res = await page.goto(path);
  expect(res?.status(), path).toBe(200);
  await ready(page);
  expect(await wcagViolations(page), path).toEqual([]);
}
const heading = (p: Page) => expect(p.getByRole("heading").first()).toBeVisible();

test("pages signed out have no WCAG 2.1 AA violations", async ({ page }) => {
  for (const path of ["/", "/signin", "/signup", "/reset", "/rules"]) await expectClean(page, path, heading);
  await page.goto("/rules");
  const first = page.locator('main a[href^="/rules/"]').first();
  const href = await first.getAttribute("href");
  expect(href).toBeTruthy();
  await expectClean(page, href!, heading);
});

test("the demo member's pages have no WCAG 2.1 AA violations", async ({ page }) => {
  await signIn(page);
  await expectClean(page, "/plans", heading);
  const { plans } = (await (await page.request.get("/api/v1/plans")).json()) as { plans: { id: string; name: string }[] };
  const demo = plans.find((p) => p.name === "Two-car garage shop");
  expect(demo, `${DEMO.email} owns the demo plan`).toBeTruthy();
  await expectClean(page, `/plans/${demo!.id}`, (p) => expect(p.getByTestId("plan-canvas")).toBeVisible({ timeout: 60_000 }));
  await expectClean(page, `/plans/${demo!.id}/share`, heading);
  await expectClean(page, "/presets", heading);
});

test("the instructor's and the admin's pages have no WCAG 2.1 AA violations", async ({ page }) => {
  await signIn(page, "ines@demo.benchwright.test");
  await expectClean(page, "/class", heading);
  await page.context().clearCookies();
  await signIn(page, "avery@demo.benchwright.test");
  await expectClean(page, "/admin", heading);
});
