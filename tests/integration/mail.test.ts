import { describe, it, expect, beforeAll } from "vitest";
import { Client, hasServer, newMember } from "./helpers/client";
import { cast, linkPath, waitForMail, type Cast } from "./helpers/sharing";

describe.skipIf(!hasServer)("e-mail: invitations, password reset, address confirmation", () => {
  let c: Cast;
  beforeAll(async () => {
    c = await cast();
  });

  it("an invitation arrives with plain-text and HTML parts and a link that adds the role", async () => {
    const plan = (await c.owner.client.post("/api/v1/plans", { name: "Workbench corner" })).body.plan;
    const inv = await c.owner.client.post(`/api/v1/plans/${plan.id}/invitations`, { email: c.stranger.email.toUpperCase(), role: "viewer" });
    expect(inv.status).toBe(201);
    expect(inv.body.invitation.email).toBe(c.stranger.email);
    expect(inv.body.invitation.state).toBe("pending");

    const mail = await waitForMail(c.stranger.email, (m) => m.subject.includes("Workbench corner"));
    expect(mail.subject).toContain("Test owner");
    expect(mail.text).toContain("look at it (without changing it)");
    const path = linkPath(mail.text, "/invite/");
    expect(mail.html).toContain(`href="${process.env.BW_BASE_URL}${path}"`);
    expect(mail.html).toMatch(/<a [^>]*>Open the invitation<\/a>/);

    const token = path.split("/")[2];
    const preview = await new Client().get(`/api/v1/invitations/${token}`);
    expect(preview.body.invitation).toMatchObject({ planName: "Workbench corner", role: "viewer", inviterName: "Test owner" });

    // The invitation page itself opens.
    const page = await new Client().raw(path);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Workbench corner");

    // Someone else holding the forwarded link cannot use it.
    expect((await c.editor.client.post(`/api/v1/invitations/${token}/accept`)).status).toBe(403);
    expect((await new Client().post(`/api/v1/invitations/${token}/accept`)).status).toBe(401);
    const ok = await c.stranger.client.post(`/api/v1/invitations/${token}/accept`);
    expect(ok.body).toEqual({ planId: plan.id, role: "viewer" });
    expect((await c.stranger.client.get(`/api/v1/plans/${plan.id}`)).body.plan.role).toBe("viewer");
    // Used once: the link is spent.
    expect((await c.stranger.client.post(`/api/v1/invitations/${token}/accept`)).status).toBe(404);
    const list = await c.owner.client.get(`/api/v1/plans/${plan.id}/invitations`);
    expect(list.body.invitations[0].state).toBe("accepted");
  });

  it("a withdrawn invitation stops working", async () => {
    const plan = (await c.owner.client.post("/api/v1/plans", { name: "Withdrawn" })).body.plan;
    const inv = await c.owner.client.post(`/api/v1/plans/${plan.id}/invitations`, { email: c.editor.email, role: "editor" });
    const mail = await waitForMail(c.editor.email, (m) => m.subject.includes("Withdrawn"));
    const token = linkPath(mail.text, "/invite/").split("/")[2];
    expect((await c.owner.client.del(`/api/v1/plans/${plan.id}/invitations/${inv.body.invitation.id}`)).body.invitation.state).toBe("revoked");
    expect((await c.editor.client.post(`/api/v1/invitations/${token}/accept`)).status).toBe(404);
    expect((await c.owner.client.post(`/api/v1/plans/${plan.id}/invitations`, { email: c.owner.email, role: "editor" })).status).toBe(422);
    expect((await c.owner.client.post(`/api/v1/plans/${plan.id}/invitations`, { email: "not-an-address", role: "editor" })).body.error.fields.email).toBeTruthy();
  });

  it("a reset message arrives with a link that sets a new password once", async () => {
    const m = await newMember("resetter");
    const asked = await new Client().post("/api/v1/account/reset", { email: m.email });
    expect(asked.status).toBe(202);
    // Unknown addresses get the same answer, so the endpoint does not reveal accounts.
    const unknown = await new Client().post("/api/v1/account/reset", { email: "nobody-here@example.test" });
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(asked.body);

    const mail = await waitForMail(m.email, (x) => x.text.includes("/reset/"));
    expect(mail.subject).toBe("Choose a new Benchwright password");
    expect(mail.html).toContain("Choose a new password");
    const path = linkPath(mail.text, "/reset/");
    const page = await new Client().raw(path);
    expect(page.status).toBe(200);
    const token = path.split("/")[2];

    expect((await new Client().post("/api/v1/account/reset/confirm", { token, password: "short" })).status).toBe(422);
    const newPassword = "Walnut-and-maple-77";
    expect((await new Client().post("/api/v1/account/reset/confirm", { token, password: newPassword })).status).toBe(200);
    expect((await new Client().post("/api/v1/account/reset/confirm", { token, password: "Another-cherry-88" })).status).toBe(404);
    expect(await new Client().signIn(m.email, m.password)).toBe(false);
    expect(await new Client().signIn(m.email, newPassword)).toBe(true);
  });

  it("an address-confirmation message marks the account verified", async () => {
    const m = await newMember("verifier");
    const sent = await m.client.post("/api/v1/account/verify");
    expect(sent.status).toBe(202);
    expect(sent.body).toEqual({ sent: true, verified: false });
    const mail = await waitForMail(m.email, (x) => x.text.includes("/verify/"));
    const path = linkPath(mail.text, "/verify/");
    const token = path.split("/")[2];
    const ok = await new Client().post("/api/v1/account/verify/confirm", { token });
    expect(ok.body).toEqual({ verified: true, email: m.email });
    expect((await m.client.post("/api/v1/account/verify")).body).toEqual({ sent: false, verified: true });
    expect((await new Client().post("/api/v1/account/verify")).status).toBe(401);
  });
});
