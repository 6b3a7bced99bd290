import { test, expect } from "@playwright/test";

const doc = {
  schemaVersion: 1,
  room: { walls: [{ id: "w1", label: "Door wall", lengthMm: 6100 }, { id: "w2", label: "Bench wall", lengthMm: 6700 }, { id: "w3", label: "Back wall", lengthMm: 6100 }, { id: "w4", label: "Left wall", lengthMm: 6700 }] },
  fixtures: [{ id: "bench-run", kind: "base-cabinet", label: "Bench run", placement: { mode: "wall", wallId: "w2", offsetMm: 600, elevationMm: 0 }, params: { widthMm: 2400, depthMm: 610, heightMm: 914 } }],
};

const steps = [
  { title: "The measured room", view: "plan", note: "Four walls measured at the floor." },
  { title: "Clear aisle in front of the bench", view: "plan", highlight: { fixtureIds: ["bench-run"], zoneIds: [] }, ruleId: "walkway", note: "Keep at least 36 in clear in front of the counters." },
  { title: "The bench wall", view: "elevation", wallId: "w2", highlight: { fixtureIds: ["bench-run"], zoneIds: [] }, note: "Counter height against the elbow." },
];

test.setTimeout(180_000);

test("an instructor presents a walk-through step by step; a student follows from a link without editing rights", async ({ browser }) => {
  const teacher = await browser.newContext();
  const tp = await teacher.newPage();
  await tp.goto("/signin");
  await tp.getByLabel("E-mail").fill("ines@demo.benchwright.test");
  await tp.getByLabel("Password").fill("sawdust-and-pine-42");
  await tp.getByRole("button", { name: "Sign in" }).click();
  await expect(tp).toHaveURL(/\/plans$/);

  const plan = await (await tp.request.post("/api/v1/plans", { data: { name: "Classroom garage", document: doc } })).json();
  const made = await tp.request.post("/api/v1/walkthroughs", { data: { planId: plan.plan.id, title: "Clearances, lesson 1", steps } });
  expect(made.status()).toBe(201);
  const id = (await made.json()).walkthrough.id as string;

  // The instructor presents: arrow keys step through, the counter and title follow.
  await tp.goto(`/present/${id}`);
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 1 of 3");
  await expect(tp.getByTestId("step-title")).toHaveText("The measured room");
  await tp.screenshot({ path: "tests/artifacts/teaching-step-1.png" });
  await tp.keyboard.press("ArrowRight");
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 2 of 3");
  await expect(tp.getByTestId("step-title")).toHaveText("Clear aisle in front of the bench");
  // The highlighted fixture is drawn in the highlight colour, and the rule is linked.
  await expect(tp.locator('polygon[data-ref="bench-run"]').first()).toHaveAttribute("stroke", "#d99a1e");
  await expect(tp.getByRole("link", { name: /rule behind this step: walkway/ })).toHaveAttribute("href", "/rules/walkway");
  await tp.screenshot({ path: "tests/artifacts/teaching-step-2.png" });
  await tp.keyboard.press("ArrowRight");
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 3 of 3");
  await expect(tp.getByTestId("step-stage")).toHaveAttribute("data-view", "elevation");
  await expect(tp.getByRole("img", { name: "Elevation of Bench wall" })).toBeVisible();
  await tp.screenshot({ path: "tests/artifacts/teaching-step-3.png" });
  // Past the last step nothing moves; Home goes back to the start.
  await tp.keyboard.press("ArrowRight");
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 3 of 3");
  await tp.keyboard.press("Home");
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 1 of 3");

  // A student link: an anonymous browser follows along but cannot edit.
  const link = await (await tp.request.post(`/api/v1/walkthroughs/${id}/link`)).json();
  const student = await browser.newContext();
  const sp = await student.newPage();
  const url = new URL(link.url);
  await sp.goto(url.pathname + url.search);
  await expect(sp.getByTestId("step-counter")).toHaveText("Step 1 of 3");
  await sp.getByRole("button", { name: "Next →" }).click();
  await expect(sp.getByTestId("step-counter")).toHaveText("Step 2 of 3");
  await sp.goto(`/present/${id}/edit`);
  await expect(sp).toHaveURL(/\/signin\?callbackUrl=/);
  expect((await sp.request.put(`/api/v1/walkthroughs/${id}`, { data: { title: "changed", steps: [] } })).status()).toBe(401);
  // Without the token the draft is not found.
  expect((await sp.goto(`/present/${id}`))?.status()).toBe(404);
  await student.close();

  // The instructor edits in the builder: adds a step and saves; the presentation then has four.
  await tp.goto(`/present/${id}/edit`);
  await tp.getByRole("button", { name: "Add a step" }).click();
  await tp.locator("#step-3-title").fill("Stock path on both sides of the saw");
  await tp.getByRole("button", { name: "Save" }).click();
  await expect(tp.getByText("Saved.")).toBeVisible();
  await tp.screenshot({ path: "tests/artifacts/teaching-editor.png", fullPage: true });
  await tp.goto(`/present/${id}`);
  await tp.keyboard.press("End");
  await expect(tp.getByTestId("step-counter")).toHaveText("Step 4 of 4");
  await expect(tp.getByTestId("step-title")).toHaveText("Stock path on both sides of the saw");

  // The plan adopts a class preset (walkways 42 in: NKBA work aisle for one person, secondary copy); the presentation names it.
  const presetName = `Class of ${Date.now()}`;
  expect((await tp.request.post("/api/v1/presets", { data: { name: presetName, numbers: { walkwayMm: 1066.8 }, published: true } })).status()).toBe(201);
  await tp.goto(`/plans/${plan.plan.id}/share`);
  await tp.getByLabel("Preset").selectOption({ label: `${presetName} · Ines Larch` });
  await expect(tp.getByText("The checks now use this preset's numbers.")).toBeVisible();
  await tp.goto(`/present/${id}`);
  await expect(tp.getByText(`preset: ${presetName}`)).toBeVisible();
  await teacher.close();
});
