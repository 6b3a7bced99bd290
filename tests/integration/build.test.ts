import { describe, it, expect, beforeAll } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { Client, hasServer } from "./helpers/client";
import { addMember, cast, type Cast } from "./helpers/sharing";

describe.skipIf(!hasServer)("build: labelled parts, setups, stop tables and steps", () => {
  let c: Cast;
  let planId: string;
  beforeAll(async () => {
    c = await cast();
    const r = await c.owner.client.post("/api/v1/plans", { name: "Saw wall", document: demoPlan() });
    expect(r.status).toBe(201);
    planId = r.body.plan.id as string;
    await addMember(c.owner.client, planId, c.viewer, "viewer");
  });

  it("owners and viewers read the same result, worked out from the stored plan", async () => {
    const own = await c.owner.client.get(`/api/v1/plans/${planId}/build`);
    expect(own.status).toBe(200);
    expect(own.headers.get("cache-control")).toContain("no-store");
    const b = own.body.build;
    expect(own.body.units).toBe("in");
    // The demo's four base cabinets share their carcass sides: one row, eight pieces, labelled after the first cabinet.
    const sides = b.rows.find((r: { name: string }) => r.name === "Carcass side");
    expect(sides.label).toBe("A3");
    expect(sides.qty).toBe(8);
    expect(b.setups.length).toBeGreaterThan(10);
    expect(b.steps[0].id).toBe("room-cut");
    expect(b.stopTables).toHaveLength(1);
    expect(b.stopTables[0].rows.some((r: { source: string }) => r.source === "plan")).toBe(true);
    for (const id of sides.partIds) expect(b.labelOf[id]).toBe("A3");
    const view = await c.viewer.client.get(`/api/v1/plans/${planId}/build`);
    expect(view.status).toBe(200);
    expect(view.body).toEqual(own.body);
  });

  it("strangers and unknown plans get 404, no session 401", async () => {
    expect((await c.stranger.client.get(`/api/v1/plans/${planId}/build`)).status).toBe(404);
    expect((await c.owner.client.get(`/api/v1/plans/00000000-0000-4000-8000-000000000000/build`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/plans/${planId}/build`)).status).toBe(401);
  });

  it("a share link reads it without an account, without counting as an opening; revoked links 404", async () => {
    const made = await c.owner.client.post(`/api/v1/plans/${planId}/links`, {});
    const token = made.body.token as string;
    const anon = await new Client().get(`/api/v1/shared/${token}/build`);
    expect(anon.status).toBe(200);
    expect(anon.headers.get("x-robots-tag")).toContain("noindex");
    const own = await c.owner.client.get(`/api/v1/plans/${planId}/build`);
    expect(anon.body).toEqual(own.body);
    const links = await c.owner.client.get(`/api/v1/plans/${planId}/links`);
    expect(links.body.links.find((l: { id: string }) => l.id === made.body.link.id).openCount).toBe(0);
    await c.owner.client.del(`/api/v1/plans/${planId}/links/${made.body.link.id}`);
    expect((await new Client().get(`/api/v1/shared/${token}/build`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/shared/short/build`)).status).toBe(404);
  });

  it("a plan with no fixtures answers 200 with a note, not an error", async () => {
    const empty = demoPlan();
    const r = await c.owner.client.post("/api/v1/plans", { name: "Empty bay", document: { ...empty, fixtures: [] } });
    const res = await c.owner.client.get(`/api/v1/plans/${r.body.plan.id}/build`);
    expect(res.status).toBe(200);
    expect(res.body.build.rows).toEqual([]);
    expect(res.body.build.notes.join(" ")).toMatch(/no fixtures/);
  });
});
