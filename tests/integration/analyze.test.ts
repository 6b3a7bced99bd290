import { describe, expect, it } from "vitest";
import { BASE_URL, hasServer } from "./helpers/client";

const FT = 304.8;

if (!hasServer) console.warn("analyze.test.ts skipped: BW_BASE_URL is not set (scripts/test.sh starts the app and sets it).");

/** A two-car garage with a cabinet run, a miter station and a panel; the rack is in the panel's working space on purpose. */
function garage() {
  return {
    schemaVersion: 1,
    settings: { units: "in" },
    room: {
      walls: [
        { id: "back", lengthMm: 20 * FT },
        { id: "right", lengthMm: 22 * FT },
        { id: "front", lengthMm: 20 * FT },
        { id: "left", lengthMm: 22 * FT },
      ],
      openings: [{ id: "big-door", kind: "garage-door", wallId: "front", offsetMm: 2 * FT, widthMm: 16 * FT }],
      obstacles: [{ id: "panel-1", kind: "panel", placement: { mode: "wall", wallId: "right", offsetMm: 3 * FT, elevationMm: 1200 } }],
    },
    fixtures: [
      { id: "cab-a", kind: "base-cabinet", placement: { mode: "wall", wallId: "back", offsetMm: 2500 } },
      { id: "saw", kind: "tool-shelf", placement: { mode: "wall", wallId: "back", offsetMm: 3262 } },
      { id: "cab-b", kind: "base-cabinet", placement: { mode: "wall", wallId: "back", offsetMm: 4074.8 } },
      { id: "rack", kind: "lumber-rack", placement: { mode: "wall", wallId: "right", offsetMm: 3 * FT + 100 } },
    ],
  };
}

async function post(body: unknown, raw = false) {
  const res = await fetch(`${BASE_URL}/api/v1/analyze`, { method: "POST", headers: { "content-type": "application/json" }, body: raw ? (body as string) : JSON.stringify(body) });
  return { status: res.status, body: await res.json() };
}

describe.skipIf(!hasServer)("POST /api/v1/analyze (stateless)", () => {
  it("returns findings, zones and a parts summary for a plan", async () => {
    const r = await post(garage());
    expect(r.status).toBe(200);
    expect(r.body.summary.fixtures).toBe(4);
    expect(r.body.parts.lines).toBeGreaterThan(10);
    expect(r.body.zones.some((z: { id: string }) => z.id === "panel-1:working-space")).toBe(true);
    // NEC 110.26(A)(1): 3 ft for 0-150 V; the rack stands in front of the panel.
    const panel = r.body.findings.find((f: { ruleId: string; pass: boolean; required?: number }) => f.ruleId === "panel-working-space" && !f.pass && f.required && f.required > 900);
    expect(panel.required).toBeCloseTo(914.4, 1);
    expect(panel.message).toContain("Lumber rack");
    // The flush tool shelf takes the counters' height (within 1/32 in, plan default).
    const flush = r.body.findings.filter((f: { ruleId: string }) => f.ruleId === "table-flush");
    expect(flush.length).toBe(2);
    expect(flush.every((f: { pass: boolean }) => f.pass)).toBe(true);
    expect(r.body.numbers.walkwayMm).toBeCloseTo(914.4, 6);
  }, 60_000); // the first request may compile the route on a dev server

  it("applies preset numbers and says so", async () => {
    const r = await post({ plan: garage(), preset: { walkwayMm: 42 * 25.4 } });
    expect(r.status).toBe(200);
    expect(r.body.numbers.walkwayMm).toBeCloseTo(1066.8, 6);
    expect(r.body.findings.some((f: { message: string }) => f.message.includes("(class preset)"))).toBe(true);
  });

  it("answers 422 with the path of each bad field", async () => {
    const bad = garage();
    (bad.room.walls[1] as { lengthMm: unknown }).lengthMm = -5;
    (bad.fixtures[0] as { placement: { wallId: string } }).placement.wallId = "nowhere";
    const r = await post(bad);
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe("invalid");
    expect(Object.keys(r.body.error.fields)).toContain("room.walls.1.lengthMm");
    const r2 = await post({ ...garage(), fixtures: [{ ...garage().fixtures[0], params: { widthMm: "wide" } }] });
    expect(r2.status).toBe(422);
    expect(Object.keys(r2.body.error.fields).some((k) => k.startsWith("fixtures.0.params."))).toBe(true);
  });

  it("prefixes paths inside a { plan, preset } body, and checks preset numbers", async () => {
    const bad = garage();
    (bad.room.walls[0] as { lengthMm: unknown }).lengthMm = "ten feet";
    const r = await post({ plan: bad });
    expect(r.status).toBe(422);
    expect(Object.keys(r.body.error.fields)).toContain("plan.room.walls.0.lengthMm");
    // NEC floor: a preset may not loosen the 3 ft panel depth.
    const r2 = await post({ plan: garage(), preset: { panelDepthLowVoltageMm: 600 } });
    expect(r2.status).toBe(422);
    expect(Object.keys(r2.body.error.fields)).toContain("preset.panelDepthLowVoltageMm");
  });

  it("answers 422 for malformed JSON, a missing version and a newer version", async () => {
    expect((await post("{not json", true)).status).toBe(422);
    const noVersion = await post({ room: garage().room });
    expect(noVersion.status).toBe(422);
    expect(Object.keys(noVersion.body.error.fields)).toContain("schemaVersion");
    expect((await post({ ...garage(), schemaVersion: 99 })).status).toBe(422);
  });

  it("answers 413 for a body over about 1 MB", async () => {
    const big = { ...garage(), padding: "x".repeat(1_100_000) };
    const r = await post(big);
    expect(r.status).toBe(413);
    expect(r.body.error.code).toBe("too_large");
  });
});

describe.skipIf(!hasServer)("GET /api/v1/schema/plan", () => {
  it("serves the plan JSON Schema", async () => {
    const res = await fetch(`${BASE_URL}/api/v1/schema/plan`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("application/schema+json");
    const s = await res.json();
    expect(s.$schema).toContain("2020-12");
    expect(s.properties.room).toBeDefined();
    expect(s.title).toMatch(/plan document/);
  });
});
