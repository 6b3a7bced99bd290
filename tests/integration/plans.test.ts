import { describe, it, expect, beforeAll } from "vitest";
import { Client, hasServer, newMember } from "./helpers/client";

const doc = (wallMm = 6000) => ({
  schemaVersion: 1,
  room: { walls: [{ id: "a", lengthMm: wallMm }, { id: "b", lengthMm: 5000 }, { id: "c", lengthMm: wallMm }, { id: "d", lengthMm: 5000 }] },
});

describe.skipIf(!hasServer)("plans API against the real server and PostgreSQL", () => {
  let alice: Client;
  let bob: Client;
  beforeAll(async () => {
    alice = (await newMember("alice")).client;
    bob = (await newMember("bob")).client;
  });

  it("answers 401 without a session, with the JSON error envelope", async () => {
    const anon = new Client();
    const r = await anon.get("/api/v1/plans");
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe("unauthorized");
    expect((await anon.post("/api/v1/plans", { name: "x" })).status).toBe(401);
  });

  it("creates, lists, reads, renames and saves a plan", async () => {
    const created = await alice.post("/api/v1/plans", { name: "Corner shop", document: doc() });
    expect(created.status).toBe(201);
    const id = created.body.plan.id as string;
    expect(created.body.plan.version).toBe(1);

    const list = await alice.get("/api/v1/plans");
    expect(list.body.plans.map((p: { id: string }) => p.id)).toContain(id);

    const read = await alice.get(`/api/v1/plans/${id}`);
    expect(read.status).toBe(200);
    expect(read.body.plan.document.room.walls[0].lengthMm).toBe(6000);
    // defaults were filled in by the engine's schema
    expect(read.body.plan.document.settings.units).toBe("in");

    expect((await alice.patch(`/api/v1/plans/${id}`, { name: "Corner shop, v2" })).body.plan.name).toBe("Corner shop, v2");

    const saved = await alice.put(`/api/v1/plans/${id}`, { document: doc(6100), version: 1 });
    expect(saved.status).toBe(200);
    expect(saved.body.plan.version).toBe(2);
    expect(saved.body.plan.document.room.walls[0].lengthMm).toBe(6100);
  });

  it("answers 409 on a stale version and leaves the stored document unchanged", async () => {
    const id = (await alice.post("/api/v1/plans", { name: "Race", document: doc() })).body.plan.id;
    expect((await alice.put(`/api/v1/plans/${id}`, { document: doc(6200), version: 1 })).status).toBe(200);
    const stale = await alice.put(`/api/v1/plans/${id}`, { document: doc(9999), version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("stale_version");
    expect(stale.body.error.currentVersion).toBe(2);
    const now = await alice.get(`/api/v1/plans/${id}`);
    expect(now.body.plan.document.room.walls[0].lengthMm).toBe(6200);
    expect(now.body.plan.version).toBe(2);
  });

  it("answers 422 with field messages on bad bodies", async () => {
    const noName = await alice.post("/api/v1/plans", { name: "" });
    expect(noName.status).toBe(422);
    expect(noName.body.error.fields.name).toMatch(/name/i);

    const badDoc = await alice.post("/api/v1/plans", { name: "Bad", document: { schemaVersion: 1, room: { walls: [{ id: "a", lengthMm: -5 }] } } });
    expect(badDoc.status).toBe(422);
    expect(Object.keys(badDoc.body.error.fields)).toEqual(expect.arrayContaining(["document.room.walls.0.lengthMm"]));

    const notJson = await alice.req("POST", "/api/v1/plans", "{not json");
    expect(notJson.status).toBe(422);
    expect(notJson.body.error.code).toBe("invalid_json");

    const id = (await alice.post("/api/v1/plans", { name: "Keep" })).body.plan.id;
    const noVersion = await alice.put(`/api/v1/plans/${id}`, { document: doc() });
    expect(noVersion.status).toBe(422);
    expect(noVersion.body.error.fields.version).toBeTruthy();
  });

  it("answers 404 for another account's plan and for unknown ids", async () => {
    const id = (await alice.post("/api/v1/plans", { name: "Private" })).body.plan.id;
    expect((await bob.get(`/api/v1/plans/${id}`)).status).toBe(404);
    expect((await bob.put(`/api/v1/plans/${id}`, { document: doc(), version: 1 })).status).toBe(404);
    expect((await bob.del(`/api/v1/plans/${id}`)).status).toBe(404);
    expect((await bob.get(`/api/v1/plans/${id}/revisions`)).status).toBe(404);
    expect((await alice.get(`/api/v1/plans/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await alice.get(`/api/v1/plans/not-a-uuid`)).status).toBe(404);
    expect((await bob.get("/api/v1/plans")).body.plans.map((p: { id: string }) => p.id)).not.toContain(id);
  });

  it("soft-deletes a plan and restores it", async () => {
    const id = (await alice.post("/api/v1/plans", { name: "Oops" })).body.plan.id;
    expect((await alice.del(`/api/v1/plans/${id}`)).status).toBe(200);
    expect((await alice.get(`/api/v1/plans/${id}`)).status).toBe(404);
    const deleted = await alice.get("/api/v1/plans?deleted=1");
    expect(deleted.body.plans.map((p: { id: string }) => p.id)).toContain(id);
    expect((await bob.post(`/api/v1/plans/${id}/restore`)).status).toBe(404);
    expect((await alice.post(`/api/v1/plans/${id}/restore`)).status).toBe(200);
    expect((await alice.get(`/api/v1/plans/${id}`)).status).toBe(200);
  });

  it("keeps every replaced document as a revision and restores one as a new save", async () => {
    const id = (await alice.post("/api/v1/plans", { name: "History", document: doc(6000) })).body.plan.id;
    await alice.put(`/api/v1/plans/${id}`, { document: doc(6100), version: 1 });
    await alice.put(`/api/v1/plans/${id}`, { document: doc(6200), version: 2 });
    const revs = await alice.get(`/api/v1/plans/${id}/revisions`);
    expect(revs.status).toBe(200);
    expect(revs.body.revisions.map((r: { version: number }) => r.version)).toEqual([2, 1]);
    const first = revs.body.revisions[1];
    const preview = await alice.get(`/api/v1/plans/${id}/revisions/${first.id}`);
    expect(preview.body.revision.document.room.walls[0].lengthMm).toBe(6000);

    const stale = await alice.post(`/api/v1/plans/${id}/revisions/${first.id}/restore`, { version: 1 });
    expect(stale.status).toBe(409);
    const restored = await alice.post(`/api/v1/plans/${id}/revisions/${first.id}/restore`, { version: 3 });
    expect(restored.status).toBe(200);
    expect(restored.body.plan.version).toBe(4);
    expect(restored.body.plan.document.room.walls[0].lengthMm).toBe(6000);
    expect((await alice.get(`/api/v1/plans/${id}/revisions`)).body.revisions).toHaveLength(3);
    expect((await bob.post(`/api/v1/plans/${id}/revisions/${first.id}/restore`, { version: 4 })).status).toBe(404);
  });

  it("duplicates a plan", async () => {
    const id = (await alice.post("/api/v1/plans", { name: "Original", document: doc(6300) })).body.plan.id;
    const copy = await alice.post(`/api/v1/plans/${id}/duplicate`);
    expect(copy.status).toBe(201);
    expect(copy.body.plan.name).toBe("Original (copy)");
    expect(copy.body.plan.document.room.walls[0].lengthMm).toBe(6300);
    expect(copy.body.plan.id).not.toBe(id);
  });
});

describe.skipIf(!hasServer)("plan files: export and import", () => {
  it("exports a plan and imports it back as a new plan; refuses files that are not plans", async () => {
    const { client } = await newMember("porter");
    const id = (await client.post("/api/v1/plans", { name: "Export me", document: doc(6400) })).body.plan.id;
    const exported = await client.get(`/api/v1/plans/${id}/export`);
    expect(exported.status).toBe(200);
    expect(exported.headers.get("content-disposition")).toContain("export-me.benchwright.json");
    expect(exported.body.format).toBe("benchwright-plan");
    const imported = await client.post("/api/v1/plans/import", exported.body);
    expect(imported.status).toBe(201);
    expect(imported.body.plan.id).not.toBe(id);
    expect(imported.body.plan.document.room.walls[0].lengthMm).toBe(6400);

    const wrong = await client.post("/api/v1/plans/import", { format: "something-else", name: "x", document: {} });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.format).toMatch(/not a Benchwright plan/);
    const newer = await client.post("/api/v1/plans/import", { format: "benchwright-plan", name: "x", document: { schemaVersion: 99 } });
    expect(newer.status).toBe(422);
    expect(newer.body.error.fields["document.schemaVersion"]).toBeTruthy();
    const stranger = (await newMember("nosy")).client;
    expect((await stranger.get(`/api/v1/plans/${id}/export`)).status).toBe(404);
  });
});
