import { describe, it, expect } from "vitest";
import { randomUUID } from "node:crypto";
import { BASE_URL, Client, DEMO, DEMO_PASSWORD, demo, hasServer, newMember } from "./helpers/client";
import { linkPath, waitForMail } from "./helpers/sharing";

/** A request carrying a saved cookie header, as a replayed (stolen or old) cookie would. */
const replay = (cookie: string, path: string) => fetch(BASE_URL + path, { headers: { cookie }, redirect: "manual" });

/** The raw answer of a credentials sign-in (next-auth's form post with json=true). */
async function signInAnswer(c: Client, email: string, password: string, headers: Record<string, string> = {}) {
  const csrf = await c.get<{ csrfToken: string }>("/api/auth/csrf");
  const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: "true" });
  const res = await c.raw("/api/auth/callback/credentials", { method: "POST", body: form, headers: { "content-type": "application/x-www-form-urlencoded", ...headers } });
  return { status: res.status, body: (await res.json().catch(() => null)) as { url?: string; error?: { code: string; message: string } } | null, headers: res.headers };
}

async function signOut(c: Client): Promise<number> {
  const csrf = await c.get<{ csrfToken: string }>("/api/auth/csrf");
  const res = await c.raw("/api/auth/signout", { method: "POST", body: new URLSearchParams({ csrfToken: csrf.body.csrfToken, callbackUrl: "/", json: "true" }), headers: { "content-type": "application/x-www-form-urlencoded" } });
  return res.status;
}

/** The session still works: an API read and the session endpoint. */
async function expectLive(cookie: string) {
  expect((await replay(cookie, "/api/v1/plans")).status).toBe(200);
}

/** The session is over: 401 on the API, no user at the session endpoint, a page sends to sign-in. */
async function expectEnded(cookie: string) {
  expect((await replay(cookie, "/api/v1/plans")).status).toBe(401);
  expect(await (await replay(cookie, "/api/auth/session")).json()).toEqual({});
  const page = await replay(cookie, "/plans");
  expect([302, 303, 307, 308]).toContain(page.status);
  expect(page.headers.get("location")).toContain("/signin");
}

describe.skipIf(!hasServer)("accounts, roles and sign-in limits", () => {
  it("refuses weak passwords and duplicate e-mails with field messages", async () => {
    const c = new Client();
    const email = `weak-${randomUUID().slice(0, 6)}@example.test`;
    const weak = await c.post("/api/v1/account", { name: "W", email, password: "short" });
    expect(weak.status).toBe(422);
    expect(weak.body.error.fields.password).toMatch(/10 characters/);
    const common = await c.post("/api/v1/account", { name: "W", email, password: "password12345" });
    expect(common.status).toBe(422);
    const ok = await c.post("/api/v1/account", { name: "W", email, password: "Walnut-ply-77" });
    expect(ok.status).toBe(201);
    expect(ok.body.account).not.toHaveProperty("passwordHash");
    const dup = await c.post("/api/v1/account", { name: "W", email: email.toUpperCase(), password: "Walnut-ply-77" });
    expect(dup.status).toBe(422);
    expect(dup.body.error.fields.email).toBeTruthy();
  });

  it("signs in the demo accounts with their roles in the session", async () => {
    const c = await demo("instructor");
    const s = await c.get("/api/auth/session");
    expect(s.body.user.role).toBe("instructor");
    expect(s.body.user.email).toBe(DEMO.instructor);
  });

  it("lets only an admin list accounts and change a role", async () => {
    const { client: member, email } = await newMember("role");
    expect((await member.get("/api/v1/admin/users")).status).toBe(403);
    expect((await new Client().get("/api/v1/admin/users")).status).toBe(401);
    const admin = await demo("admin");
    const list = await admin.get("/api/v1/admin/users");
    expect(list.status).toBe(200);
    const row = list.body.users.find((u: { email: string }) => u.email === email);
    expect(row.role).toBe("member");
    expect(row.disabled).toBe(false);
    expect((await admin.patch(`/api/v1/admin/users/${row.id}`, { role: "wizard" })).status).toBe(422);
    expect((await admin.patch(`/api/v1/admin/users/${row.id}`, {})).status).toBe(422);
    const changed = await admin.patch(`/api/v1/admin/users/${row.id}`, { role: "instructor" });
    expect(changed.body.user.role).toBe("instructor");
    // The member's open session follows the new role at once.
    expect((await member.get("/api/auth/session")).body.user.role).toBe("instructor");
  });

  it("after 8 failures the right password from the same address is told to wait (429), not locked out for good", async () => {
    const { email, password } = await newMember("limit");
    const c = new Client();
    // AUTH_MAX_FAILURES defaults to 8 within 15 minutes.
    for (let i = 0; i < 8; i++) expect((await signInAnswer(c, email, "wrong-password-1")).status).toBe(401);
    const held = await signInAnswer(c, email, password);
    expect(held.status).toBe(429);
    expect(held.body?.error?.message).toMatch(/Wait \d+ seconds/);
    expect(Number(held.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await c.get("/api/auth/session")).body).toEqual({});
    // another account from the same address is not held up by this account's failures
    expect(await new Client().signIn(DEMO.member, DEMO_PASSWORD)).toBe(true);
  });

  it("does not trust X-Forwarded-For without TRUST_PROXY: rotating it does not escape the limit", async () => {
    const { email, password } = await newMember("spoof");
    const c = new Client();
    for (let i = 0; i < 8; i++) expect((await signInAnswer(c, email, "wrong-password-1", { "x-forwarded-for": `203.0.113.${i + 1}` })).status).toBe(401);
    const held = await signInAnswer(c, email, password, { "x-forwarded-for": "198.51.100.200", "x-real-ip": "198.51.100.201" });
    expect(held.status).toBe(429);
  });

  it("answers a JSON sign-in and a GET of the credentials callback with a 4xx and a message", async () => {
    const c = new Client();
    const asJson = await c.post("/api/auth/callback/credentials", { email: DEMO.member, password: DEMO_PASSWORD });
    expect(asJson.status).toBe(415);
    expect(asJson.body.error.message).toMatch(/x-www-form-urlencoded/);
    const broken = await c.req("POST", "/api/auth/callback/credentials", "{not json");
    expect(broken.status).toBe(415);
    const get = await c.get("/api/auth/callback/credentials");
    expect(get.status).toBe(405);
    expect(get.headers.get("allow")).toBe("POST");
    expect(get.body.error.message).toBeTruthy();
    const big = await c.raw("/api/auth/callback/credentials", { method: "POST", body: "a=" + "b".repeat(2_000_000), headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(big.status).toBe(413);
  });
});

describe.skipIf(!hasServer)("sessions you can end", () => {
  it("sign-out ends the session: the old cookie replayed gets 401, also on the account's other devices", async () => {
    const { client, email, password } = await newMember("signout");
    const other = new Client();
    expect(await other.signIn(email, password)).toBe(true);
    const mine = client.cookieHeader();
    const theirs = other.cookieHeader();
    await expectLive(mine);
    expect(await signOut(client)).toBe(200);
    await expectEnded(mine);
    await expectEnded(theirs);
    // Signing in again works and gives a new, live session.
    expect(await client.signIn(email, password)).toBe(true);
    await expectLive(client.cookieHeader());
    await expectEnded(mine);
  });

  it("a password reset ends every session", async () => {
    const { client, email } = await newMember("resetend");
    const before = client.cookieHeader();
    await expectLive(before);
    expect((await new Client().post("/api/v1/account/reset", { email })).status).toBe(202);
    const mail = await waitForMail(email, (m) => m.text.includes("/reset/"));
    const token = linkPath(mail.text, "/reset/").split("/")[2];
    expect((await new Client().post("/api/v1/account/reset/confirm", { token, password: "Hickory-and-ash-64" })).status).toBe(200);
    await expectEnded(before);
    expect(await new Client().signIn(email, "Hickory-and-ash-64")).toBe(true);
  });

  it("a password change ends the other sessions and keeps the changing browser signed in", async () => {
    const { client, email, password } = await newMember("pwchange");
    const laptop = new Client();
    expect(await laptop.signIn(email, password)).toBe(true);
    const laptopCookie = laptop.cookieHeader();
    const oldCookie = client.cookieHeader();
    const wrong = await client.put("/api/v1/account/password", { currentPassword: "not-it-at-all-1", newPassword: "Sycamore-grain-55" });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.currentPassword).toBeTruthy();
    const weak = await client.put("/api/v1/account/password", { currentPassword: password, newPassword: "short" });
    expect(weak.status).toBe(422);
    expect(weak.body.error.fields.newPassword).toBeTruthy();
    await expectLive(laptopCookie);
    const changed = await client.put("/api/v1/account/password", { currentPassword: password, newPassword: "Sycamore-grain-55" });
    expect(changed.status).toBe(200);
    await expectEnded(laptopCookie);
    await expectEnded(oldCookie);
    // The browser that changed it got a fresh cookie.
    expect((await client.get("/api/v1/plans")).status).toBe(200);
    expect(await new Client().signIn(email, password)).toBe(false);
    expect(await new Client().signIn(email, "Sycamore-grain-55")).toBe(true);
    expect((await new Client().put("/api/v1/account/password", { currentPassword: "x", newPassword: "y" })).status).toBe(401);
  });

  it("an administrator's disable ends the account's sessions and refuses its sign-in until enabled again", async () => {
    const { client, email, password } = await newMember("disable");
    const cookie = client.cookieHeader();
    const admin = await demo("admin");
    const id = (await client.get("/api/auth/session")).body.user.id as string;
    const off = await admin.patch(`/api/v1/admin/users/${id}`, { disabled: true });
    expect(off.status).toBe(200);
    expect(off.body.user.disabled).toBe(true);
    await expectEnded(cookie);
    const refused = await signInAnswer(new Client(), email, password);
    expect(refused.status).toBe(403);
    expect(refused.body?.error?.code).toBe("account_disabled");
    // A wrong password does not tell that the account is disabled.
    expect((await signInAnswer(new Client(), email, "wrong-password-1")).status).toBe(401);
    const adminId = (await admin.get("/api/auth/session")).body.user.id as string;
    expect((await admin.patch(`/api/v1/admin/users/${adminId}`, { disabled: true })).status).toBe(422);
    expect((await admin.patch(`/api/v1/admin/users/${id}`, { disabled: false })).body.user.disabled).toBe(false);
    expect(await new Client().signIn(email, password)).toBe(true);
    // Enabling does not bring the old cookie back.
    await expectEnded(cookie);
  });
});
