import { beforeAll, describe, expect, it } from "vitest";
import { buildFromPlan } from "@/lib/engine/build";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { parsePlan } from "@/lib/engine/plan/parse";
import { formatLength } from "@/lib/engine/units/format-length";
import { Client, hasServer } from "./helpers/client";
import { pdfPages } from "./helpers/pdf";
import { addMember, cast, type Cast } from "./helpers/sharing";

const NAME = "Packet test shop";

describe.skipIf(!hasServer)("build packet PDF", () => {
  let c: Cast;
  let planId = "";
  let token = "";
  let pages: string[] = [];
  let bytes = 0;
  let tag = "";

  beforeAll(async () => {
    c = await cast();
    const r = await c.owner.client.post("/api/v1/plans", { name: NAME, document: demoPlan() });
    expect(r.status).toBe(201);
    planId = r.body.plan.id;
    await addMember(c.owner.client, planId, c.viewer, "viewer");
    const link = await c.owner.client.post(`/api/v1/plans/${planId}/links`, { label: "for the shop" });
    expect(link.status).toBe(201);
    token = link.body.token;
    const res = await c.owner.client.raw(`/api/v1/plans/${planId}/packet.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="packet-test-shop-packet.pdf"');
    tag = res.headers.get("x-packet-tag") ?? "";
    expect(res.headers.get("cache-control")).toBe("private, no-store");
    const buf = new Uint8Array(await res.arrayBuffer());
    bytes = buf.length;
    expect(new TextDecoder().decode(buf.slice(0, 5))).toBe("%PDF-");
    pages = await pdfPages(buf);
  }, 120_000);

  it("has a cover, the wall pages, checks, parts, sheet maps, boards, shopping and cautions", () => {
    // Cover, at least one wall, checks, parts, one page per sheet (the demo needs several), boards, shopping, cautions.
    expect(pages.length).toBeGreaterThanOrEqual(10);
    expect(pages[0]).toContain("Build packet");
    expect(pages[0]).toContain("Still open");
    expect(pages[0]).toMatch(/revision 1/);
    const all = pages.join("\n");
    for (const heading of ["Elevation of", "Checks", "Parts list", "Board plan", "Setup sheets", "Stop table", "Build order", "Shopping list", "Cautions"]) expect(all).toContain(heading);
    expect(all).toMatch(/sheet 1 of \d+/);
    expect(bytes).toBeGreaterThan(20_000);
  });

  it("puts the plan name, the revision and page x of y on every page", () => {
    pages.forEach((text, i) => {
      expect(text).toContain(NAME);
      expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(text).toContain("Revision 1");
    });
  });

  it("lists every part with its label, and the stop table's rows", () => {
    const parsed = parsePlan(demoPlan());
    if (!parsed.ok) throw new Error("demo plan does not parse");
    const build = buildFromPlan(parsed.plan);
    expect(build.rows.length).toBeGreaterThan(10);
    const parts = pages.filter((p) => p.includes("Parts list")).join("\n");
    for (const r of build.rows) expect(parts).toMatch(new RegExp(`(^|\\s)${r.label}(\\s|$)`, "m"));
    const stops = pages.filter((p) => p.includes("Stop table")).join("\n");
    expect(build.stopTables.length).toBeGreaterThan(0);
    const len = (mm: number) => formatLength(mm, { units: parsed.plan.settings.units, precision: parsed.plan.settings.precision });
    for (const t of build.stopTables) {
      expect(stops).toContain(`Stop track ${t.letter}`);
      for (const r of t.rows) expect(stops).toContain(len(r.cutLengthMm));
    }
    const all = pages.join("\n");
    expect(all).toContain("Setup sheets");
    expect(all).toContain("Build order");
  });

  it("names the checks' sources and ends with cautions that defer to codes and manuals", () => {
    const checks = pages.filter((p) => p.includes("Checks")).join("\n");
    expect(checks).toContain("Sources:");
    expect(checks).toMatch(/NFPA 70|NEC|OSHA/);
    const cautions = pages.slice(-2).join("\n");
    expect(cautions).toContain("Cautions");
    expect(cautions).toMatch(/Local codes, licensed trades and the tool makers' manuals come first/);
    expect(cautions).toMatch(/OSHA 29 CFR 1910\.213/);
  });

  it("sends the same file again without rebuilding while the plan is unchanged", async () => {
    expect(tag).toMatch(/^[0-9a-f]{32}$/);
    const again = await c.owner.client.raw(`/api/v1/plans/${planId}/packet.pdf`);
    expect(again.status).toBe(200);
    expect(again.headers.get("x-packet-tag")).toBe(tag);
    expect(again.headers.get("x-packet-cache")).toBe("hit");
    expect((await again.arrayBuffer()).byteLength).toBe(bytes);
  });

  it("lets a viewer download it and answers 404 to a stranger and 401 without a session", async () => {
    const viewer = await c.viewer.client.raw(`/api/v1/plans/${planId}/packet.pdf`);
    expect(viewer.status).toBe(200);
    expect(viewer.headers.get("content-type")).toBe("application/pdf");
    // A viewer prices with their own (example) price list, so it is a packet of the same plan, not necessarily the same file.
    expect((await pdfPages(await viewer.arrayBuffer()))[0]).toContain(NAME);
    const stranger = await c.stranger.client.raw(`/api/v1/plans/${planId}/packet.pdf`);
    expect(stranger.status).toBe(404);
    expect((await stranger.json()).error.code).toBe("not_found");
    expect((await new Client().raw(`/api/v1/plans/${planId}/packet.pdf`)).status).toBe(401);
    expect((await c.owner.client.raw(`/api/v1/plans/00000000-0000-4000-8000-000000000000/packet.pdf`)).status).toBe(404);
    expect((await c.owner.client.raw(`/api/v1/plans/not-a-uuid/packet.pdf`)).status).toBe(404);
  });

  it("serves a share link's packet read-only, and 404 once the link is revoked", async () => {
    const anon = new Client();
    const res = await anon.raw(`/api/v1/shared/${token}/packet.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const shared = await pdfPages(await res.arrayBuffer());
    expect(shared[0]).toContain("read-only share link");
    expect(shared.every((p) => p.includes(NAME))).toBe(true);
    expect((await anon.raw(`/api/v1/shared/not-a-real-token/packet.pdf`)).status).toBe(404);
    const links = await c.owner.client.get(`/api/v1/plans/${planId}/links`);
    const id = links.body.links[0].id as string;
    expect((await c.owner.client.del(`/api/v1/plans/${planId}/links/${id}`)).status).toBe(200);
    expect((await anon.raw(`/api/v1/shared/${token}/packet.pdf`)).status).toBe(404);
  });

  it("downloads the plan view and each wall elevation as SVG files with a scale bar", async () => {
    const plan = await c.viewer.client.raw(`/api/v1/plans/${planId}/drawings/plan.svg`);
    expect(plan.status).toBe(200);
    expect(plan.headers.get("content-type")).toBe("image/svg+xml; charset=utf-8");
    expect(plan.headers.get("content-disposition")).toBe('attachment; filename="packet-test-shop-plan.svg"');
    const svg = await plan.text();
    expect(svg).toMatch(/^<\?xml/);
    expect(svg).toContain('xmlns="http://www.w3.org/2000/svg"');
    expect(svg).toContain("data-scale-bar");
    expect(svg).toMatch(/data-chain="overall"/);
    const wallId = demoPlan().room.walls[0].id;
    const wall = await c.owner.client.raw(`/api/v1/plans/${planId}/drawings/walls/${wallId}.svg`);
    expect(wall.status).toBe(200);
    expect(await wall.text()).toContain(`data-wall="${wallId}"`);
    expect((await c.owner.client.raw(`/api/v1/plans/${planId}/drawings/walls/no-such-wall.svg`)).status).toBe(404);
    expect((await c.owner.client.raw(`/api/v1/plans/${planId}/drawings/walls/${wallId}.png`)).status).toBe(404);
    expect((await c.stranger.client.raw(`/api/v1/plans/${planId}/drawings/plan.svg`)).status).toBe(404);
    expect((await new Client().raw(`/api/v1/plans/${planId}/drawings/plan.svg`)).status).toBe(401);
  });

  it("exports a plan, imports it as a new plan and exports the same document again", async () => {
    const first = await c.owner.client.raw(`/api/v1/plans/${planId}/export`);
    expect(first.status).toBe(200);
    const file = await first.json();
    const imported = await c.owner.client.post("/api/v1/plans/import", file);
    expect(imported.status).toBe(201);
    expect(imported.body.plan.id).not.toBe(planId);
    const second = await (await c.owner.client.raw(`/api/v1/plans/${imported.body.plan.id}/export`)).json();
    expect(second.format).toBe("benchwright-plan");
    expect(second.document).toEqual(file.document);
    // The original is untouched.
    expect((await c.owner.client.get(`/api/v1/plans/${planId}`)).body.plan.version).toBe(1);
  });
});
