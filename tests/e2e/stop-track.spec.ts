import { test, expect, type Page } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { signIn } from "./steps";

/*
 * A stop track belongs to a saw: in an empty plan, a base cabinet, a tool shelf and a base cabinet on the back
 * wall, then a stop track clicked near the saw lands on the counter beside the blade with its stop table read
 * from the blade; dragging the saw station one cabinet along takes the track with it. Demo account (README).
 */

type Placement = { mode: string; wallId?: string; offsetMm?: number; elevationMm?: number };
type Placed = { origin: { x: number; y: number; z: number }; workSurfaceMm?: number; body: { polygon: { x: number; y: number }[]; zMax: number }; track?: { attached: boolean; sawId: string; side: string; startFromBladeMm: number; counterTopMm?: number } };
type Ed = {
  doc: { fixtures: { id: string; kind: string; placement: Placement; params: Record<string, unknown> }[] };
  placed(id: string): Placed | undefined;
  wall(id: string): { start: { x: number; y: number }; dir: { x: number; y: number }; inward: { x: number; y: number }; lengthMm: number };
};

const ed = (page: Page) => page.evaluate(() => (window.__bwEditor as unknown as Ed).doc.fixtures.map((f) => ({ id: f.id, kind: f.kind, placement: f.placement, params: f.params })));
const placed = (page: Page, id: string) => page.evaluate((fid) => (window.__bwEditor as unknown as Ed).placed(fid)!, id);

/** Page pixels of a spot on wall w3, `along` mm from its start and `out` mm into the room, at height z (mm). */
const onBackWall = (page: Page, along: number, out: number, z: number) =>
  page.evaluate(
    ([a, o, zz]) => {
      const w = (window.__bwEditor as unknown as Ed).wall("w3");
      return window.__bwScreen!({ x: w.start.x + w.dir.x * a + w.inward.x * o, y: w.start.y + w.dir.y * a + w.inward.y * o, z: zz });
    },
    [along, out, z] as const,
  );

async function addAtNextSpot(page: Page, title: string) {
  await page.getByLabel("Fixture", { exact: true }).selectOption({ label: title });
  await page.getByRole("button", { name: "Add", exact: true }).click();
}

test("a stop track clicked near the saw lands on the counter beside the blade and follows the saw", async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page);
  await page.getByLabel("New plan").fill(`Saw and stops ${randomUUID().slice(0, 6)}`);
  await page.getByRole("button", { name: "Create plan" }).click();
  await expect(page).toHaveURL(/\/plans\/[0-9a-f-]{36}$/);
  await expect.poll(() => page.evaluate(() => (window.__bwFrames ?? 0) > 2 && !!window.__bwScreen), { timeout: 30_000 }).toBe(true);

  // Cabinet, tool shelf, cabinet along the back wall (wall 3), each at the next free spot.
  await page.getByLabel("Wall", { exact: true }).selectOption({ label: "Wall 3 (Back wall)" });
  await addAtNextSpot(page, "Base cabinet");
  await addAtNextSpot(page, "Tool shelf");
  await addAtNextSpot(page, "Base cabinet");
  await expect(page.getByTestId("outline-item")).toHaveCount(3);
  await page.keyboard.press("Escape");
  const [cabA, saw, cabB] = await ed(page);
  expect([cabA.kind, saw.kind, cabB.kind]).toEqual(["base-cabinet", "tool-shelf", "base-cabinet"]);
  const sawAt = saw.placement.offsetMm!;
  const bAt = cabB.placement.offsetMm!;

  // Plan view; choose Stop track and click on the counter just past the saw (further along the wall: the left
  // of a person facing it).
  await page.getByRole("button", { name: "Plan", exact: true }).click();
  await page.waitForTimeout(800);
  await page.locator('[data-kind="stop-track"]').click();
  const counterTop = (await placed(page, cabB.id)).origin.z + (await placed(page, cabB.id)).workSurfaceMm!;
  const click = await onBackWall(page, bAt + 150, 300, counterTop);
  await page.mouse.move(click.x - 20, click.y);
  await page.mouse.move(click.x, click.y);
  await page.mouse.click(click.x, click.y);
  await expect(page.getByTestId("outline-item")).toHaveCount(4);
  const track = (await ed(page)).find((f) => f.kind === "stop-track")!;
  expect(track.params).toMatchObject({ sawId: saw.id, side: "left" });
  const t = await placed(page, track.id);
  expect(t.track?.attached).toBe(true);
  // On the counter top (not the floor), starting at the saw's bay end, which is where the counter begins.
  expect(t.origin.z).toBeCloseTo(counterTop, 6);
  expect(track.placement).toMatchObject({ mode: "wall", wallId: "w3" });
  expect(track.placement.offsetMm).toBeCloseTo(bAt, 3);
  // The properties name the saw and the side, and the track's reach is read from the blade.
  const mount = page.getByTestId("track-mount");
  await expect(mount.getByLabel("Saw")).toHaveValue(saw.id);
  await expect(mount.getByLabel("Side of the blade, as you face the wall")).toHaveValue("left");
  await expect(page.getByTestId("track-where")).toContainText("left of the blade");
  await expect(page.getByTestId("track-where")).toContainText("on the counter at");
  await expect(page.getByTestId("track-reach")).toContainText("from the blade");
  await expect(page.getByTestId("track-follows")).toBeVisible();
  // As a user sees it in 3D: the saw and its track framed together.
  await page.getByRole("button", { name: "3D", exact: true }).click();
  await page.evaluate((ids) => (window.__bwEditor as unknown as { frame(ids: string[]): void }).frame(ids), [saw.id, track.id, cabB.id]);
  await page.waitForTimeout(1500);
  await page.screenshot({ path: "tests/artifacts/stop-track-placed.png" });
  await page.getByRole("button", { name: "Plan", exact: true }).click();
  await page.waitForTimeout(800);

  // Drag the saw station one cabinet (30 in) toward the wall's start: the track follows.
  const sawWidth = bAt - sawAt;
  const top = (await placed(page, saw.id)).body.zMax;
  const from = await onBackWall(page, sawAt + sawWidth / 2, 300, top);
  const to = await onBackWall(page, sawAt + sawWidth / 2 - 762, 300, top);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  for (let i = 1; i <= 16; i++) await page.mouse.move(from.x + ((to.x - from.x) * i) / 16, from.y + ((to.y - from.y) * i) / 16);
  await page.mouse.up();
  const after = await ed(page);
  const sawNow = after.find((f) => f.id === saw.id)!.placement.offsetMm!;
  const trackNow = after.find((f) => f.id === track.id)!.placement.offsetMm!;
  expect(sawAt - sawNow).toBeGreaterThan(300);
  expect(track.placement.offsetMm! - trackNow).toBeCloseTo(sawAt - sawNow, 3);
  await page.waitForTimeout(500);
  await page.screenshot({ path: "tests/artifacts/stop-track-followed.png" });

  // One undo puts the saw and its track back.
  await page.getByTestId("plan-canvas").locator("canvas").focus();
  await page.keyboard.press("Control+z");
  const undone = await ed(page);
  expect(undone.find((f) => f.id === saw.id)!.placement.offsetMm).toBeCloseTo(sawAt, 6);
  expect(undone.find((f) => f.id === track.id)!.placement.offsetMm).toBeCloseTo(track.placement.offsetMm!, 6);
});
