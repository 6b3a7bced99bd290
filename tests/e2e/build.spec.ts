import { test, expect } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { wcagViolations } from "./axe";
import { signIn } from "./steps";

test.setTimeout(180_000);

test("the Build tab shows setups, stop table and steps with labels that cross-link to the parts list and sheet maps", async ({ browser }) => {
  const ctx = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
  const page = await ctx.newPage();
  const email = `build-${randomUUID().slice(0, 8)}@example.test`;
  expect((await page.request.post("/api/v1/account", { data: { name: "Rowan Ash", email, password: "Ash-and-oak-77" } })).status()).toBe(201);
  await signIn(page, email, "Ash-and-oak-77");
  const made = await page.request.post("/api/v1/plans", { data: { name: "Saw wall", document: demoPlan() } });
  expect(made.status()).toBe(201);
  const planId = (await made.json()).plan.id as string;

  await page.goto(`/plans/${planId}`);
  await page.getByRole("tab", { name: "Parts" }).click();
  const view = page.getByTestId("parts-view");
  await expect(view).toBeVisible({ timeout: 30_000 });
  // The parts list carries labels: the first base cabinet's carcass sides are A3.
  await expect(view.getByTestId("parts-table").locator('button[data-label="A3"]').first()).toBeVisible();

  await view.getByRole("tab", { name: "Build" }).click();
  const build = view.getByTestId("build-panel");
  await expect(build).toBeVisible();
  // Setups in run order, rips widest first; the first names a fence reading in the plan's inches.
  const setups = build.getByTestId("setup");
  expect(await setups.count()).toBeGreaterThan(20);
  await expect(setups.first()).toContainText(/Rip fence at \d+( \d+\/\d+)?" from the blade/);
  // The stop track's table, filled from the plan's repeat crosscuts (with labels) and the lengths typed on the track.
  const stops = build.getByTestId("stop-table");
  await expect(stops).toHaveCount(1);
  await expect(stops.locator("tbody tr").first().locator("button[data-label]").first()).toBeVisible();
  await expect(stops).toContainText("typed on the track");
  await expect(build.getByTestId("build-steps").locator("li").first()).toContainText("Cut and machine the parts");
  await expect(build.getByTestId("build-steps")).toContainText("PVA glue stays open about 5-10 minutes");
  expect(await wcagViolations(page)).toEqual([]);
  await page.screenshot({ path: "tests/artifacts/build-tab.png", fullPage: false });

  // Click a label: the focus bar names it, its setups and steps are marked, and the other tabs highlight it.
  await build.getByTestId("cut-rows").locator('button[data-label="A3"]').click();
  await expect(build.getByTestId("label-focus")).toContainText("A3 Carcass side");
  await expect(build.locator('[data-setup].bg-steel-100').first()).toBeVisible();
  expect(await build.locator('[data-setup].bg-steel-100').count()).toBe(3);
  await build.getByTestId("label-focus").scrollIntoViewIfNeeded();
  await page.screenshot({ path: "tests/artifacts/build-label-focus.png" });
  expect(await wcagViolations(page)).toEqual([]);
  await view.getByRole("tab", { name: "Parts", exact: true }).click();
  await expect(view.getByTestId("parts-table").locator('button[data-label="A3"][aria-pressed="true"]').first()).toBeVisible();
  await view.getByRole("tab", { name: "Sheet maps" }).click();
  const piece = view.locator('[data-testid="sheet-map"] g[data-label="A3"]').first();
  await expect(piece).toBeVisible({ timeout: 60_000 });
  await expect(piece.locator("rect")).toHaveAttribute("stroke", "#36414e");
  await expect(piece.locator("text").first()).toContainText("A3");
  await piece.scrollIntoViewIfNeeded();
  await page.screenshot({ path: "tests/artifacts/build-sheet-map.png" });
  await view.getByRole("tab", { name: "Boards" }).click();
  await expect(view.locator('[data-testid="board-group"] button[data-label]').first()).toBeVisible();

  // The stop track's properties show its stop table.
  await page.getByRole("tab", { name: "Layout" }).click();
  await page.getByTestId("outline-item").filter({ hasText: "Stop track" }).click();
  const own = page.getByTestId("track-stop-table");
  await expect(own).toBeVisible();
  await expect(own.locator("tbody tr").first()).toBeVisible();
  await expect(own.locator("thead th")).toHaveCount(3);
  await own.screenshot({ path: "tests/artifacts/build-track-properties.png" });
  expect(await wcagViolations(page)).toEqual([]);

  await ctx.close();
});
