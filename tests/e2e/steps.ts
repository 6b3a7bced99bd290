import { expect, type Page } from "@playwright/test";

/** The seeded demo member (README): owns the demo plan. */
export const DEMO = { email: "robin@demo.benchwright.test", password: "sawdust-and-pine-42" };

/** Signs in through the form and waits for the plans list. */
export async function signIn(page: Page, email = DEMO.email, password = DEMO.password): Promise<void> {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/plans$/, { timeout: 60_000 });
}

/** On the Room tab: adds an electrical panel on a wall (by its label in the list), a typed distance from the wall's start. */
export async function addPanel(page: Page, wallLabel: string, fromStart: string): Promise<void> {
  await page.getByRole("button", { name: "Add electrical panel" }).click();
  const panel = page.locator("details").filter({ hasText: "Electrical panel" });
  await panel.getByLabel("Where").selectOption({ label: wallLabel });
  await panel.getByLabel("From wall start").fill(fromStart);
  await panel.getByLabel("From wall start").press("Enter");
}
