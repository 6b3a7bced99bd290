import { describe, it, expect, beforeAll } from "vitest";
import { Client, hasServer, newMember } from "./helpers/client";

describe.skipIf(!hasServer)("price list API against the real server and PostgreSQL", () => {
  let alice: Client;
  let bob: Client;
  beforeAll(async () => {
    alice = (await newMember("prices-a")).client;
    bob = (await newMember("prices-b")).client;
  });

  it("answers 401 without a session", async () => {
    const anon = new Client();
    const r = await anon.get("/api/v1/prices");
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe("unauthorized");
    expect((await anon.put("/api/v1/prices", { items: [] })).status).toBe(401);
  });

  it("starts with the example prices, saves my own and resets", async () => {
    const first = await alice.get("/api/v1/prices");
    expect(first.status).toBe(200);
    expect(first.body.prices.isDefault).toBe(true);
    const ply = first.body.prices.items.find((i: { key: string }) => i.key === "ply-18");
    expect(ply.example).toBe(true);
    // Example price in the app's list: 7200 cents.
    expect(ply.priceCents).toBe(7200);

    const mine = { currency: "USD", items: [{ key: "ply-18", name: "3/4 ply from the yard", unit: "sheet", packSize: 1, priceCents: 6450 }, { key: "slide-*", name: "Slides", unit: "pair", priceCents: 1500 }] };
    const put = await alice.put("/api/v1/prices", mine);
    expect(put.status).toBe(200);
    expect(put.body.prices.isDefault).toBe(false);
    const read = await alice.get("/api/v1/prices");
    expect(read.body.prices.items).toHaveLength(2);
    expect(read.body.prices.items[0].priceCents).toBe(6450);
    expect(read.body.prices.items[1].packSize).toBe(1);
    expect(read.body.prices.items[1].example).toBe(false);

    // Another account still sees the examples.
    expect((await bob.get("/api/v1/prices")).body.prices.isDefault).toBe(true);

    const reset = await alice.del("/api/v1/prices");
    expect(reset.status).toBe(200);
    expect((await alice.get("/api/v1/prices")).body.prices.isDefault).toBe(true);
  });

  it("rejects bad prices with 422 and field messages", async () => {
    const bad = await alice.put("/api/v1/prices", { items: [{ key: "ply 18!", name: "", unit: "sheet", priceCents: -5 }] });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(["items.0.key", "items.0.name", "items.0.priceCents"]));
    const dup = await alice.put("/api/v1/prices", { items: [{ key: "a", name: "A", unit: "each", priceCents: 1 }, { key: "a", name: "A", unit: "each", priceCents: 2 }] });
    expect(dup.status).toBe(422);
  });
});

describe.skipIf(!hasServer)("plan CSV exports", () => {
  let alice: Client;
  let bob: Client;
  let planId = "";
  beforeAll(async () => {
    alice = (await newMember("csv-a")).client;
    bob = (await newMember("csv-b")).client;
    const document = {
      schemaVersion: 1,
      room: { walls: [{ id: "a", lengthMm: 6000 }, { id: "b", lengthMm: 5000 }, { id: "c", lengthMm: 6000 }, { id: "d", lengthMm: 5000 }] },
      fixtures: [{ id: "cab-1", kind: "base-cabinet", label: "Cabinet, left", placement: { mode: "wall", wallId: "a", offsetMm: 0 }, params: {} }],
    };
    const r = await alice.post("/api/v1/plans", { name: "Export test", document });
    expect(r.status).toBe(201);
    planId = r.body.plan.id;
  });

  it("downloads the parts list as CSV for members only", async () => {
    const res = await alice.raw(`/api/v1/plans/${planId}/export/parts.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    expect(res.headers.get("content-disposition")).toContain("export-test-parts.csv");
    const text = await res.text();
    const lines = text.split("\r\n");
    // The label pencilled on each piece comes first (the build result's labels).
    expect(lines[0]).toBe("Label,Fixture,Part,Qty,Length,Width,Thickness,Length (mm),Width (mm),Thickness (mm),Material,Stock,Grain,Edges,Joinery");
    expect(lines.length).toBeGreaterThan(5);
    expect((await bob.get(`/api/v1/plans/${planId}/export/parts.csv`)).status).toBe(404);
    expect((await new Client().get(`/api/v1/plans/${planId}/export/parts.csv`)).status).toBe(401);
  });

  it("prices the shopping list with my own prices and checks the allowance", async () => {
    await alice.put("/api/v1/prices", { items: [{ key: "ply-18", name: "My ply", unit: "sheet", packSize: 1, priceCents: 1000 }] });
    const res = await alice.raw(`/api/v1/plans/${planId}/export/shopping.csv?allowance=0`);
    expect(res.status).toBe(200);
    const text = await res.text();
    // The 3/4 in plywood line carries my price, 1000 cents a sheet, and no "example" mark.
    const ply = text.split("\r\n").find((l) => l.startsWith("sheet,") && l.includes(",10.00,"));
    expect(ply, text).toBeDefined();
    expect(ply).toContain(",no,");
    expect(text).toMatch(/\r\ntotal,All,/);
    const bad = await alice.get(`/api/v1/plans/${planId}/export/shopping.csv?allowance=abc`);
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.allowance).toBeDefined();
    await alice.del("/api/v1/prices");
  });
});
