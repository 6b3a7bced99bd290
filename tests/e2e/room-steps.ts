import type { Page } from "@playwright/test";

/** On the Room tab: adds an electrical panel on a wall (by its label in the list), a typed distance from the wall's start. */
export async function addPanel(page: Page, wallLabel: string, fromStart: string): Promise<void> {
  await page.getByRole("button", { name: "Add electrical panel" }).click();
  const panel = page.locator("details").filter({ hasText: "Electrical panel" });
  await panel.getByLabel("Where").selectOption({ label: wallLabel });
  await panel.getByLabel("From wall start").fill(fromStart);
  await panel.getByLabel("From wall start").press("Enter");
}
