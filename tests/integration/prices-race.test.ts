/** Two or more first saves of a price list at once: all succeed (one row per account), none answers 500. */
import { describe, it, expect } from "vitest";
import { hasServer, newMember } from "./helpers/client";

const list = (cents: number) => ({ currency: "USD", items: [{ key: "ply-18", name: "3/4 ply", unit: "sheet", packSize: 1, priceCents: cents }] });

describe.skipIf(!hasServer)("price list: parallel first saves", () => {
  it("12 first saves in flight for one account: each 200 (or 409), never 500, and one list remains", async () => {
    for (let round = 0; round < 3; round++) {
      const { client } = await newMember(`race-${round}`);
      const answers = await Promise.all(Array.from({ length: 12 }, (_, i) => client.put("/api/v1/prices", list(1000 + i))));
      for (const a of answers) expect([200, 409], JSON.stringify(a.body)).toContain(a.status);
      expect(answers.filter((a) => a.status === 200).length).toBeGreaterThan(0);
      const now = await client.get("/api/v1/prices");
      expect(now.body.prices.isDefault).toBe(false);
      expect(now.body.prices.items).toHaveLength(1);
      expect(now.body.prices.items[0].priceCents).toBeGreaterThanOrEqual(1000);
      expect(now.body.prices.items[0].priceCents).toBeLessThan(1012);
      // Saving again updates the same row.
      expect((await client.put("/api/v1/prices", list(777))).status).toBe(200);
      expect((await client.get("/api/v1/prices")).body.prices.items[0].priceCents).toBe(777);
    }
  });
});
