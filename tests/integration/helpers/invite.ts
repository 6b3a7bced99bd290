/** Adds a collaborator through the real e-mail flow, picking the message by the plan's (unique) name. */
import { randomUUID } from "node:crypto";
import type { Client } from "./client";
import { linkPath, waitForMail } from "./sharing";

/** A plan name no other test uses, so its invitation mail can be told apart from parallel tests' mail to a shared account. */
export const uniqueName = (base: string) => `${base} ${randomUUID().slice(0, 8)}`;

export async function inviteByName(owner: Client, planId: string, planName: string, member: { client: Client; email: string }, role: "editor" | "viewer"): Promise<void> {
  const r = await owner.post(`/api/v1/plans/${planId}/invitations`, { email: member.email, role });
  if (r.status !== 201) throw new Error(`invite failed: ${r.status} ${JSON.stringify(r.body)}`);
  const mail = await waitForMail(member.email, (m) => m.subject.includes(`"${planName}"`) && m.text.includes("/invite/"));
  const token = linkPath(mail.text, "/invite/").split("/")[2];
  const a = await member.client.post(`/api/v1/invitations/${token}/accept`);
  if (a.status !== 200) throw new Error(`accept failed: ${a.status} ${JSON.stringify(a.body)}`);
}
