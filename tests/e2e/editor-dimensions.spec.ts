import { test, expect, type Page } from "@playwright/test";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { fixtureDistances, gapEndName } from "@/lib/engine/drawings/fixture-distances";
import { formatLength } from "@/lib/engine/units/format-length";
import { inches } from "@/lib/engine/units/length";
import { signIn } from "./steps";

/*
 * The editor's dimension strings, on the demo plan: the back wall in elevation shows the counter
 * height and the saw shelf's top and table, from the same engine drawings the shared page draws.
 * Expected numbers come from the engine, so a change of the plan's counter target moves them together.
 */
test.setTimeout(180_000);

const plan = demoPlan();
const derived = derivePlan(plan);
const fmt = (mm: number) => formatLength(mm, { units: plan.settings.units, precision: plan.settings.precision });
const placed = (id: string) => derived.fixtures.find((f) => f.id === id)!;
const counter = placed("cab-1").origin.z + placed("cab-1").workSurfaceMm!;
const saw = placed("saw");
const shelfTop = saw.origin.z + saw.boxes.find((b) => b.role === "tool")!.z;
const table = saw.origin.z + saw.workSurfaceMm!;

/** WCAG 2.1 A and AA violations on the page, by axe-core, as "rule: targets". */
async function wcagViolations(page: Page): Promise<string[]> {
  const source = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");
  await page.evaluate(source);
  const result = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, o: object) => Promise<{ violations: { id: string; nodes: { target: string[] }[] }[] }> } }).axe;
    return axe.run(document, { runOnly: { type: "tag", values: ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"] } });
  });
  return result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

async function drawn(page: Page) {
  await expect.poll(() => page.evaluate(() => (window as unknown as { __bwFrames?: number }).__bwFrames ?? 0)).toBeGreaterThan(2);
  await page.waitForTimeout(700);
}

test("the demo plan's back wall in elevation shows the counter height and the saw shelf", async ({ page }) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page);
  const res = await page.request.post("/api/v1/plans", { data: { name: "Dimensions demo", document: plan } });
  expect(res.status()).toBe(201);
  await page.goto(`/plans/${(await res.json()).plan.id}`);
  await expect(page.getByTestId("plan-canvas").locator("canvas")).toBeVisible();
  await drawn(page);

  await page.getByRole("button", { name: "Elevation", exact: true }).click();
  await page.getByLabel("Elevation wall").selectOption("w3");
  await drawn(page);
  const dims = page.getByTestId("plan-canvas").getByTestId("dimension");
  const level = dims.and(page.locator('[data-chain="levels"]'));
  await expect(level).toHaveText(`Counter ${fmt(counter)}`);
  await expect(level).toHaveAttribute("data-note", "Counter height");
  const sawDims = dims.and(page.locator('[data-chain="fixture-heights"][data-ref="saw"]'));
  await expect(sawDims).toHaveText([fmt(shelfTop), fmt(table - shelfTop)]);
  await expect(sawDims.first()).toHaveAttribute("data-note", /shelf top/);
  // The running chain along the floor ends at both corners: its values add up to the solved wall length.
  const wall = derived.room.walls.find((w) => w.id === "w3")!;
  const run = await dims.and(page.locator('[data-chain="overall"]')).allTextContents();
  expect(run).toEqual([fmt(wall.solvedLengthMm!)]);
  await page.screenshot({ path: "tests/artifacts/editor-dimensions-elevation.png" });
  expect(await wcagViolations(page)).toEqual([]);

  // The toggle hides them, and brings them back.
  await page.getByRole("button", { name: "Dimensions", exact: true }).click();
  await expect(level).toHaveCount(0);
  await page.getByRole("button", { name: "Dimensions", exact: true }).click();
  await expect(level).toHaveCount(1);

  // Select the run's end cabinet (by its name in the outline, as the demo names it): its gaps and width show on the drawing and in the panel; typing a gap moves it, one undo step.
  const end = fixtureDistances(plan, derived, "cab-4")!;
  const offsetOf = () => page.evaluate(() => (window as unknown as { __bwEditor: { doc: { fixtures: { id: string; placement: { offsetMm?: number } }[] } } }).__bwEditor.doc.fixtures.find((f) => f.id === "cab-4")!.placement.offsetMm!);
  const before = await offsetOf();
  await page.getByTestId("outline-item").filter({ hasText: placed("cab-4").label }).click();
  const own = dims.and(page.locator('[data-chain="selection"][data-ref="cab-4"]'));
  await expect(own.and(page.locator('[data-note="Width"]'))).toHaveText(fmt(end.widthMm));
  const leftNote = `[data-note="Gap on the left to ${gapEndName(end.left.to)}"]`;
  await expect(own.and(page.locator(leftNote))).toHaveText(fmt(end.left.gapMm));
  const gap = page.getByTestId("gap-left");
  await expect(gap).toHaveValue(fmt(end.left.gapMm));
  // Typed as the plan's own formatter writes 4 in.
  const fourInches = inches(4);
  await gap.fill(fmt(fourInches));
  await gap.press("Enter");
  await expect.poll(offsetOf).toBeCloseTo(before + end.left.gapMm - fourInches, 3);
  await expect(own.and(page.locator(leftNote))).toHaveText(fmt(fourInches));
  await page.screenshot({ path: "tests/artifacts/editor-dimensions-selection.png" });
  // One undo step puts it back.
  await page.getByRole("button", { name: "Undo", exact: true }).click();
  await expect.poll(offsetOf).toBeCloseTo(before, 3);

  // Plan view: the walls' solved lengths.
  await page.getByRole("button", { name: "Plan", exact: true }).click();
  await drawn(page);
  await expect(page.getByTestId("dim-wall-3")).toContainText(fmt(wall.solvedLengthMm!));
  await page.screenshot({ path: "tests/artifacts/editor-dimensions-plan.png" });
});
