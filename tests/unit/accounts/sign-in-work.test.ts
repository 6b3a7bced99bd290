import { afterEach, describe, it, expect, vi } from "vitest";
import bcrypt from "bcryptjs";
import { DUMMY_HASH, HASH_ROUNDS, hashPassword, verifyPassword } from "@/lib/server/passwords";
import { pairWaitSeconds } from "@/lib/server/rate-limit";
import { isLive } from "@/lib/server/session-state";

afterEach(() => vi.restoreAllMocks());

describe("the same work for unknown and known accounts", () => {
  it("compares an unknown account's password against a dummy hash of the stored cost", async () => {
    expect(bcrypt.getRounds(DUMMY_HASH)).toBe(HASH_ROUNDS);
    const stored = await hashPassword("Maple-veneer-19");
    expect(bcrypt.getRounds(stored)).toBe(HASH_ROUNDS);
    const compare = vi.spyOn(bcrypt, "compare");
    expect(await verifyPassword("Maple-veneer-19", null)).toBe(false);
    expect(await verifyPassword("Maple-veneer-19", undefined)).toBe(false);
    expect(await verifyPassword("Maple-veneer-19", stored)).toBe(true);
    expect(await verifyPassword("wrong-one-1", stored)).toBe(false);
    // Each path ran exactly one bcrypt compare, at the same cost: unknown accounts against the dummy hash.
    expect(compare.mock.calls.map((c) => c[1])).toEqual([DUMMY_HASH, DUMMY_HASH, stored, stored]);
  });

  it("never accepts any password for an unknown account, not even the dummy hash's secret", async () => {
    expect(await verifyPassword("", null)).toBe(false);
    expect(await verifyPassword("x".repeat(200), null)).toBe(false);
  });
});

describe("sign-in delays for one account from one address", () => {
  const limits = { free: 8, baseSeconds: 5, maxSeconds: 900 };
  const t0 = new Date("2026-12-02T10:00:00Z");
  const later = (s: number) => new Date(t0.getTime() + s * 1000);

  it("lets the first tries through, then doubles the wait after each failure, up to the maximum", () => {
    expect(pairWaitSeconds(0, null, t0, limits)).toBe(0);
    expect(pairWaitSeconds(7, t0, t0, limits)).toBe(0);
    expect(pairWaitSeconds(8, t0, t0, limits)).toBe(5);
    expect(pairWaitSeconds(9, t0, t0, limits)).toBe(10);
    expect(pairWaitSeconds(10, t0, t0, limits)).toBe(20);
    expect(pairWaitSeconds(15, t0, t0, limits)).toBe(640);
    expect(pairWaitSeconds(16, t0, t0, limits)).toBe(900);
    expect(pairWaitSeconds(1e6, t0, t0, limits)).toBe(900);
  });

  it("counts the wait from the last failure, so it ends (no lock)", () => {
    expect(pairWaitSeconds(8, t0, later(2), limits)).toBe(3);
    expect(pairWaitSeconds(8, t0, later(4.2), limits)).toBe(1);
    expect(pairWaitSeconds(8, t0, later(5), limits)).toBe(0);
    expect(pairWaitSeconds(9, t0, later(60), limits)).toBe(0);
  });
});

describe("a session is live only at the account's current version", () => {
  const state = { sessionVersion: 3, disabled: false };
  it("accepts the current version and refuses older, newer, missing, disabled and deleted", () => {
    expect(isLive({ uid: "u", sv: 3 }, state)).toBe(true);
    expect(isLive({ uid: "u", sv: 2 }, state)).toBe(false);
    expect(isLive({ uid: "u", sv: 4 }, state)).toBe(false);
    // Cookies issued before versions existed carry none.
    expect(isLive({ uid: "u", sv: undefined }, state)).toBe(false);
    expect(isLive({ uid: "u", sv: 3 }, { ...state, disabled: true })).toBe(false);
    expect(isLive({ uid: "u", sv: 3 }, null)).toBe(false);
  });
});
