/**
 * Sign-in limits at the service, against the real PostgreSQL (DATABASE_URL): a running server sees
 * one client address unless TRUST_PROXY is set, so two addresses are exercised here, one level down.
 */
import { afterAll, beforeAll, describe, it, expect, vi } from "vitest";
import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { MikroORM, type EntityManager } from "@mikro-orm/postgresql";
import config from "@/mikro-orm.config";
import { UserSchema } from "@/entities/User";
import { DUMMY_HASH, hashPassword } from "@/lib/server/passwords";
import { addressKey, pairKey } from "@/lib/server/rate-limit";
import { passwordSignIn } from "@/lib/server/sign-in";

const DB = process.env.DATABASE_URL ?? "";
const run = DB !== "" && !!process.env.NEXTAUTH_SECRET;

describe.skipIf(!run)("sign-in limits by account and address together", () => {
  let orm: MikroORM;
  const em = (): EntityManager => orm.em.fork();
  const password = "Walnut-and-cherry-88";
  // Addresses from the documentation ranges (RFC 5737), one set per run so reruns start clean.
  const run8 = randomUUID().slice(0, 6);
  const addrA = `192.0.2.${Math.floor(Math.random() * 250)}-${run8}`;
  const addrB = `198.51.100.7-${run8}`;

  async function account(): Promise<string> {
    const email = `limits-${randomUUID().slice(0, 8)}@example.test`;
    const e = em();
    e.create(UserSchema, { email, name: "Limits", passwordHash: await hashPassword(password), role: "member" });
    await e.flush();
    return email;
  }

  beforeAll(async () => {
    orm = await MikroORM.init({ ...config, clientUrl: DB, pool: { min: 0, max: 2 } });
  });
  afterAll(async () => {
    await orm?.close(true);
  });

  it("after 8 failures from one address, that address waits; the right password from another address signs in", async () => {
    const email = await account();
    for (let i = 0; i < 8; i++) expect((await passwordSignIn(em(), email, `wrong-${i}-x`, addrA)).kind).toBe("wrong");
    const held = await passwordSignIn(em(), email, password, addrA);
    // 5 s after the last failure (AUTH_DELAY_BASE_SECONDS); a slow machine may already have used a second of it.
    expect(held.kind).toBe("wait");
    expect(held.kind === "wait" && held.seconds >= 3 && held.seconds <= 5).toBe(true);
    const elsewhere = await passwordSignIn(em(), email, password, addrB);
    expect(elsewhere.kind).toBe("ok");
  });

  it("is a delay, not a lock: once the wait is over the right password signs in, and clears the pair", async () => {
    const email = await account();
    for (let i = 0; i < 8; i++) await passwordSignIn(em(), email, `wrong-${i}-x`, addrA);
    expect((await passwordSignIn(em(), email, password, addrA)).kind).toBe("wait");
    // Age the failures by 6 s instead of sleeping.
    await em().getConnection().execute(`update login_attempt set created_at = created_at - interval '6 seconds' where key = ?`, [pairKey(email, addrA)]);
    expect((await passwordSignIn(em(), email, password, addrA)).kind).toBe("ok");
    expect(await em().getConnection().execute(`select count(*)::int as n from login_attempt where key = ?`, [pairKey(email, addrA)])).toEqual([{ n: 0 }]);
  });

  it("grows the wait with each further failure", async () => {
    const email = await account();
    for (let i = 0; i < 8; i++) await passwordSignIn(em(), email, `wrong-${i}-x`, addrA);
    await em().getConnection().execute(`update login_attempt set created_at = created_at - interval '6 seconds' where key = ?`, [pairKey(email, addrA)]);
    expect((await passwordSignIn(em(), email, "still-wrong-1", addrA)).kind).toBe("wrong");
    const held = await passwordSignIn(em(), email, password, addrA);
    expect(held.kind === "wait" && held.seconds >= 8 && held.seconds <= 10).toBe(true);
  });

  it("stops a spray across accounts from one address (the per-address cap)", async () => {
    const spray = `203.0.113.9-${run8}`;
    // 200 failures recorded for the address (as a spray over 200 accounts would leave), without 200 bcrypt runs.
    await em().getConnection().execute(`insert into login_attempt (id, created_at, key) select gen_random_uuid(), now(), ? from generate_series(1, 200)`, [addressKey(spray)]);
    const email = await account();
    const r = await passwordSignIn(em(), email, password, spray);
    expect(r.kind).toBe("address_capped");
    // Other addresses are not affected.
    expect((await passwordSignIn(em(), email, password, addrB)).kind).toBe("ok");
  });

  it("does the same work for an unknown account: one compare against the dummy hash, one failure recorded", async () => {
    const compare = vi.spyOn(bcrypt, "compare");
    const ghost = `nobody-${randomUUID().slice(0, 8)}@example.test`;
    expect((await passwordSignIn(em(), ghost, password, addrB)).kind).toBe("wrong");
    expect(compare).toHaveBeenCalledTimes(1);
    expect(compare.mock.calls[0]![1]).toBe(DUMMY_HASH);
    compare.mockRestore();
    expect(await em().getConnection().execute(`select count(*)::int as n from login_attempt where key = ?`, [pairKey(ghost, addrB)])).toEqual([{ n: 1 }]);
  });

  it("reports a disabled account only to someone with its right password", async () => {
    const email = await account();
    await em().nativeUpdate(UserSchema, { email }, { disabledAt: new Date() });
    expect((await passwordSignIn(em(), email, "not-the-password-1", addrB)).kind).toBe("wrong");
    expect((await passwordSignIn(em(), email, password, addrB)).kind).toBe("disabled");
  });
});
