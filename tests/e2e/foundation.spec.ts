import { test, expect } from "@playwright/test";
import { randomUUID } from "node:crypto";

test("sign up, create a plan, see it listed, open it, the canvas draws, sign out", async ({ page }) => {
  const email = `e2e-${randomUUID().slice(0, 8)}@example.test`;
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("woodshop");

  await page.getByRole("link", { name: "Create an account" }).first().click();
  await page.getByLabel("Your name").fill("Casey Hornbeam");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("Use at least 10 characters.")).toBeVisible();
  await page.getByLabel("Password").fill("Hornbeam-bench-31");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/plans$/);
  await expect(page.getByTestId("signed-in-as")).toContainText("Casey Hornbeam");
  await expect(page.getByText("No plans yet.")).toBeVisible();

  await page.getByLabel("New plan").fill("Single-bay shop");
  await page.getByRole("button", { name: "Create plan" }).click();
  await expect(page).toHaveURL(/\/plans\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Single-bay shop");
  const planUrl = page.url();

  // the canvas drew frames: the frame counter advances and the pixels are not blank
  const canvas = page.getByTestId("plan-canvas").locator("canvas");
  await expect(canvas).toBeVisible();
  await expect.poll(() => page.evaluate(() => window.__bwFrames ?? 0), { timeout: 30_000 }).toBeGreaterThan(2);
  const painted = await page.evaluate(() => {
    const c = document.querySelector("[data-testid=plan-canvas] canvas") as HTMLCanvasElement;
    const off = document.createElement("canvas");
    off.width = 64;
    off.height = 64;
    const ctx = off.getContext("2d")!;
    ctx.drawImage(c, 0, 0, 64, 64);
    const d = ctx.getImageData(0, 0, 64, 64).data;
    const colours = new Set<string>();
    for (let i = 0; i < d.length; i += 4) colours.add(`${d[i] >> 4},${d[i + 1] >> 4},${d[i + 2] >> 4}`);
    return colours.size;
  });
  expect(painted).toBeGreaterThan(3);
  await page.screenshot({ path: "tests/artifacts/foundation-plan.png", fullPage: true });

  await page.goto("/plans");
  await expect(page.getByTestId("plan-card").filter({ hasText: "Single-bay shop" })).toBeVisible();

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("link", { name: "Sign in" })).toBeVisible();
  await page.goto(planUrl);
  await expect(page).toHaveURL(/\/signin/);
});

test("sign in with the demo account and see the demo plan", async ({ page }) => {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill("robin@demo.benchwright.test");
  await page.getByLabel("Password").fill("wrong-password-here");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("That e-mail and password do not match an account.")).toBeVisible();
  await page.getByLabel("Password").fill("sawdust-and-pine-42");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/plans$/);
  await expect(page.getByTestId("plan-card").filter({ hasText: "Two-car garage shop" })).toBeVisible();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: "tests/artifacts/foundation-plans-phone.png", fullPage: true });
});
