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
