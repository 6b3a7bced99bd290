import { describe, it, expect, beforeAll } from "vitest";
import { Client, hasServer } from "./helpers/client";
import { cast, planWithRoles, type Cast } from "./helpers/sharing";

describe.skipIf(!hasServer)("share links, collaborators and copies", () => {
  let c: Cast;
  let planId: string;
  beforeAll(async () => {
    c = await cast();
    planId = await planWithRoles(c, "Garage bay shop");
  });

  it("makes an unguessable link that opens read-only without an account and records the opening", async () => {
    const made = await c.owner.client.post(`/api/v1/plans/${planId}/links`, { label: "for Sam", expiresInDays: 7 });
    expect(made.status).toBe(201);
    const token = made.body.token as string;
    // 32 random bytes in base64url: 43 characters, 256 bits (the issue asks for at least 128).
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(made.body.url).toContain(`/s/${token}`);
    const expires = Date.parse(made.body.link.expiresAt);
    expect(Math.abs(expires - (Date.now() + 7 * 86_400_000))).toBeLessThan(60_000);

    const anon = new Client();
    const opened = await anon.get(`/api/v1/shared/${token}`);
    expect(opened.status).toBe(200);
    expect(opened.headers.get("x-robots-tag")).toContain("noindex");
    expect(opened.body.plan.name).toBe("Garage bay shop");
    expect(opened.body.plan.document.room.walls).toHaveLength(4);
    // The shared read names no ids or e-mail addresses of the owner.
    expect(JSON.stringify(opened.body)).not.toContain(c.owner.email);
    await anon.get(`/api/v1/shared/${token}`);

    const links = await c.owner.client.get(`/api/v1/plans/${planId}/links`);
    const row = links.body.links.find((l: { id: string }) => l.id === made.body.link.id);
    expect(row.openCount).toBe(2);
    expect(row.state).toBe("live");
    expect(Date.now() - Date.parse(row.lastOpenedAt)).toBeLessThan(60_000);
    // The token is given once; the list never shows it again.
    expect(JSON.stringify(links.body)).not.toContain(token);
  });

  it("copies a shared plan into the signed-in account with a note of where it came from", async () => {
    const made = await c.owner.client.post(`/api/v1/plans/${planId}/links`, {});
    const token = made.body.token as string;
    expect((await new Client().post(`/api/v1/shared/${token}/copy`)).status).toBe(401);
    const copy = await c.stranger.client.post(`/api/v1/shared/${token}/copy`);
    expect(copy.status).toBe(201);
    expect(copy.body.plan.role).toBe("owner");
    expect(copy.body.plan.id).not.toBe(planId);
    expect(copy.body.plan.copiedFrom).toMatch(/Copied from "Garage bay shop" shared by Test owner/);
    // The copy is the stranger's own; the original stays out of reach.
    expect((await c.stranger.client.get(`/api/v1/plans/${copy.body.plan.id}`)).status).toBe(200);
    expect((await c.stranger.client.get(`/api/v1/plans/${planId}`)).status).toBe(404);
  });

  it("revoked, expired and unknown links answer 404", async () => {
    const made = await c.owner.client.post(`/api/v1/plans/${planId}/links`, {});
    const token = made.body.token as string;
    const del = await c.owner.client.del(`/api/v1/plans/${planId}/links/${made.body.link.id}`);
    expect(del.body.link.state).toBe("revoked");
    expect((await new Client().get(`/api/v1/shared/${token}`)).status).toBe(404);
    expect((await c.stranger.client.post(`/api/v1/shared/${token}/copy`)).status).toBe(404);

    const past = await c.owner.client.post(`/api/v1/plans/${planId}/links`, { expiresAt: new Date(Date.now() - 60_000).toISOString() });
    expect(past.status).toBe(422);
    expect(past.body.error.fields.expiresAt).toBeTruthy();

    // A link that expires in 1.5 s works, then answers 404.
    const soon = await c.owner.client.post(`/api/v1/plans/${planId}/links`, { expiresAt: new Date(Date.now() + 1500).toISOString() });
    expect((await new Client().get(`/api/v1/shared/${soon.body.token}`)).status).toBe(200);
    await new Promise((r) => setTimeout(r, 1800));
    expect((await new Client().get(`/api/v1/shared/${soon.body.token}`)).status).toBe(404);
    const listed = await c.owner.client.get(`/api/v1/plans/${planId}/links`);
    expect(listed.body.links.find((l: { id: string }) => l.id === soon.body.link.id).state).toBe("expired");

    expect((await new Client().get(`/api/v1/shared/${"x".repeat(43)}`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/shared/short`)).status).toBe(404);
  });

  it("only the owner manages links; editors and viewers get 403, strangers 404", async () => {
    expect((await c.editor.client.post(`/api/v1/plans/${planId}/links`, {})).status).toBe(403);
    expect((await c.viewer.client.get(`/api/v1/plans/${planId}/links`)).status).toBe(403);
    expect((await c.stranger.client.get(`/api/v1/plans/${planId}/links`)).status).toBe(404);
  });

  it("lists collaborators, changes and removes roles; an editor's save is recorded as theirs", async () => {
    const members = await c.viewer.client.get(`/api/v1/plans/${planId}/members`);
    expect(members.body.members.map((m: { role: string }) => m.role)).toEqual(["owner", "editor", "viewer"]);
    const viewerId = members.body.members[2].userId as string;

    // The viewer cannot save; promoted to editor, they can, and the revision names the editor.
    const plan = (await c.viewer.client.get(`/api/v1/plans/${planId}`)).body.plan;
    expect((await c.viewer.client.put(`/api/v1/plans/${planId}`, { document: plan.document, version: plan.version })).status).toBe(403);
    expect((await c.editor.client.patch(`/api/v1/plans/${planId}/members/${viewerId}`, { role: "editor" })).status).toBe(403);
    const promoted = await c.owner.client.patch(`/api/v1/plans/${planId}/members/${viewerId}`, { role: "editor" });
    expect(promoted.body.member.role).toBe("editor");
    const saved = await c.viewer.client.put(`/api/v1/plans/${planId}`, { document: plan.document, version: plan.version });
    expect(saved.status).toBe(200);
    const revs = await c.owner.client.get(`/api/v1/plans/${planId}/revisions`);
    expect(revs.body.revisions[0].authorName).toBe("Test viewer");

    expect((await c.owner.client.patch(`/api/v1/plans/${planId}/members/${viewerId}`, { role: "owner" })).status).toBe(422);
    expect((await c.owner.client.del(`/api/v1/plans/${planId}/members/${viewerId}`)).status).toBe(200);
    expect((await c.viewer.client.get(`/api/v1/plans/${planId}`)).status).toBe(404);
    // Put the viewer back for later tests.
    const { addMember } = await import("./helpers/sharing");
    await addMember(c.owner.client, planId, c.viewer, "viewer");
  });

  it("a collaborator may leave a plan on their own", async () => {
    const other = await c.owner.client.post("/api/v1/plans", { name: "Leave test" });
    const { addMember } = await import("./helpers/sharing");
    await addMember(c.owner.client, other.body.plan.id, c.editor, "editor");
    const me = (await c.editor.client.get(`/api/v1/plans/${other.body.plan.id}/members`)).body.members[1].userId;
    expect((await c.editor.client.del(`/api/v1/plans/${other.body.plan.id}/members/${me}`)).status).toBe(200);
    expect((await c.editor.client.get(`/api/v1/plans/${other.body.plan.id}`)).status).toBe(404);
  });
});
