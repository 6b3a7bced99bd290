/** The cast and records the role matrix calls routes with. */
import sharp from "sharp";
import { Client, demo, newMember } from "./client";
import { cast, linkPath, planWithRoles, sampleDoc, waitForMail, type Cast } from "./sharing";

export const PERSONAS = ["anonymous", "stranger", "viewer", "editor", "owner", "instructor", "admin"] as const;
export type Persona = (typeof PERSONAS)[number];
export type Expect = Record<Persona, number>;

export interface World {
  c: Cast;
  as: Record<Persona, Client>;
  planId: string;
  revId: string;
  viewerId: string;
  editorId: string;
  strangerId: string;
  shareToken: string;
  presetId: string;
  teachPlanId: string;
  walkId: string;
  readyPhotoId: string;
}

export const ok = <T>(r: { status: number; body: T }, want: number, what: string): T => {
  if (r.status !== want) throw new Error(`${what}: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
};

export async function smallJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 40, height: 30, channels: 3, background: "#9b7b58" } }).jpeg().toBuffer();
}

/** A pending photo on the plan, uploaded but not confirmed when `put` is true. */
export async function pendingPhoto(owner: Client, planId: string, put: boolean): Promise<string> {
  const jpeg = await smallJpeg();
  const start = ok(await owner.post(`/api/v1/plans/${planId}/photos`, { wallId: "north", contentType: "image/jpeg", bytes: jpeg.length }), 201, "photo start") as { photo: { id: string }; upload: { url: string; headers: Record<string, string> } };
  if (put) await fetch(start.upload.url, { method: "PUT", body: new Uint8Array(jpeg), headers: start.upload.headers });
  return start.photo.id;
}

/** An invitation token read from the real message. */
export async function inviteToken(owner: Client, planId: string, email: string, role: "editor" | "viewer" = "viewer"): Promise<string> {
  ok(await owner.post(`/api/v1/plans/${planId}/invitations`, { email, role }), 201, "invite");
  const mail = await waitForMail(email, (m) => m.text.includes("/invite/"));
  return linkPath(mail.text, "/invite/").split("/")[2];
}

/** A reset or verify token for a fresh account, read from the real message. */
export async function emailToken(kind: "reset" | "verify"): Promise<string> {
  const m = await newMember(kind);
  if (kind === "reset") ok(await new Client().post("/api/v1/account/reset", { email: m.email }), 202, "reset");
  else ok(await m.client.post("/api/v1/account/verify"), 202, "verify");
  const mail = await waitForMail(m.email, (x) => x.text.includes(`/${kind}/`));
  return linkPath(mail.text, `/${kind}/`).split("/")[2];
}

export async function buildWorld(): Promise<World> {
  const c = await cast();
  const [instructor, admin] = await Promise.all([demo("instructor"), demo("admin")]);
  const planId = await planWithRoles(c, "Matrix plan");
  const as: Record<Persona, Client> = { anonymous: new Client(), stranger: c.stranger.client, viewer: c.viewer.client, editor: c.editor.client, owner: c.owner.client, instructor, admin };
  const plan = ok(await c.owner.client.get(`/api/v1/plans/${planId}`), 200, "plan").plan;
  ok(await c.owner.client.put(`/api/v1/plans/${planId}`, { document: plan.document, version: plan.version }), 200, "save");
  const revId = ok(await c.owner.client.get(`/api/v1/plans/${planId}/revisions`), 200, "revisions").revisions[0].id;
  const members = ok(await c.owner.client.get(`/api/v1/plans/${planId}/members`), 200, "members").members as { userId: string; role: string }[];
  const strangerId = ok(await c.stranger.client.get("/api/auth/session"), 200, "session").user.id;
  const shareToken = ok(await c.owner.client.post(`/api/v1/plans/${planId}/links`, {}), 201, "link").token;
  const presetId = ok(await instructor.post("/api/v1/presets", { name: "Matrix preset", numbers: { walkwayMm: 1066.8 }, published: true }), 201, "preset").preset.id;
  const teachPlanId = ok(await instructor.post("/api/v1/plans", { name: "Matrix teaching plan", document: sampleDoc() }), 201, "teach plan").plan.id;
  const walkId = ok(await instructor.post("/api/v1/walkthroughs", { planId: teachPlanId, title: "Matrix draft", steps: [] }), 201, "walk").walkthrough.id;
  const readyPhotoId = await pendingPhoto(c.owner.client, planId, true);
  ok(await c.owner.client.post(`/api/v1/plans/${planId}/photos/${readyPhotoId}/confirm`), 200, "confirm");
  return {
    c, as, planId, revId, shareToken, presetId, teachPlanId, walkId, readyPhotoId, strangerId,
    viewerId: members.find((m) => m.role === "viewer")!.userId,
    editorId: members.find((m) => m.role === "editor")!.userId,
  };
}

/** A fresh plan with its own editor and viewer (the same accounts), for calls that change or remove it. */
export const freshPlan = (w: World, name = "Matrix scratch") => planWithRoles(w.c, name);

// Expected statuses by shape of access. Strangers (no role on the plan) get 404, so a plan's existence is not disclosed.
export const everyone = (s: number): Expect => ({ anonymous: s, stranger: s, viewer: s, editor: s, owner: s, instructor: s, admin: s });
export const signedIn = (s: number): Expect => ({ ...everyone(s), anonymous: 401 });
export const planRead = (s: number): Expect => ({ anonymous: 401, stranger: 404, instructor: 404, admin: 404, viewer: s, editor: s, owner: s });
export const planEdit = (s: number): Expect => ({ ...planRead(s), viewer: 403 });
export const planOwner = (s: number): Expect => ({ ...planRead(s), viewer: 403, editor: 403 });
