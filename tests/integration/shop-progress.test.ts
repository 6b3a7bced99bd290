/**
 * Shop-floor check-offs (GET/POST /api/v1/plans/[id]/progress) against the running app and its
 * PostgreSQL: a viewer records progress the owner then sees (with who), a repeated check-off (the
 * same id sent again after a dropped connection) is stored once, an undo subtracts, strangers get
 * 404 and bad input 422 with the field's path.
 */
import { describe, it, expect, beforeAll } from "vitest";
import { randomUUID } from "node:crypto";
import { hasServer, newMember, Client, type Res } from "./helpers/client";
import { inviteByName, uniqueName } from "./helpers/invite";
import { sampleDoc } from "./helpers/sharing";

const check = (item: string, delta: 1 | -1 = 1, madeAt = new Date().toISOString()) => ({ id: randomUUID(), item, delta, madeAt });
type Answer = { items: { item: string; count: number; by: string[]; lastAt: string }[]; checks: number; serverTime: string; accepted?: number; repeats?: number };
const countOf = (r: Res<Answer>, item: string) => r.body.items.find((i) => i.item === item)?.count ?? 0;

describe.skipIf(!hasServer)("shop-floor progress", () => {
  let owner: Client;
  let viewer: Client;
  let stranger: Client;
  let path: string;

  beforeAll(async () => {
    owner = (await newMember("shop-owner")).client;
    const v = await newMember("shop-viewer");
    viewer = v.client;
    stranger = (await newMember("shop-stranger")).client;
    const name = uniqueName("Shop floor");
    const r = await owner.post("/api/v1/plans", { name, document: sampleDoc() });
    expect(r.status).toBe(201);
    path = `/api/v1/plans/${r.body.plan.id}/progress`;
    await inviteByName(owner, r.body.plan.id, name, v, "viewer");
  }, 60_000);

  it("a viewer's check-offs reach the owner, with who made them; a repeat is stored once; an undo subtracts", async () => {
    const a = check("cut:rip-1:A1");
    const b = check("cut:rip-1:A1");
    const s = check("step:room-cut");
    const first = await viewer.post<Answer>(path, { checks: [a, b, s] });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ accepted: 3, repeats: 0 });

    const again = await viewer.post<Answer>(path, { checks: [a, b, s] });
    expect(again.body).toMatchObject({ accepted: 0, repeats: 3 });
    expect(countOf(again, "cut:rip-1:A1")).toBe(2);

    await viewer.post(path, { checks: [check("cut:rip-1:A1", -1)] });
    const seen = await owner.get<Answer>(path);
    expect(seen.status).toBe(200);
    expect(countOf(seen, "cut:rip-1:A1")).toBe(1);
    expect(countOf(seen, "step:room-cut")).toBe(1);
    expect(seen.body.items.find((i) => i.item === "step:room-cut")!.by).toEqual(["Test shop-viewer"]);
    expect(seen.body.checks).toBe(4);
  });

  it("a clock running ahead is stored as the server's now", async () => {
    const r = await owner.post<Answer>(path, { checks: [check("step:future-step", 1, "2099-01-01T00:00:00Z")] });
    const row = r.body.items.find((i) => i.item === "step:future-step")!;
    expect(Date.parse(row.lastAt)).toBeLessThanOrEqual(Date.parse(r.body.serverTime));
  });

  it("strangers get 404 and no session 401, reading or writing", async () => {
    expect((await stranger.get(path)).status).toBe(404);
    expect((await stranger.post(path, { checks: [check("step:x")] })).status).toBe(404);
    expect((await new Client().get(path)).status).toBe(401);
    expect((await owner.get(`/api/v1/plans/${randomUUID()}/progress`)).status).toBe(404);
  });

  it("refuses bad check-offs with the field's path, and stores none of the batch", async () => {
    const before = (await owner.get<Answer>(path)).body.checks;
    const cases: [unknown, string][] = [
      [{ checks: [check("piece:a:b")] }, "checks.0.item"],
      [{ checks: [check("step:ok"), { ...check("step:ok"), delta: 2 }] }, "checks.1.delta"],
      [{ checks: [{ ...check("step:ok"), id: "not-a-uuid" }] }, "checks.0.id"],
      [{ checks: [{ ...check("step:ok"), madeAt: "yesterday" }] }, "checks.0.madeAt"],
      [{ checks: [] }, "checks"],
      [{ checks: Array.from({ length: 501 }, () => check("step:many")) }, "checks"],
      [{ checks: [check(`step:${"x".repeat(2_000)}`)] }, "checks.0.item"],
    ];
    for (const [body, field] of cases) {
      const r = await owner.post(path, body);
      expect(r.status, field).toBe(422);
      expect(Object.keys(r.body.error.fields ?? {}), field).toContain(field);
    }
    const nul = await owner.post(path, { checks: [check("step:a\u0000b")] });
    expect(nul.status).toBe(422);
    expect((await owner.get<Answer>(path)).body.checks).toBe(before);
  });
});
