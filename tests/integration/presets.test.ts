import { describe, it, expect, beforeAll } from "vitest";
import { Client, demo, hasServer } from "./helpers/client";
import { cast, planWithRoles, type Cast } from "./helpers/sharing";

const IN = 25.4;
// A stricter class preset: walkways 42 in (NKBA work aisle for one cook, secondary copy; TRADE.md),
// longest stock 10 ft, flush tolerance 1/64 in (our own classroom choice).
const strict = { walkwayMm: 42 * IN, longestStockMm: 120 * IN, flushToleranceMm: IN / 64 };

describe.skipIf(!hasServer)("rule presets: instructors make them, plans adopt them", () => {
  let c: Cast;
  let ines: Client;
  let planId: string;
  beforeAll(async () => {
    c = await cast();
    ines = await demo("instructor");
    planId = await planWithRoles(c, "Class bench");
  });

  it("an instructor creates, publishes and edits a preset; members cannot", async () => {
    expect((await c.owner.client.post("/api/v1/presets", { name: "Mine", numbers: strict })).status).toBe(403);
    const made = await ines.post("/api/v1/presets", { name: "Shop class, strict", description: "Wider aisles for a room of students.", numbers: strict });
    expect(made.status).toBe(201);
    expect(made.body.preset.numbers.walkwayMm).toBeCloseTo(1066.8, 6);
    expect(made.body.preset.published).toBe(false);
    const id = made.body.preset.id as string;

    // A draft is invisible to others (404), visible to its author.
    expect((await c.owner.client.get(`/api/v1/presets/${id}`)).status).toBe(404);
    expect((await ines.get(`/api/v1/presets/${id}`)).status).toBe(200);

    const pub = await ines.put(`/api/v1/presets/${id}`, { name: "Shop class, strict", numbers: strict, published: true });
    expect(pub.body.preset.published).toBe(true);
    expect((await new Client().get(`/api/v1/presets/${id}`)).status).toBe(200);
    expect((await c.owner.client.put(`/api/v1/presets/${id}`, { name: "hijack", numbers: strict })).status).toBe(403);
    const listed = await new Client().get(`/api/v1/presets?owner=${pub.body.preset.ownerId}`);
    expect(listed.body.presets.map((p: { id: string }) => p.id)).toContain(id);
  });

  it("refuses unknown keys, negative numbers and loosening a code value", async () => {
    const bad = await ines.post("/api/v1/presets", { name: "Bad", numbers: { walkwayMm: -1, notARule: 3 } });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields["numbers.walkwayMm"]).toMatch(/negative/);
    expect(bad.body.error.fields["numbers.notARule"]).toBeTruthy();
    // NEC Table 110.26(A)(1): 3 ft (914.4 mm) minimum depth at 0-150 V; a preset may not go below it.
    const loose = await ines.post("/api/v1/presets", { name: "Loose", numbers: { panelDepthLowVoltageMm: 600 } });
    expect(loose.body.error.fields["numbers.panelDepthLowVoltageMm"]).toMatch(/not loosen/);
    const tighter = await ines.post("/api/v1/presets", { name: "Tighter panel", numbers: { panelDepthLowVoltageMm: 1219.2 } });
    expect(tighter.status).toBe(201);
    expect((await ines.post("/api/v1/presets", { name: "Empty", numbers: {} })).status).toBe(422);
  });

  it("a plan adopts a published preset as a versioned save; viewers cannot", async () => {
    const made = await ines.post("/api/v1/presets", { name: "Adoptable", numbers: strict, published: true });
    const presetId = made.body.preset.id as string;
    const plan = (await c.owner.client.get(`/api/v1/plans/${planId}`)).body.plan;
    expect((await c.viewer.client.put(`/api/v1/plans/${planId}/preset`, { presetId, version: plan.version })).status).toBe(403);
    const adopted = await c.editor.client.put(`/api/v1/plans/${planId}/preset`, { presetId, version: plan.version });
    expect(adopted.status).toBe(200);
    expect(adopted.body.plan.version).toBe(plan.version + 1);
    expect(adopted.body.plan.document.settings.presetId).toBe(presetId);
    // Stale version: 409, nothing written.
    expect((await c.editor.client.put(`/api/v1/plans/${planId}/preset`, { presetId: null, version: plan.version })).status).toBe(409);
    const seen = await c.viewer.client.get(`/api/v1/plans/${planId}/preset`);
    expect(seen.body.preset.numbers.longestStockMm).toBeCloseTo(3048, 6);

    // Someone else's draft cannot be adopted.
    const draft = await ines.post("/api/v1/presets", { name: "Draft", numbers: strict });
    expect((await c.editor.client.put(`/api/v1/plans/${planId}/preset`, { presetId: draft.body.preset.id, version: plan.version + 1 })).status).toBe(404);

    // A shared link carries the preset so the read-only checks use it.
    const link = await c.owner.client.post(`/api/v1/plans/${planId}/links`, {});
    const shared = await new Client().get(`/api/v1/shared/${link.body.token}`);
    expect(shared.body.preset.name).toBe("Adoptable");
  });

  it("deletes a preset (author only)", async () => {
    const made = await ines.post("/api/v1/presets", { name: "Temporary", numbers: strict, published: true });
    expect((await c.owner.client.del(`/api/v1/presets/${made.body.preset.id}`)).status).toBe(403);
    expect((await ines.del(`/api/v1/presets/${made.body.preset.id}`)).status).toBe(200);
    expect((await ines.get(`/api/v1/presets/${made.body.preset.id}`)).status).toBe(404);
  });

  it("a plan's preset route shows only published presets or the caller's own: a draft id typed into settings answers 404", async () => {
    const draft = (await ines.post("/api/v1/presets", { name: "Not yet public", numbers: strict })).body.preset.id as string;
    const typed = await planWithRoles(c, "Typed preset id");
    const plan = (await c.owner.client.get(`/api/v1/plans/${typed}`)).body.plan;
    const document = { ...plan.document, settings: { ...plan.document.settings, presetId: draft } };
    expect((await c.owner.client.put(`/api/v1/plans/${typed}`, { document, version: plan.version })).status).toBe(200);
    for (const who of [c.owner, c.editor, c.viewer]) {
      const r = await who.client.get(`/api/v1/plans/${typed}/preset`);
      expect(r.status).toBe(404);
      expect(JSON.stringify(r.body)).not.toContain("Not yet public");
    }
    // Nor through a share link.
    const link = await c.owner.client.post(`/api/v1/plans/${typed}/links`, {});
    const shared = await new Client().get(`/api/v1/shared/${link.body.token}`);
    expect(shared.status).toBe(200);
    expect(shared.body.preset).toBeNull();
    expect(JSON.stringify(shared.body)).not.toContain("Not yet public");
    // Once published it shows; unpublished again, it is hidden again (current access, not access at adoption).
    expect((await ines.put(`/api/v1/presets/${draft}`, { name: "Not yet public", numbers: strict, published: true })).status).toBe(200);
    expect((await c.viewer.client.get(`/api/v1/plans/${typed}/preset`)).body.preset.id).toBe(draft);
    expect((await ines.put(`/api/v1/presets/${draft}`, { name: "Not yet public", numbers: strict, published: false })).status).toBe(200);
    expect((await c.viewer.client.get(`/api/v1/plans/${typed}/preset`)).status).toBe(404);
  });
});
