import { test, expect, type Page } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { wcagViolations } from "./axe";
import { signIn } from "./steps";

test.setTimeout(180_000);

const inches = (n: number) => n * 25.4;
const wall = (wallId: string, offsetMm: number, elevationMm = 0) => ({ mode: "wall", wallId, offsetMm, elevationMm });
/** A back-wall run of our own: two cabinets, a saw station between counters, an upper cabinet, and a cabinet left without a label. */
const DOCUMENT = {
  schemaVersion: 1,
  room: { walls: [{ id: "w1", label: "Door wall", lengthMm: 5500 }, { id: "w2", label: "Side wall", lengthMm: 6400 }, { id: "w3", label: "Back wall", lengthMm: 5500 }, { id: "w4", label: "House wall", lengthMm: 6400 }] },
  fixtures: [
    { id: "run-1", kind: "base-cabinet", label: "Drawer run", placement: wall("w3", 500), params: {} },
    { id: "saw", kind: "tool-shelf", label: "Saw station", placement: wall("w3", 500 + inches(30)), params: { preset: "compact-miter-saw", widthMm: inches(32) } },
    { id: "run-2", kind: "base-cabinet", label: "", placement: wall("w3", 500 + inches(62)), params: {} },
    { id: "upper", kind: "wall-cabinet", label: "Glue shelf", placement: wall("w3", 500), params: {} },
  ],
};
const ON_BACK_WALL = ["Drawer run", "Saw station", "Base cabinet", "Glue shelf"];

/** Pixels of the 3D canvas in the fixtures' wood colours (warm: red over green over blue, well apart), and the total. */
async function woodPixels(page: Page): Promise<{ wood: number; total: number }> {
  return page.evaluate(() => {
    const c = document.querySelector("[data-testid=plan-canvas] canvas") as HTMLCanvasElement;
    const off = document.createElement("canvas");
    off.width = 200;
    off.height = 150;
    const ctx = off.getContext("2d")!;
    ctx.drawImage(c, 0, 0, 200, 150);
    const d = ctx.getImageData(0, 0, 200, 150).data;
    let wood = 0;
    // The floor, walls and background are pale (red less than 40 over blue); carcass and fronts are warmer.
    for (let i = 0; i < d.length; i += 4) if (d[i] > d[i + 1] && d[i + 1] > d[i + 2] && d[i] - d[i + 2] > 50) wood++;
    return { wood, total: d.length / 4 };
  });
}

/** Labels in a drawing set inside their fixture (no leader) that run out of the fixture's marks as the browser draws them. */
async function overflowingLabels(page: Page, drawing: string): Promise<string[]> {
  return page.locator(drawing).evaluate((svg) => {
    const bad: string[] = [];
    for (const g of svg.querySelectorAll<SVGGElement>('g[data-kind="name"]')) {
      const ref = g.dataset.ref;
      if (!ref || svg.querySelector(`polyline[data-role="leader"][data-ref="${ref}"]`)) continue;
      const marks = [...svg.querySelectorAll<SVGPolygonElement>(`polygon[data-ref="${ref}"]`)];
      if (!marks.length) continue;
      const boxes = marks.map((m) => m.getBBox());
      const x0 = Math.min(...boxes.map((b) => b.x)), y0 = Math.min(...boxes.map((b) => b.y));
      const x1 = Math.max(...boxes.map((b) => b.x + b.width)), y1 = Math.max(...boxes.map((b) => b.y + b.height));
      for (const t of g.querySelectorAll<SVGTextElement>("text")) {
        if (t.transform.baseVal.numberOfItems) continue;
        const b = t.getBBox();
        if (b.x < x0 || b.y < y0 || b.x + b.width > x1 || b.y + b.height > y1) bad.push(`${g.textContent} (${ref})`);
      }
    }
    return bad;
  });
}

test("a friend with the link sees the fixtures in 3D and named in the plan and elevation drawings", async ({ browser }) => {
  const owner = await browser.newContext();
  const op = await owner.newPage();
  const email = `views-${randomUUID().slice(0, 8)}@example.test`;
  expect((await op.request.post("/api/v1/account", { data: { name: "Avery Larch", email, password: "Larch-and-elm-64" } })).status()).toBe(201);
  await signIn(op, email, "Larch-and-elm-64");
  const plan = await op.request.post("/api/v1/plans", { data: { name: "Back wall run", document: DOCUMENT } });
  expect(plan.status()).toBe(201);
  const planId = (await plan.json()).plan.id as string;
  await op.goto(`/plans/${planId}/share`);
  await op.getByRole("button", { name: "Make a link" }).click();
  const path = new URL(await op.getByTestId("new-link").inputValue()).pathname;

  const friend = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const fp = await friend.newPage();
  expect((await fp.goto(path))?.status()).toBe(200);

  // Plan: the engine's drawing, every fixture named in words (a cabinet without a label by its kind's name).
  const planSvg = fp.locator('svg[data-drawing="plan"]');
  await expect(fp.getByRole("img", { name: "Floor plan of the room" })).toBeVisible();
  for (const name of ON_BACK_WALL) await expect(planSvg.locator('g[data-kind="name"]', { hasText: name }).or(planSvg.locator('g[data-kind="legend"]', { hasText: name }))).toHaveCount(1);
  await expect(planSvg.locator("text", { hasText: /^(base-cabinet|tool-shelf|wall-cabinet)$/ })).toHaveCount(0);
  await expect(planSvg.locator('g[data-kind="wall-name"]', { hasText: "Side wall" })).toBeVisible();
  expect(await overflowingLabels(fp, 'svg[data-drawing="plan"]')).toEqual([]);
  expect(await wcagViolations(fp)).toEqual([]);
  await fp.getByLabel("Show keep-clear zones").uncheck();
  await expect(planSvg.locator('[data-role="keep-clear"]')).toHaveCount(0);
  await fp.screenshot({ path: "tests/artifacts/shared-views-plan.png", fullPage: true });

  // Elevations: the back wall as seen from the room, its fixtures named once, the run on the drawing's right.
  await fp.getByRole("tab", { name: "Elevations" }).click();
  const back = fp.locator('svg[data-drawing="elevation"][data-wall="w3"]');
  await expect(fp.getByRole("img", { name: "Elevation of Back wall" })).toBeVisible();
  for (const name of ON_BACK_WALL) await expect(back.locator('g[data-kind="name"]', { hasText: name }).or(back.locator('g[data-kind="legend"]', { hasText: name }))).toHaveCount(1);
  expect(await overflowingLabels(fp, 'svg[data-drawing="elevation"][data-wall="w3"]')).toEqual([]);
  // Drawer run stands 500 mm from the back wall's start corner: a person facing the wall sees it on their right.
  const at = await back.evaluate((svg) => {
    const x = (ref: string) => Math.max(...[...svg.querySelectorAll<SVGPolygonElement>(`polygon[data-ref="${ref}"]`)].map((p) => p.getBBox().x + p.getBBox().width));
    return { run1: x("run-1"), run2: x("run-2"), wall: (svg as SVGSVGElement).querySelector<SVGPolygonElement>('polygon[data-role="wall-face"]')!.getBBox().width };
  });
  expect(at.run1).toBeCloseTo(at.wall - 500, 0);
  expect(at.run2).toBeLessThan(at.run1);
  expect(await wcagViolations(fp)).toEqual([]);
  await back.scrollIntoViewIfNeeded();
  await fp.screenshot({ path: "tests/artifacts/shared-views-elevations.png", fullPage: true });

  // 3D: the editor's fixture layers, read-only; the canvas shows the cabinets' wood.
  await fp.getByRole("tab", { name: "3D" }).click();
  await expect(fp.getByTestId("plan-canvas").locator("canvas")).toBeVisible({ timeout: 30_000 });
  await expect.poll(() => fp.evaluate(() => window.__bwFrames ?? 0), { timeout: 30_000 }).toBeGreaterThan(2);
  await expect.poll(async () => (await woodPixels(fp)).wood, { timeout: 30_000 }).toBeGreaterThan(300);
  expect(await wcagViolations(fp)).toEqual([]);
  await fp.screenshot({ path: "tests/artifacts/shared-views-3d.png" });

  // The same page for an empty room: no fixture, no wood in the 3D view (so the count above is the fixtures').
  const empty = await op.request.post("/api/v1/plans", { data: { name: "Bare room", document: { ...DOCUMENT, fixtures: [] } } });
  await op.goto(`/plans/${(await empty.json()).plan.id}/share`);
  await op.getByRole("button", { name: "Make a link" }).click();
  const bare = new URL(await op.getByTestId("new-link").inputValue()).pathname;
  await fp.goto(bare);
  await fp.getByRole("tab", { name: "3D" }).click();
  await expect.poll(() => fp.evaluate(() => window.__bwFrames ?? 0), { timeout: 30_000 }).toBeGreaterThan(2);
  await fp.waitForTimeout(500);
  expect((await woodPixels(fp)).wood).toBeLessThan(30);
  await owner.close();
  await friend.close();
});
