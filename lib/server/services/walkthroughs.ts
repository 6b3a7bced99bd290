import type { EntityManager } from "@mikro-orm/postgresql";
import { z } from "zod";
import type { User } from "@/entities/User";
import { WalkthroughSchema, type Walkthrough } from "@/entities/Walkthrough";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { forbidden, notFound } from "../errors";
import { accessPlan } from "../policy";
import { appLink } from "./mail";
import { presetOfDocument } from "./plan-preset";
import type { PresetView } from "./presets";
import { hashToken, newToken, tokenShape } from "./tokens";

const vec3 = z.tuple([z.number().finite(), z.number().finite(), z.number().finite()]);
const shortId = z.string().min(1).max(64);

/** One step: where the camera looks, what to highlight, the rule it shows and a short note. */
export const stepSchema = z.object({
  title: z.string().trim().min(1, "Give the step a title.").max(120),
  view: z.enum(["3d", "plan", "elevation"]).default("3d"),
  /** Camera in room millimetres (three.js y-up: x along the floor, y up, z across). */
  camera: z.object({ position: vec3, target: vec3 }).optional(),
  wallId: shortId.optional(),
  highlight: z.object({ fixtureIds: z.array(shortId).max(50).default([]), zoneIds: z.array(shortId).max(50).default([]) }).default({ fixtureIds: [], zoneIds: [] }),
  ruleId: z.string().regex(/^[a-z0-9-]{1,64}$/, "Use a rule id such as walkway.").optional(),
  note: z.string().max(2000).default(""),
});
export type WalkthroughStep = z.infer<typeof stepSchema>;

export const walkthroughBody = z.object({
  title: z.string().trim().min(1, "Give the walk-through a title.").max(120),
  steps: z.array(stepSchema).max(60).default([]),
  published: z.boolean().default(false),
});
export const createWalkthroughBody = walkthroughBody.extend({ planId: z.string().uuid() });

export interface WalkthroughView {
  id: string;
  planId: string;
  title: string;
  steps: WalkthroughStep[];
  published: boolean;
  ownerId: string;
  ownerName: string;
  updatedAt: string;
  hasViewLink: boolean;
}

export interface WalkthroughShow extends WalkthroughView {
  planName: string;
  document: PlanDocument;
  preset: PresetView | null;
  canEdit: boolean;
}

const view = (w: Walkthrough): WalkthroughView => ({
  id: w.id,
  planId: w.plan.id,
  title: w.title,
  steps: w.steps as unknown as WalkthroughStep[],
  published: w.published,
  ownerId: w.owner.id,
  ownerName: w.owner.name,
  updatedAt: w.updatedAt.toISOString(),
  hasViewLink: !!w.viewTokenHash,
});

function requireTeacher(user: User) {
  if (user.role !== "instructor" && user.role !== "admin") throw forbidden("Only an instructor can build walk-throughs.");
}

/** My walk-throughs, or one instructor's published ones (for the class page; no sign-in needed). */
export async function listWalkthroughs(em: EntityManager, user: User | null, opts: { ownerId?: string } = {}): Promise<WalkthroughView[]> {
  const where = opts.ownerId ? (opts.ownerId === user?.id ? { owner: opts.ownerId } : { owner: opts.ownerId, published: true, plan: { deletedAt: null } }) : { owner: user?.id ?? "00000000-0000-0000-0000-000000000000" };
  const rows = await em.find(WalkthroughSchema, where, { populate: ["owner", "plan"], orderBy: { updatedAt: "desc" }, limit: 200 });
  return rows.map(view);
}

/** An instructor builds a walk-through on a plan they can edit. */
export async function createWalkthrough(em: EntityManager, user: User, input: z.infer<typeof createWalkthroughBody>): Promise<WalkthroughView> {
  requireTeacher(user);
  const { plan } = await accessPlan(em, input.planId, user, "editor");
  const w = em.create(WalkthroughSchema, { plan, owner: user, title: input.title, steps: input.steps as unknown as Record<string, unknown>[], published: input.published });
  await em.flush();
  return view(w);
}

async function load(em: EntityManager, id: string): Promise<Walkthrough | null> {
  return em.findOne(WalkthroughSchema, { id, plan: { deletedAt: null } }, { populate: ["owner", "plan", "plan.document"] });
}

/**
 * Opens a walk-through for presenting. Allowed: its author (and admins), anyone when published,
 * anyone holding the view link's token. Nobody but the author gets editing rights.
 */
export async function showWalkthrough(em: EntityManager, user: User | null, id: string, token?: string | null): Promise<WalkthroughShow> {
  const w = await load(em, id);
  if (!w) throw notFound("That walk-through");
  const mine = !!user && (w.owner.id === user.id || user.role === "admin");
  const byToken = !!token && tokenShape.test(token) && !!w.viewTokenHash && hashToken(token) === w.viewTokenHash;
  if (!mine && !w.published && !byToken) throw notFound("That walk-through");
  const document = w.plan.document as unknown as PlanDocument;
  return { ...view(w), planName: w.plan.name, document, preset: await presetOfDocument(em, document), canEdit: mine };
}

async function editable(em: EntityManager, user: User, id: string): Promise<Walkthrough> {
  const w = await load(em, id);
  const mine = !!w && (w.owner.id === user.id || user.role === "admin");
  if (!w || (!mine && !w.published)) throw notFound("That walk-through");
  if (!mine) throw forbidden("Only the instructor who built this walk-through can change it.");
  return w;
}

export async function updateWalkthrough(em: EntityManager, user: User, id: string, input: z.infer<typeof walkthroughBody>): Promise<WalkthroughView> {
  const w = await editable(em, user, id);
  w.title = input.title;
  w.steps = input.steps as unknown as Record<string, unknown>[];
  w.published = input.published;
  await em.flush();
  return view(w);
}

export async function deleteWalkthrough(em: EntityManager, user: User, id: string): Promise<void> {
  const w = await editable(em, user, id);
  em.remove(w);
  await em.flush();
}

/** A new student link (the old one stops working); returns the token once. */
export async function newViewLink(em: EntityManager, user: User, id: string): Promise<{ url: string; token: string }> {
  const w = await editable(em, user, id);
  const { token, hash } = newToken();
  w.viewTokenHash = hash;
  await em.flush();
  return { token, url: appLink(`/present/${w.id}?t=${token}`) };
}

/** Turns the student link off. */
export async function dropViewLink(em: EntityManager, user: User, id: string): Promise<void> {
  const w = await editable(em, user, id);
  w.viewTokenHash = null;
  await em.flush();
}
