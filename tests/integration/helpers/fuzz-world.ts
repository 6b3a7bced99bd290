/**
 * The records the write-route fuzz suite aims at: a fresh instructor (promoted by the demo admin)
 * owning a plan with every fixture kind, a member on it, a link, an invitation, photos, a preset
 * and a walk-through; and for each write route under app/api/v1, how to address it and a valid body.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { randomUUID } from "node:crypto";
import { FIXTURE_KIND_NAMES } from "@/lib/engine/fixtures/registry";
import { demo, newMember, type Client } from "./client";
import { addMember } from "./sharing";
import { ok, smallJpeg } from "./role-world";

export type Method = "POST" | "PUT" | "PATCH" | "DELETE";

export interface FuzzWorld {
  owner: Client;
  admin: Client;
  ownerId: string;
  /** A member whose role the member routes change, and an account the admin route changes. */
  memberId: string;
  bystanderId: string;
  planId: string;
  /** The owned plan's current document and version (kept current from successful saves). */
  doc: Record<string, unknown>;
  version: number;
  /** A plan the DELETE route may remove. */
  scratchPlanId: string;
  revId: string;
  linkId: string;
  shareToken: string;
  invId: string;
  photoId: string;
  pendingPhotoId: string;
  presetId: string;
  walkId: string;
}

/** A 30 x 24 ft garage with one of every fixture kind on its walls (parameters left to the kinds' defaults). */
export function everyKindDoc(): Record<string, unknown> {
  const walls = [
    { id: "back", label: "Back wall", lengthMm: 9144 },
    { id: "right", label: "Right wall", lengthMm: 7315 },
    { id: "front", label: "Door wall", lengthMm: 9144 },
    { id: "left", label: "House wall", lengthMm: 7315 },
  ];
  const fixtures = FIXTURE_KIND_NAMES.map((kind, i) => ({
    id: `f-${kind}`,
    kind,
    label: `${kind} ${i + 1}`,
    placement: { mode: "wall", wallId: walls[i % 4].id, offsetMm: 300 + Math.floor(i / 4) * 2600, elevationMm: kind === "wall-cabinet" ? 1400 : kind.includes("cleat") || kind === "pegboard" || kind === "shelf-run" ? 1200 : 0 },
    params: {},
  }));
  return {
    schemaVersion: 1,
    room: {
      walls,
      openings: [{ id: "door-1", kind: "garage-door", wallId: "front", offsetMm: 1200, widthMm: 4877 }],
      obstacles: [{ id: "panel-1", kind: "panel", placement: { mode: "wall", wallId: "left", offsetMm: 5200, elevationMm: 1200 } }],
    },
    fixtures,
  };
}

/** A photo on the plan's back wall: uploaded to storage when `put` is true, not yet confirmed. */
async function photoOnBackWall(owner: Client, planId: string, put: boolean): Promise<string> {
  const jpeg = await smallJpeg();
  const start = ok(await owner.post(`/api/v1/plans/${planId}/photos`, { wallId: "back", contentType: "image/jpeg", bytes: jpeg.length }), 201, "photo start") as { photo: { id: string }; upload: { url: string; headers: Record<string, string> } };
  if (put) await fetch(start.upload.url, { method: "PUT", body: new Uint8Array(jpeg), headers: start.upload.headers });
  return start.photo.id;
}

const sessionId = async (c: Client) => ok(await c.get("/api/auth/session"), 200, "session").user.id as string;

export async function buildFuzzWorld(): Promise<FuzzWorld> {
  const [owner, member, bystander, admin] = await Promise.all([newMember("fuzz-owner"), newMember("fuzz-member"), newMember("fuzz-bystander"), demo("admin")]);
  const [ownerId, memberId, bystanderId] = await Promise.all([sessionId(owner.client), sessionId(member.client), sessionId(bystander.client)]);
  ok(await admin.patch(`/api/v1/admin/users/${ownerId}`, { role: "instructor" }), 200, "promote");
  const created = ok(await owner.client.post("/api/v1/plans", { name: "Fuzz shop", document: everyKindDoc() }), 201, "plan").plan;
  const scratchPlanId = ok(await owner.client.post("/api/v1/plans", { name: "Fuzz scratch" }), 201, "scratch").plan.id;
  await addMember(owner.client, created.id, member, "editor");
  const saved = ok(await owner.client.put(`/api/v1/plans/${created.id}`, { document: created.document, version: created.version }), 200, "save").plan;
  const revId = ok(await owner.client.get(`/api/v1/plans/${created.id}/revisions`), 200, "revisions").revisions[0].id;
  const link = ok(await owner.client.post(`/api/v1/plans/${created.id}/links`, { label: "fuzz" }), 201, "link");
  const inv = ok(await owner.client.post(`/api/v1/plans/${created.id}/invitations`, { email: `fuzz-${randomUUID().slice(0, 8)}@example.test`, role: "viewer" }), 201, "invite");
  const photoId = await photoOnBackWall(owner.client, created.id, true);
  ok(await owner.client.post(`/api/v1/plans/${created.id}/photos/${photoId}/confirm`), 200, "confirm");
  const pendingPhotoId = await photoOnBackWall(owner.client, created.id, false);
  const presetId = ok(await owner.client.post("/api/v1/presets", { name: "Fuzz preset", numbers: { walkwayMm: 1066.8 } }), 201, "preset").preset.id;
  const walkId = ok(await owner.client.post("/api/v1/walkthroughs", { planId: created.id, title: "Fuzz walk", steps: [{ title: "Room", view: "plan", note: "" }] }), 201, "walk").walkthrough.id;
  return {
    owner: owner.client,
    admin,
    ownerId,
    memberId,
    bystanderId,
    planId: created.id,
    doc: saved.document,
    version: saved.version,
    scratchPlanId,
    revId,
    linkId: link.link?.id ?? link.id,
    shareToken: link.token,
    invId: inv.invitation?.id ?? inv.id,
    photoId,
    pendingPhotoId,
    presetId,
    walkId,
  };
}

export interface Target {
  /** Route file relative to app/api, e.g. "v1/plans/[id]/route.ts". */
  file: string;
  method: Method;
  path: (w: FuzzWorld) => string;
  /** A valid body (undefined: the route reads none). */
  seed?: (w: FuzzWorld) => unknown;
  /** Who sends the bodies (the owner unless said). */
  as?: (w: FuzzWorld) => Client;
  /** Fewer bodies where each costs a password hash or a mail. */
  runs?: number;
}

const planPath = (rest = "") => (w: FuzzWorld) => `/api/v1/plans/${w.planId}${rest}`;

/** How to reach each write route and what a valid body looks like. Routes found on disk but missing here are fuzzed with random params. */
export const TARGETS: Target[] = [
  { file: "v1/account/route.ts", method: "POST", path: () => "/api/v1/account", seed: () => ({ name: "Fuzz", email: `fz-${randomUUID().slice(0, 8)}@example.test`, password: "Birch-and-beech-71" }), runs: 60 },
  { file: "v1/account/reset/route.ts", method: "POST", path: () => "/api/v1/account/reset", seed: () => ({ email: `nobody-${randomUUID().slice(0, 6)}@example.test` }), runs: 100 },
  { file: "v1/account/reset/confirm/route.ts", method: "POST", path: () => "/api/v1/account/reset/confirm", seed: () => ({ token: "A".repeat(43), password: "Birch-and-beech-72" }), runs: 60 },
  { file: "v1/account/verify/route.ts", method: "POST", path: () => "/api/v1/account/verify", runs: 40 },
  { file: "v1/account/verify/confirm/route.ts", method: "POST", path: () => "/api/v1/account/verify/confirm", seed: () => ({ token: "B".repeat(43) }) },
  { file: "v1/account/password/route.ts", method: "PUT", path: () => "/api/v1/account/password", seed: () => ({ currentPassword: "not-the-password-1", newPassword: "Walnut-and-teak-88" }), runs: 40 },
  { file: "v1/admin/users/[id]/route.ts", method: "PATCH", path: (w) => `/api/v1/admin/users/${w.bystanderId}`, seed: () => ({ role: "member" }), as: (w) => w.admin },
  { file: "v1/analyze/route.ts", method: "POST", path: () => "/api/v1/analyze", seed: (w) => ({ plan: w.doc, preset: { walkwayMm: 1000 } }) },
  { file: "v1/invitations/[token]/accept/route.ts", method: "POST", path: () => `/api/v1/invitations/${"C".repeat(43)}/accept` },
  { file: "v1/plans/route.ts", method: "POST", path: () => "/api/v1/plans", seed: (w) => ({ name: "Fuzz made", document: w.doc }) },
  { file: "v1/plans/import/route.ts", method: "POST", path: () => "/api/v1/plans/import", seed: (w) => ({ format: "benchwright-plan", name: "Fuzz import", document: w.doc }) },
  { file: "v1/plans/[id]/route.ts", method: "PUT", path: planPath(), seed: (w) => ({ document: w.doc, version: w.version }) },
  { file: "v1/plans/[id]/route.ts", method: "PATCH", path: planPath(), seed: () => ({ name: "Fuzz shop renamed" }) },
  { file: "v1/plans/[id]/route.ts", method: "DELETE", path: (w) => `/api/v1/plans/${w.scratchPlanId}`, runs: 30 },
  { file: "v1/plans/[id]/duplicate/route.ts", method: "POST", path: planPath("/duplicate"), runs: 60 },
  { file: "v1/plans/[id]/restore/route.ts", method: "POST", path: planPath("/restore"), runs: 60 },
  { file: "v1/plans/[id]/revisions/[revId]/restore/route.ts", method: "POST", path: (w) => `/api/v1/plans/${w.planId}/revisions/${w.revId}/restore`, seed: (w) => ({ version: w.version }) },
  { file: "v1/plans/[id]/preset/route.ts", method: "PUT", path: planPath("/preset"), seed: (w) => ({ presetId: w.presetId, version: w.version }) },
  { file: "v1/plans/[id]/links/route.ts", method: "POST", path: planPath("/links"), seed: () => ({ label: "for a friend", expiresInDays: 7 }) },
  { file: "v1/plans/[id]/links/[linkId]/route.ts", method: "DELETE", path: (w) => `/api/v1/plans/${w.planId}/links/${w.linkId}`, runs: 30 },
  { file: "v1/plans/[id]/invitations/route.ts", method: "POST", path: planPath("/invitations"), seed: () => ({ email: `fz-${randomUUID().slice(0, 6)}@example.test`, role: "viewer" }), runs: 80 },
  { file: "v1/plans/[id]/invitations/[invId]/route.ts", method: "DELETE", path: (w) => `/api/v1/plans/${w.planId}/invitations/${w.invId}`, runs: 30 },
  { file: "v1/plans/[id]/members/[userId]/route.ts", method: "PATCH", path: (w) => `/api/v1/plans/${w.planId}/members/${w.memberId}`, seed: () => ({ role: "viewer" }) },
  { file: "v1/plans/[id]/members/[userId]/route.ts", method: "DELETE", path: (w) => `/api/v1/plans/${w.planId}/members/${w.memberId}`, runs: 30 },
  { file: "v1/plans/[id]/progress/route.ts", method: "POST", path: planPath("/progress"), seed: () => ({ checks: [{ id: randomUUID(), item: "cut:rip-1:A1", delta: 1, madeAt: new Date().toISOString() }] }) },
  { file: "v1/plans/[id]/photos/route.ts", method: "POST", path: planPath("/photos"), seed: () => ({ wallId: "back", contentType: "image/jpeg", bytes: 20_000 }) },
  { file: "v1/plans/[id]/photos/[photoId]/route.ts", method: "PATCH", path: (w) => `/api/v1/plans/${w.planId}/photos/${w.photoId}`, seed: () => ({ scale: { ax: 1, ay: 1, bx: 30, by: 1, distanceMm: 600 } }) },
  { file: "v1/plans/[id]/photos/[photoId]/route.ts", method: "DELETE", path: (w) => `/api/v1/plans/${w.planId}/photos/${w.photoId}`, runs: 30 },
  { file: "v1/plans/[id]/photos/[photoId]/confirm/route.ts", method: "POST", path: (w) => `/api/v1/plans/${w.planId}/photos/${w.pendingPhotoId}/confirm`, runs: 60 },
  { file: "v1/presets/route.ts", method: "POST", path: () => "/api/v1/presets", seed: () => ({ name: "Fuzz preset 2", description: "", numbers: { walkwayMm: 1000 }, published: false }) },
  { file: "v1/presets/[id]/route.ts", method: "PUT", path: (w) => `/api/v1/presets/${w.presetId}`, seed: () => ({ name: "Fuzz preset", description: "tightened", numbers: { walkwayMm: 1100 }, published: false }) },
  { file: "v1/presets/[id]/route.ts", method: "DELETE", path: (w) => `/api/v1/presets/${w.presetId}`, runs: 30 },
  { file: "v1/prices/route.ts", method: "PUT", path: () => "/api/v1/prices", seed: () => ({ currency: "USD", items: [{ key: "ply-18", name: "3/4 ply", unit: "sheet", packSize: 1, priceCents: 6450 }, { key: "slide-*", name: "Slides", unit: "pair", priceCents: 1500 }] }) },
  { file: "v1/prices/route.ts", method: "DELETE", path: () => "/api/v1/prices", runs: 30 },
  { file: "v1/shared/[token]/copy/route.ts", method: "POST", path: (w) => `/api/v1/shared/${w.shareToken}/copy`, seed: () => ({ name: "Fuzz copy" }), runs: 100 },
  { file: "v1/walkthroughs/route.ts", method: "POST", path: () => "/api/v1/walkthroughs", seed: (w) => ({ planId: w.planId, title: "Fuzz walk 2", steps: [{ title: "Room", view: "3d", camera: { position: [1000, 1600, 4000], target: [3000, 900, 2000] } }], published: false }) },
  { file: "v1/walkthroughs/[id]/route.ts", method: "PUT", path: (w) => `/api/v1/walkthroughs/${w.walkId}`, seed: () => ({ title: "Fuzz walk", steps: [{ title: "Room", view: "plan", note: "" }, { title: "Saw", view: "elevation", wallId: "back" }], published: true }) },
  { file: "v1/walkthroughs/[id]/route.ts", method: "DELETE", path: (w) => `/api/v1/walkthroughs/${w.walkId}`, runs: 30 },
  { file: "v1/walkthroughs/[id]/link/route.ts", method: "POST", path: (w) => `/api/v1/walkthroughs/${w.walkId}/link`, runs: 60 },
  { file: "v1/walkthroughs/[id]/link/route.ts", method: "DELETE", path: (w) => `/api/v1/walkthroughs/${w.walkId}/link`, runs: 30 },
];

/** Every write route on disk: { file, method } for each exported POST, PUT, PATCH or DELETE under app/api/v1. */
export function writeRoutesOnDisk(root = join(process.cwd(), "app/api")): { file: string; method: Method }[] {
  const out: { file: string; method: Method }[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const p = join(dir, name);
      if (statSync(p).isDirectory()) walk(p);
      else if (name === "route.ts") {
        const text = readFileSync(p, "utf8");
        for (const m of text.matchAll(/export\s+(?:const|async function|function)\s+(POST|PUT|PATCH|DELETE)\b|export\s*\{[^}]*\bas\s+(POST|PUT|PATCH|DELETE)\b/g)) {
          out.push({ file: relative(root, p), method: (m[1] ?? m[2]) as Method });
        }
      }
    }
  };
  walk(join(root, "v1"));
  return out;
}

/** A target for a route the table does not know: each [param] a fresh uuid, random bodies only. */
export function fallbackTarget(file: string, method: Method): Target {
  return { file, method, path: () => "/api/" + file.replace(/\/route\.ts$/, "").replace(/\[[^\]]+\]/g, () => randomUUID()) };
}
