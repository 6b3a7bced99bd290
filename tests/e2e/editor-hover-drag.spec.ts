import { test, expect, type Page } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { addPanel, signIn } from "./steps";

/*
 * The editor's pointer work that only a browser shows: hovering a keep-clear zone opens a card with
 * its numbers, and a cabinet dragged from one wall onto another moves there, undone in one step.
 * Demo account from the seed (README).
 */

type Placement = { mode: string; wallId?: string; offsetMm?: number };
type Wall = { start: { x: number; y: number }; dir: { x: number; y: number }; inward: { x: number; y: number }; lengthMm: number };
type Ed = {
  doc: { fixtures: { id: string; kind: string; placement: Placement }[] };
  placed(id: string): { body: { polygon: { x: number; y: number }[]; zMax: number } } | undefined;
  wall(id: string): Wall;
  derived: { getState(): { derived: { zones: { id: string; purpose: string; prism: { polygon: { x: number; y: number }[]; zMax: number } }[] } } };
};

/** Page pixels of a zone's centre, at its top (the plan view looks straight down). */
async function zoneCentre(page: Page, purpose: string) {
  return page.evaluate((p) => {
    const z = (window.__bwEditor as unknown as Ed).derived.getState().derived.zones.find((x) => x.purpose === p)!;
    const n = z.prism.polygon.length;
    const c = z.prism.polygon.reduce((a, q) => ({ x: a.x + q.x / n, y: a.y + q.y / n }), { x: 0, y: 0 });
    return window.__bwScreen!({ x: c.x, y: c.y, z: z.prism.zMax });
  }, purpose);
}

test("hover a keep-clear zone for its numbers; drag a cabinet onto another wall; undo returns it", async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page);
  await page.getByLabel("New plan").fill(`Hover and carry ${randomUUID().slice(0, 6)}`);
  await page.getByRole("button", { name: "Create plan" }).click();
  await expect(page).toHaveURL(/\/plans\/[0-9a-f-]{36}$/);
  await expect.poll(() => page.evaluate(() => (window.__bwFrames ?? 0) > 2 && !!window.__bwScreen), { timeout: 30_000 }).toBe(true);

  // An electrical panel on the back wall (wall 3), 120 in from its start, and a base cabinet right in front of it.
  await page.getByRole("tab", { name: "Room" }).click();
  await addPanel(page, "Wall 3 (Back wall)", "120");
  await page.getByRole("tab", { name: "Layout" }).click();
  await page.getByLabel("Wall", { exact: true }).selectOption({ label: "Wall 3 (Back wall)" });
  await page.getByLabel("Fixture", { exact: true }).selectOption({ label: "Base cabinet" });
  const at = page.getByTestId("place-offset");
  await at.fill("114");
  await at.press("Enter");
  await page.getByRole("button", { name: "Add", exact: true }).click();
  await expect(page.getByTestId("outline-item")).toHaveCount(1);
  await page.keyboard.press("Escape");

  // 1. Plan view; hover the panel's working space: the card names it, its state in words, its numbers.
  await page.getByRole("button", { name: "Plan", exact: true }).click();
  await page.waitForTimeout(800);
  const zc = await zoneCentre(page, "panel-working-space");
  await page.mouse.move(zc.x - 30, zc.y - 30);
  await page.mouse.move(zc.x, zc.y);
  const card = page.getByTestId("zone-tooltip");
  await expect(card).toBeVisible();
  await expect(card).toContainText("Panel working space");
  await expect(card).toHaveAttribute("data-state", "conflict");
  await expect(card).toContainText("Conflict");
  // The depth NEC 110.26(A)(1) asks in front of a 120/240 V panel: 3 ft = 36 in.
  await expect(card).toContainText('needs 36"');
  await expect(card).toContainText("Measured");
  await expect(card.getByTestId("zone-size")).toContainText('high');
  await page.screenshot({ path: ".data/editor-zone-hover.png" });
  // Leaving the canvas closes it.
  await page.mouse.move(5, 5);
  await expect(card).toBeHidden();

  // 2. Carry the cabinet from the back wall (wall 3) onto wall 2: it stands against wall 2 on release.
  const id = await page.evaluate(() => (window.__bwEditor as unknown as Ed).doc.fixtures[0].id);
  const before = await page.evaluate((fid) => (window.__bwEditor as unknown as Ed).doc.fixtures.find((f) => f.id === fid)!.placement, id);
  expect(before).toMatchObject({ mode: "wall", wallId: "w3" });
  const from = await page.evaluate((fid) => {
    const b = (window.__bwEditor as unknown as Ed).placed(fid)!.body;
    const n = b.polygon.length;
    const c = b.polygon.reduce((a, p) => ({ x: a.x + p.x / n, y: a.y + p.y / n }), { x: 0, y: 0 });
    return window.__bwScreen!({ x: c.x, y: c.y, z: b.zMax });
  }, id);
  const to = await page.evaluate(() => {
    const w = (window.__bwEditor as unknown as Ed).wall("w2");
    const t = w.lengthMm / 2;
    // 100 mm into the room from the middle of wall 2 (well inside the 250 mm re-attach distance).
    return window.__bwScreen!({ x: w.start.x + w.dir.x * t + w.inward.x * 100, y: w.start.y + w.dir.y * t + w.inward.y * 100, z: 0 });
  });
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  for (let i = 1; i <= 16; i++) await page.mouse.move(from.x + ((to.x - from.x) * i) / 16, from.y + ((to.y - from.y) * i) / 16);
  await page.mouse.up();
  const after = await page.evaluate((fid) => (window.__bwEditor as unknown as Ed).doc.fixtures.find((f) => f.id === fid)!.placement, id);
  expect(after).toMatchObject({ mode: "wall", wallId: "w2" });
  await expect(page.getByTestId("announcer")).toContainText("Moved to wall 2");
  await page.waitForTimeout(500);
  await page.screenshot({ path: ".data/editor-cross-wall-drag.png" });

  // 3. One undo puts it back where it was on the back wall.
  await page.getByTestId("plan-canvas").locator("canvas").focus();
  await page.keyboard.press("Control+z");
  const undone = await page.evaluate((fid) => (window.__bwEditor as unknown as Ed).doc.fixtures.find((f) => f.id === fid)!.placement, id);
  expect(undone).toEqual(before);

  // 4. The owner finds the share page from the editor; the elevation view lists the wall's photos.
  await expect(page.getByTestId("share-link")).toHaveAttribute("href", /\/plans\/[0-9a-f-]{36}\/share$/);
  await expect(page.getByTestId("elevation-photos")).toHaveCount(0);
  await page.getByRole("button", { name: "Elevation", exact: true }).click();
  await expect(page.getByTestId("elevation-photos")).toContainText("Photos of this wall");
});

test("adopting a class preset in the editor is an edit saved with the plan, and the live checks use its numbers", async ({ page }) => {
  test.setTimeout(180_000);
  // An instructor (demo seed) owns the plan and makes the preset.
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill("ines@demo.benchwright.test");
  await page.getByLabel("Password").fill("sawdust-and-pine-42");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/plans$/, { timeout: 60_000 });
  const doc = {
    schemaVersion: 1,
    room: { walls: [{ id: "w1", label: "", lengthMm: 6100 }, { id: "w2", label: "", lengthMm: 6700 }, { id: "w3", label: "", lengthMm: 6100 }, { id: "w4", label: "", lengthMm: 6700 }] },
    fixtures: [{ id: "run", kind: "base-cabinet", label: "Bench run", placement: { mode: "wall", wallId: "w2", offsetMm: 600, elevationMm: 0 }, params: { widthMm: 2400, depthMm: 610, heightMm: 914 } }],
  };
  const plan = (await (await page.request.post("/api/v1/plans", { data: { name: `Preset in editor ${randomUUID().slice(0, 6)}`, document: doc } })).json()).plan as { id: string };
  // A made-up teaching preset: a 6 m walkway, wider than this room leaves in front of the run (6100 - 610 mm).
  const presetName = `Wide aisles ${randomUUID().slice(0, 6)}`;
  expect((await page.request.post("/api/v1/presets", { data: { name: presetName, numbers: { walkwayMm: 6000 }, published: true } })).status()).toBe(201);

  await page.goto(`/plans/${plan.id}`);
  await expect.poll(() => page.evaluate(() => (window.__bwFrames ?? 0) > 2), { timeout: 30_000 }).toBe(true);
  const failingWalkways = () => page.evaluate(() => (window.__bwEditor as unknown as { derived: { getState(): { findings: { ruleId: string; pass: boolean }[] } } }).derived.getState().findings.filter((f) => f.ruleId === "walkway" && !f.pass).length);
  const before = await failingWalkways();

  await page.getByRole("tab", { name: "Room" }).click();
  await page.getByTestId("plan-settings").locator("summary").click();
  await page.getByTestId("plan-settings").getByLabel("Preset").selectOption({ label: `${presetName} · Ines Larch` });
  await expect(page.getByTestId("preset-in-force")).toContainText(presetName);
  await expect.poll(failingWalkways).toBeGreaterThan(before);
  // Saved by the editor's autosave with its version: no conflict, and the server now names the preset.
  await expect(page.getByTestId("save-status")).toHaveAttribute("data-state", "saved", { timeout: 20_000 });
  await expect(page.getByRole("dialog")).toHaveCount(0);
  const onServer = await (await page.request.get(`/api/v1/plans/${plan.id}/preset`)).json();
  expect(onServer.preset.name).toBe(presetName);
  await page.getByRole("tab", { name: /Checks/ }).click();
  await expect(page.getByTestId("findings-preset")).toContainText(presetName);

  // Undo takes the preset back out, like any edit.
  await page.getByTestId("plan-canvas").locator("canvas").focus();
  await page.keyboard.press("Control+z");
  await expect.poll(failingWalkways).toBe(before);
  await expect(page.getByTestId("findings-preset")).toHaveCount(0);
});
