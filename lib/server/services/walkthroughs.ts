import type { EntityManager } from "@mikro-orm/postgresql";
import { z } from "zod";
import { PlanMemberSchema } from "@/entities/PlanMember";
import type { User } from "@/entities/User";
import { WalkthroughSchema, type Walkthrough } from "@/entities/Walkthrough";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { forbidden, notFound } from "../errors";
import { accessPlan, planRole, type PlanRole } from "../policy";
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
  /** False when the author no longer has a role on the plan: then it does not open for anyone. */
  authorHasPlan: boolean;
}

export interface WalkthroughShow extends WalkthroughView {
  planName: string;
  document: PlanDocument;
  preset: PresetView | null;
  canEdit: boolean;
}

const view = (w: Walkthrough, authorHasPlan = true): WalkthroughView => ({
  id: w.id,
  planId: w.plan.id,
  title: w.title,
  steps: w.steps as unknown as WalkthroughStep[],
  published: w.published,
  ownerId: w.owner.id,
  ownerName: w.owner.name,
  updatedAt: w.updatedAt.toISOString(),
  hasViewLink: !!w.viewTokenHash,
  authorHasPlan,
});

function requireTeacher(user: User) {
  if (user.role !== "instructor" && user.role !== "admin") throw forbidden("Only an instructor can build walk-throughs.");
}

/*
 * A walk-through shows its plan live, so it follows its author's CURRENT role on that plan, checked
 * at every use:
 * - owner or editor (what building one needs): it works as built: published or by student link
 *   for others, editable by its author;
 * - viewer: only its author can open it; it cannot be changed, published or linked;
 * - no role (removed from the plan, or the plan left): nobody can open it (404, published or not,
 *   student link or not) and only its author or an admin can delete it. It comes back if the
 *   author is given a role again.
 */
async function authorRole(em: EntityManager, w: Walkthrough): Promise<PlanRole | null> {
  return planRole(em, w.plan, w.owner);
}

/** Ids of the walk-throughs whose author still holds at least `need` on the plan (one query for the lot). */
async function authorsWithAccess(em: EntityManager, rows: Walkthrough[], need: PlanRole = "editor"): Promise<Set<string>> {
  const ok = new Set(rows.filter((w) => w.plan.owner.id === w.owner.id).map((w) => w.id));
  const rest = rows.filter((w) => !ok.has(w.id));
  if (!rest.length) return ok;
  const members = await em.find(PlanMemberSchema, { $or: rest.map((w) => ({ plan: w.plan.id, user: w.owner.id })) }, { limit: rest.length });
  const roles = new Map(members.map((m) => [`${m.plan.id}|${m.user.id}`, m.role as PlanRole]));
  for (const w of rest) {
    const role = roles.get(`${w.plan.id}|${w.owner.id}`);
    if (role && (need === "viewer" || role !== "viewer")) ok.add(w.id);
  }
  return ok;
}

/** Published walk-throughs whose author still has editor access to the plan (for public lists). */
export async function stillServed(em: EntityManager, rows: Walkthrough[]): Promise<Walkthrough[]> {
  const ok = await authorsWithAccess(em, rows);
  return rows.filter((w) => ok.has(w.id));
}

/** My walk-throughs (each says whether I still have the plan), or one instructor's published ones that still serve (class page; no sign-in needed). */
export async function listWalkthroughs(em: EntityManager, user: User | null, opts: { ownerId?: string } = {}): Promise<WalkthroughView[]> {
  const mine = !opts.ownerId || opts.ownerId === user?.id;
  const where = mine ? { owner: user?.id ?? "00000000-0000-0000-0000-000000000000", plan: { deletedAt: null } } : { owner: opts.ownerId, published: true, plan: { deletedAt: null } };
  const rows = await em.find(WalkthroughSchema, where, { populate: ["owner", "plan"], orderBy: { updatedAt: "desc" }, limit: 200 });
  const ok = await authorsWithAccess(em, rows, mine ? "viewer" : "editor");
  return mine ? rows.map((w) => view(w, ok.has(w.id))) : rows.filter((w) => ok.has(w.id)).map((w) => view(w));
}

/** An instructor builds a walk-through on a plan they can edit. */
export async function createWalkthrough(em: EntityManager, user: User, input: z.infer<typeof createWalkthroughBody>): Promise<WalkthroughView> {
  requireTeacher(user);
  const { plan } = await accessPlan(em, input.planId, user, "editor");
  const w = em.create(WalkthroughSchema, { plan, owner: user, title: input.title, steps: input.steps as unknown as Record<string, unknown>[], published: input.published });
  await em.flush();
  return view(w);
}

async function load(em: EntityManager, id: string, withDocument = false): Promise<Walkthrough | null> {
  return em.findOne(WalkthroughSchema, { id, plan: { deletedAt: null } }, { populate: withDocument ? ["owner", "plan", "plan.document"] : ["owner", "plan"] });
}

const isAuthor = (w: Walkthrough, user: User | null) => !!user && (w.owner.id === user.id || user.role === "admin");
const tokenOpens = (w: Walkthrough, token?: string | null) => !!token && tokenShape.test(token) && !!w.viewTokenHash && hashToken(token) === w.viewTokenHash;

/**
 * Opens a walk-through for presenting. Allowed: its author (and admins), anyone when published,
 * anyone holding the view link's token, each only while the author's role on the plan allows it
 * (see above). Nobody but the author gets editing rights.
 */
export async function showWalkthrough(em: EntityManager, user: User | null, id: string, token?: string | null): Promise<WalkthroughShow> {
  const w = await load(em, id, true);
  if (!w) throw notFound("That walk-through");
  const mine = isAuthor(w, user);
  if (!mine && !w.published && !tokenOpens(w, token)) throw notFound("That walk-through");
  const role = await authorRole(em, w);
  const serves = role === "owner" || role === "editor";
  if (!role || (!serves && !mine)) throw notFound("That walk-through");
  const document = w.plan.document as unknown as PlanDocument;
  // The author vouches for their own presets in what they present; anyone else's must be published.
  const preset = await presetOfDocument(em, document, { viewer: user, vouchedBy: [w.owner.id] });
  return { ...view(w), planName: w.plan.name, document, preset, canEdit: mine && serves };
}

/**
 * The author's (or an admin's) walk-through, for changes: needs the author to still edit its plan.
 * Others get 403 on one that is served publicly, 404 on anything else (its existence is not told).
 */
async function editable(em: EntityManager, user: User, id: string, opts: { anyAccess?: boolean } = {}): Promise<Walkthrough> {
  const w = await load(em, id);
  if (!w) throw notFound("That walk-through");
  const mine = isAuthor(w, user);
  if (mine && opts.anyAccess) return w;
  if (!mine && !w.published) throw notFound("That walk-through");
  const role = await authorRole(em, w);
  if (!role || (!mine && role === "viewer")) throw notFound("That walk-through");
  if (!mine) throw forbidden("Only the instructor who built this walk-through can change it.");
  if (role === "viewer") throw forbidden("Its author can no longer edit the plan, so this walk-through cannot change.");
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

/** Its author or an admin may always delete it, also after losing the plan. */
export async function deleteWalkthrough(em: EntityManager, user: User, id: string): Promise<void> {
  const w = await editable(em, user, id, { anyAccess: true });
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

/** Turns the student link off (allowed also after losing the plan). */
export async function dropViewLink(em: EntityManager, user: User, id: string): Promise<void> {
  const w = await editable(em, user, id, { anyAccess: true });
  w.viewTokenHash = null;
  await em.flush();
}
