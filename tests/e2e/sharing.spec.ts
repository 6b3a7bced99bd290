import { test, expect } from "@playwright/test";
import { randomUUID } from "node:crypto";
import { signIn } from "./steps";
import sharp from "sharp";

test.setTimeout(180_000);

test("owner shares a read-only link; a visitor opens it, signs up and copies it; revoking stops it", async ({ browser }) => {
  // The owner: a fresh account with its own plan, so the test does not depend on other tests' data.
  const owner = await browser.newContext();
  const op = await owner.newPage();
  const ownerEmail = `owner-${randomUUID().slice(0, 8)}@example.test`;
  const created = await op.request.post("/api/v1/account", { data: { name: "Morgan Spruce", email: ownerEmail, password: "Spruce-and-fir-52" } });
  expect(created.status()).toBe(201);
  await signIn(op, ownerEmail, "Spruce-and-fir-52");
  const plan = await op.request.post("/api/v1/plans", {
    data: {
      name: "Tandem garage shop",
      document: { schemaVersion: 1, room: { walls: [{ id: "w1", label: "Door wall", lengthMm: 6100 }, { id: "w2", label: "Side wall", lengthMm: 7300 }, { id: "w3", label: "Back wall", lengthMm: 6100 }, { id: "w4", label: "House wall", lengthMm: 7300 }] }, fixtures: [{ id: "run-1", kind: "base-cabinet", label: "Drawer run", placement: { mode: "wall", wallId: "w2", offsetMm: 900, elevationMm: 0 }, params: {} }] },
    },
  });
  const planId = (await plan.json()).plan.id as string;

  await op.goto(`/plans/${planId}/share`);
  await expect(op.getByRole("heading", { level: 1 })).toContainText("Tandem garage shop");
  await op.getByLabel("Note (who it is for)").fill("for the neighbour");
  await op.getByLabel("Stops working after").selectOption("7");
  await op.getByRole("button", { name: "Make a link" }).click();
  const url = await op.getByTestId("new-link").inputValue();
  expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/);
  const path = new URL(url).pathname;
  await op.screenshot({ path: "tests/artifacts/sharing-owner-links.png", fullPage: true });

  // A visitor without an account opens the link: the plan is there, read-only, and kept out of search engines.
  const visitor = await browser.newContext();
  const vp = await visitor.newPage();
  const res = await vp.goto(path);
  expect(res?.status()).toBe(200);
  await expect(vp.getByRole("heading", { level: 1 })).toHaveText("Tandem garage shop");
  await expect(vp.getByTestId("read-only-note")).toBeVisible();
  expect(await vp.locator('meta[name="robots"]').getAttribute("content")).toContain("noindex");
  await vp.getByRole("tab", { name: "Plan" }).click();
  await expect(vp.getByRole("img", { name: "Floor plan of the room" })).toBeVisible();
  await expect(vp.getByText(/Side wall/)).toBeVisible();
  // The checks and the parts list come from the same engine as the editor.
  await vp.getByRole("tab", { name: "Checks" }).click();
  await expect(vp.getByTestId("findings-summary")).toContainText(/\d+ checks? met/);
  await vp.getByRole("tab", { name: "Parts" }).click();
  await expect(vp.getByTestId("parts-view")).toBeVisible();
  expect(await vp.getByTestId("parts-view").locator("tbody tr").count()).toBeGreaterThan(3);
  // Nothing to edit on the plan views: no text fields, no save.
  await vp.getByRole("tab", { name: "Plan", exact: true }).click();
  await expect(vp.getByRole("textbox")).toHaveCount(0);
  await expect(vp.getByRole("button", { name: /save/i })).toHaveCount(0);
  // The API refuses a write from this browser too.
  expect((await vp.request.put(`/api/v1/plans/${planId}`, { data: { document: {}, version: 1 } })).status()).toBe(401);
  await vp.screenshot({ path: "tests/artifacts/sharing-visitor-plan.png", fullPage: true });

  // The visitor signs up from the shared page and lands back on it, one click from a copy.
  await vp.getByRole("link", { name: "Sign up and copy" }).click();
  await vp.getByLabel("Your name").fill("Jordan Poplar");
  await vp.getByLabel("E-mail").fill(`visitor-${randomUUID().slice(0, 8)}@example.test`);
  await vp.getByLabel("Password").fill("Poplar-and-oak-73");
  await vp.getByRole("button", { name: "Create account" }).click();
  await expect(vp).toHaveURL(new RegExp(`${path}\\?copy=1$`));
  await vp.getByRole("button", { name: "Copy into my plans" }).click();
  await expect(vp).toHaveURL(/\/plans\/[0-9a-f-]{36}$/);
  await expect(vp.getByRole("heading", { level: 1 })).toContainText("Tandem garage shop (copy)");
  const copyId = vp.url().split("/").pop()!;
  expect(copyId).not.toBe(planId);
  const copy = await (await vp.request.get(`/api/v1/plans/${copyId}`)).json();
  expect(copy.plan.role).toBe("owner");
  expect(copy.plan.copiedFrom).toContain("shared by Morgan Spruce");
  await vp.screenshot({ path: "tests/artifacts/sharing-visitor-copy.png", fullPage: true });

  // The owner sees the link was opened, then revokes it; the link stops working.
  await op.reload();
  const row = op.locator("tr", { hasText: "for the neighbour" });
  await expect(row.locator("td").nth(4)).not.toHaveText("0");
  await row.getByRole("button", { name: "Revoke" }).click();
  await expect(op.locator("tr[data-state=revoked]", { hasText: "for the neighbour" })).toBeVisible();
  // A fresh page (the plan editor left open may hold the old one with an unsaved-changes prompt).
  const later = await visitor.newPage();
  const gone = await later.goto(path);
  expect(gone?.status()).toBe(404);
  expect((await later.request.get(`/api/v1/shared/${path.split("/")[2]}`)).status()).toBe(404);
  await later.screenshot({ path: "tests/artifacts/sharing-revoked.png" });
  await owner.close();
  await visitor.close();
});

test("an owner uploads a wall photo from the browser and scales it by two points", async ({ page }) => {
  const email = `photo-${randomUUID().slice(0, 8)}@example.test`;
  expect((await page.request.post("/api/v1/account", { data: { name: "Sam Alder", email, password: "Alder-and-ash-27" } })).status()).toBe(201);
  await signIn(page, email, "Alder-and-ash-27");
  const plan = await (await page.request.post("/api/v1/plans", { data: { name: "Photo shop" } })).json();
  await page.goto(`/plans/${plan.plan.id}/share`);
  // A 800 x 600 photo with GPS in its EXIF; the browser PUTs it straight to storage with the presigned URL.
  const jpeg = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#b49a7a" } })
    .jpeg()
    .withExif({ IFD0: { Make: "PhoneCo" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "47/1 36/1 0/1" } })
    .toBuffer();
  await page.locator('input[type="file"]').setInputFiles({ name: "wall.jpg", mimeType: "image/jpeg", buffer: jpeg });
  const img = page.getByRole("img", { name: /^Wall photo / });
  await expect(img).toBeVisible();
  const box = (await img.boundingBox())!;
  // Two points half the photo's width apart (400 px), marked as 48 in: 1219.2 / 400 = 3.048 mm per pixel.
  await img.click({ position: { x: box.width * 0.25, y: box.height * 0.5 } });
  await img.click({ position: { x: box.width * 0.75, y: box.height * 0.5 } });
  await page.getByLabel("Distance (in)").fill("48");
  await page.getByRole("button", { name: "Set the scale" }).click();
  await expect(page.getByText(/3\.0[45] mm per pixel/)).toBeVisible();
  await expect(page.getByRole("img", { name: /^Elevation of / })).toBeVisible();
  await page.screenshot({ path: "tests/artifacts/sharing-wall-photo.png", fullPage: true });
});
