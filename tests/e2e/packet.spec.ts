/** The build packet and plan files through the UI: Build packet downloads a PDF; Export plan, then Import plan on My plans, round-trips the document. */
import { readFile, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./steps";

test.setTimeout(240_000);

async function demoPlanId(page: Page): Promise<string> {
  const { plans } = (await (await page.request.get("/api/v1/plans")).json()) as { plans: { id: string; name: string }[] };
  const demo = plans.find((p) => p.name === "Two-car garage shop");
  expect(demo).toBeTruthy();
  return demo!.id;
}

test("Build packet in the editor downloads the plan's PDF", async ({ page }) => {
  await signIn(page);
  const id = await demoPlanId(page);
  await page.goto(`/plans/${id}`);
  const button = page.getByTestId("build-packet");
  await expect(button).toBeVisible({ timeout: 60_000 });
  const download = page.waitForEvent("download", { timeout: 180_000 });
  await button.click();
  await expect(page.getByRole("status").filter({ hasText: /Laying out|Packet ready/ })).toBeVisible();
  const file = await download;
  expect(file.suggestedFilename()).toBe("two-car-garage-shop-packet.pdf");
  const bytes = await readFile((await file.path())!);
  expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
  expect(bytes.length).toBeGreaterThan(50_000);
  await expect(page.getByText("Packet ready: download again")).toBeVisible();
});

test("Export plan, then Import plan on My plans, gives a new plan with the same document", async ({ page }) => {
  await signIn(page);
  const id = await demoPlanId(page);
  await page.goto(`/plans/${id}`);
  const exported = page.waitForEvent("download");
  await page.getByTestId("export-plan").click();
  const file = JSON.parse(await readFile((await (await exported).path())!, "utf8")) as { format: string; name: string; document: unknown };
  expect(file.format).toBe("benchwright-plan");

  // Import under another name, so the demo plan stays the only one called "Two-car garage shop".
  const copy = path.join(os.tmpdir(), `round-trip-${Date.now()}.benchwright.json`);
  await writeFile(copy, JSON.stringify({ ...file, name: `Round trip ${Date.now()}` }));
  await page.goto("/plans");
  await page.getByTestId("import-file").setInputFiles({ name: "not-a-plan.json", mimeType: "application/json", buffer: Buffer.from("this is not json") });
  await expect(page.getByTestId("import-problem")).toContainText("not a Benchwright plan");
  await page.getByTestId("import-file").setInputFiles(copy);
  const preview = page.getByTestId("import-preview");
  await expect(preview).toContainText(/walls, \d+ fixtures/);
  await preview.getByRole("button", { name: "Import as a new plan" }).click();
  await page.waitForURL((u) => /\/plans\/[0-9a-f-]{36}$/.test(u.pathname) && !u.pathname.endsWith(id), { timeout: 60_000 });
  const newId = new URL(page.url()).pathname.split("/").pop()!;
  const again = (await (await page.request.get(`/api/v1/plans/${newId}/export`)).json()) as { document: unknown };
  expect(again.document).toEqual(file.document);
  // Clean up: the demo member's list stays as it was.
  expect((await page.request.delete(`/api/v1/plans/${newId}`)).status()).toBe(200);
});
