import { describe, it, expect, beforeAll } from "vitest";
import { Client, DEMO, demo, hasServer } from "./helpers/client";
import { inviteByName, uniqueName } from "./helpers/invite";
import { addMember, cast, sampleDoc, type Cast } from "./helpers/sharing";

const steps = [
  { title: "The room", view: "plan", note: "Start from the measured walls." },
  { title: "Aisle in front of the bench", view: "3d", camera: { position: [3000, 4000, 6000], target: [3000, 0, 3000] }, highlight: { fixtureIds: ["bench-1"], zoneIds: [] }, ruleId: "walkway", note: "Walkways at least 36 in." },
  { title: "North wall", view: "elevation", wallId: "north", note: "Heights along the wall." },
];

describe.skipIf(!hasServer)("walk-throughs: built by instructors, presented read-only", () => {
  let c: Cast;
  let ines: Client;
  let planId: string;
  let ownPlanId: string;
  beforeAll(async () => {
    c = await cast();
    ines = await demo("instructor");
    ownPlanId = (await ines.post("/api/v1/plans", { name: "Teaching garage", document: sampleDoc() })).body.plan.id;
    planId = (await c.owner.client.post("/api/v1/plans", { name: "Student plan", document: sampleDoc() })).body.plan.id;
  });

  it("only instructors build walk-throughs, and only on plans they can edit", async () => {
    expect((await c.owner.client.post("/api/v1/walkthroughs", { planId, title: "x", steps })).status).toBe(403);
    expect((await ines.post("/api/v1/walkthroughs", { planId, title: "x", steps })).status).toBe(404);
    const bad = await ines.post("/api/v1/walkthroughs", { planId: ownPlanId, title: "x", steps: [{ title: "", ruleId: "Not A Rule" }] });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields["steps.0.ruleId"]).toBeTruthy();
    const made = await ines.post("/api/v1/walkthroughs", { planId: ownPlanId, title: "Clearances 101", steps });
    expect(made.status).toBe(201);
    expect(made.body.walkthrough.steps).toHaveLength(3);
    expect(made.body.walkthrough.steps[1].highlight.fixtureIds).toEqual(["bench-1"]);
  });

  it("a draft opens only for its author or with the student link; nobody else can edit", async () => {
    const id = (await ines.post("/api/v1/walkthroughs", { planId: ownPlanId, title: "Draft lesson", steps })).body.walkthrough.id;
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(404);
    const mine = await ines.get(`/api/v1/walkthroughs/${id}`);
    expect(mine.body.walkthrough.canEdit).toBe(true);
    expect(mine.body.walkthrough.document.room.walls).toHaveLength(4);

    const link = await ines.post(`/api/v1/walkthroughs/${id}/link`);
    expect(link.status).toBe(201);
    const t = new URL(link.body.url).searchParams.get("t");
    expect(t).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const student = await new Client().get(`/api/v1/walkthroughs/${id}?t=${t}`);
    expect(student.status).toBe(200);
    expect(student.body.walkthrough.canEdit).toBe(false);
    expect(student.body.walkthrough.planName).toBe("Teaching garage");
    expect((await c.stranger.client.put(`/api/v1/walkthroughs/${id}`, { title: "vandal", steps: [] })).status).toBe(404);

    // The student link can be turned off.
    expect((await ines.del(`/api/v1/walkthroughs/${id}/link`)).status).toBe(200);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}?t=${t}`)).status).toBe(404);
  });

  it("published walk-throughs are listed on the class page and open for anyone, read-only", async () => {
    const made = await ines.post("/api/v1/walkthroughs", { planId: ownPlanId, title: "Published lesson", steps, published: true });
    const id = made.body.walkthrough.id;
    const ownerId = made.body.walkthrough.ownerId;
    const list = await new Client().get(`/api/v1/walkthroughs?owner=${ownerId}`);
    expect(list.body.walkthroughs.map((w: { id: string }) => w.id)).toContain(id);
    expect(list.body.walkthroughs.every((w: { published: boolean }) => w.published)).toBe(true);
    const anon = await new Client().get(`/api/v1/walkthroughs/${id}`);
    expect(anon.body.walkthrough.canEdit).toBe(false);
    expect((await c.stranger.client.put(`/api/v1/walkthroughs/${id}`, { title: "vandal", steps: [] })).status).toBe(403);
    expect((await c.stranger.client.del(`/api/v1/walkthroughs/${id}`)).status).toBe(403);
    const class_ = await new Client().raw(`/class/${ownerId}`);
    expect(class_.status).toBe(200);
    expect(await class_.text()).toContain("Published lesson");

    const edited = await ines.put(`/api/v1/walkthroughs/${id}`, { title: "Published lesson", steps: steps.slice(0, 2), published: false });
    expect(edited.body.walkthrough.steps).toHaveLength(2);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(404);
    expect((await ines.del(`/api/v1/walkthroughs/${id}`)).status).toBe(200);
  });

  it("an instructor who is an editor on a member's plan may build on it", async () => {
    const ie = { client: ines, email: "ines@demo.benchwright.test" };
    await addMember(c.owner.client, planId, ie, "editor");
    const made = await ines.post("/api/v1/walkthroughs", { planId, title: "On a student's plan", steps });
    expect(made.status).toBe(201);
  });

  it("follows the author's current role on the plan: removed, the walk-through stops serving and cannot be published", async () => {
    const ie = { client: ines, email: DEMO.instructor };
    const name = uniqueName("Lent plan");
    const plan = (await c.owner.client.post("/api/v1/plans", { name, document: sampleDoc() })).body.plan.id as string;
    await inviteByName(c.owner.client, plan, name, ie, "editor");
    const made = await ines.post("/api/v1/walkthroughs", { planId: plan, title: "Borrowed lesson", steps, published: true });
    const id = made.body.walkthrough.id as string;
    const ownerId = made.body.walkthrough.ownerId as string;
    const t = new URL((await ines.post(`/api/v1/walkthroughs/${id}/link`)).body.url).searchParams.get("t");
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(200);

    // Downgraded to viewer: only the author opens it, read-only; nobody else, link or not; no changes.
    const iid = (await ines.get("/api/auth/session")).body.user.id as string;
    expect((await c.owner.client.patch(`/api/v1/plans/${plan}/members/${iid}`, { role: "viewer" })).status).toBe(200);
    const asViewer = await ines.get(`/api/v1/walkthroughs/${id}`);
    expect(asViewer.status).toBe(200);
    expect(asViewer.body.walkthrough.canEdit).toBe(false);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}?t=${t}`)).status).toBe(404);
    expect((await ines.put(`/api/v1/walkthroughs/${id}`, { title: "Borrowed lesson", steps, published: true })).status).toBe(403);

    // Removed: nobody opens it (the owner's later edits never reach it), it cannot be published or relinked, it leaves the class page.
    expect((await c.owner.client.del(`/api/v1/plans/${plan}/members/${iid}`)).status).toBe(200);
    const p = (await c.owner.client.get(`/api/v1/plans/${plan}`)).body.plan;
    expect((await c.owner.client.put(`/api/v1/plans/${plan}`, { document: { ...p.document, room: { ...p.document.room, ceilingHeightMm: 2900 } }, version: p.version })).status).toBe(200);
    expect((await ines.get(`/api/v1/walkthroughs/${id}`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/walkthroughs/${id}?t=${t}`)).status).toBe(404);
    expect((await ines.put(`/api/v1/walkthroughs/${id}`, { title: "Borrowed lesson", steps, published: true })).status).toBe(404);
    expect((await ines.post(`/api/v1/walkthroughs/${id}/link`)).status).toBe(404);
    const listed = await new Client().get(`/api/v1/walkthroughs?owner=${ownerId}`);
    expect(listed.body.walkthroughs.map((w: { id: string }) => w.id)).not.toContain(id);
    const own = (await ines.get("/api/v1/walkthroughs")).body.walkthroughs.find((w: { id: string }) => w.id === id);
    expect(own.authorHasPlan).toBe(false);
    const class_ = await new Client().raw(`/class/${ownerId}`);
    expect(await class_.text()).not.toContain("Borrowed lesson");

    // Given a role again it serves again; its author may always delete it.
    await inviteByName(c.owner.client, plan, name, ie, "editor");
    expect((await new Client().get(`/api/v1/walkthroughs/${id}`)).status).toBe(200);
    expect((await c.owner.client.del(`/api/v1/plans/${plan}/members/${iid}`)).status).toBe(200);
    expect((await ines.del(`/api/v1/walkthroughs/${id}`)).status).toBe(200);
  });
});
