import { describe, it, expect } from "vitest";
import { randomUUID } from "node:crypto";
import { Client, DEMO, DEMO_PASSWORD, demo, hasServer, newMember } from "./helpers/client";

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
    expect((await admin.patch(`/api/v1/admin/users/${row.id}`, { role: "wizard" })).status).toBe(422);
    const changed = await admin.patch(`/api/v1/admin/users/${row.id}`, { role: "instructor" });
    expect(changed.body.user.role).toBe("instructor");
  });

  it("rate-limits failed sign-ins per account (kept in PostgreSQL)", async () => {
    const { email, password } = await newMember("limit");
    const c = new Client();
    // AUTH_MAX_FAILURES defaults to 8 within 15 minutes.
    for (let i = 0; i < 8; i++) expect(await c.signIn(email, "wrong-password-1")).toBe(false);
    expect(await c.signIn(email, password)).toBe(false);
    // another account from the same test client is not locked by this account's failures
    expect(await new Client().signIn(DEMO.member, DEMO_PASSWORD)).toBe(true);
  });
});
