/** Helpers for the sharing and teaching tests: caught mail, links in it, and a plan with every role. */
import type { Client} from "./client";
import { newMember } from "./client";

export const MAIL_URL = process.env.MAIL_CATCHER_URL ?? "";

export interface CaughtMail {
  id: number;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** Waits for the newest message to `to` that `match` accepts (the catcher receives over SMTP, so allow a moment). */
export async function waitForMail(to: string, match: (m: CaughtMail) => boolean = () => true, timeoutMs = 10_000): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${MAIL_URL}/messages?to=${encodeURIComponent(to)}`);
    const list = (await res.json()) as CaughtMail[];
    const hit = [...list].reverse().find(match);
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}

/** The path (with query) of the first link in `text` whose path starts with `prefix`. */
export function linkPath(text: string, prefix: string): string {
  for (const m of text.matchAll(/https?:\/\/[^\s"<>]+/g)) {
    const u = new URL(m[0]);
    if (u.pathname.startsWith(prefix)) return u.pathname + u.search;
  }
  throw new Error(`no ${prefix} link in: ${text.slice(0, 300)}`);
}

export const sampleDoc = () => ({
  schemaVersion: 1,
  room: { walls: [{ id: "north", lengthMm: 6100 }, { id: "east", lengthMm: 6700 }, { id: "south", lengthMm: 6100 }, { id: "west", lengthMm: 6700 }] },
});

/** Invites `member` with `role` through the real e-mail flow and accepts. */
export async function addMember(owner: Client, planId: string, member: { client: Client; email: string }, role: "editor" | "viewer"): Promise<void> {
  const r = await owner.post(`/api/v1/plans/${planId}/invitations`, { email: member.email, role });
  if (r.status !== 201) throw new Error(`invite failed: ${r.status} ${JSON.stringify(r.body)}`);
  const mail = await waitForMail(member.email, (m) => m.text.includes("/invite/"));
  const token = linkPath(mail.text, "/invite/").split("/")[2];
  const a = await member.client.post(`/api/v1/invitations/${token}/accept`);
  if (a.status !== 200) throw new Error(`accept failed: ${a.status} ${JSON.stringify(a.body)}`);
}

export interface Cast {
  owner: { client: Client; email: string };
  editor: { client: Client; email: string };
  viewer: { client: Client; email: string };
  stranger: { client: Client; email: string };
}

/** Four fresh accounts. */
export async function cast(): Promise<Cast> {
  const [owner, editor, viewer, stranger] = await Promise.all([newMember("owner"), newMember("editor"), newMember("viewer"), newMember("stranger")]);
  return { owner, editor, viewer, stranger };
}

/** A plan owned by cast.owner with cast.editor and cast.viewer in their roles. */
export async function planWithRoles(c: Cast, name = "Shared shop"): Promise<string> {
  const r = await c.owner.client.post("/api/v1/plans", { name, document: sampleDoc() });
  if (r.status !== 201) throw new Error(`create failed: ${r.status}`);
  const id = r.body.plan.id as string;
  await addMember(c.owner.client, id, c.editor, "editor");
  await addMember(c.owner.client, id, c.viewer, "viewer");
  return id;
}
