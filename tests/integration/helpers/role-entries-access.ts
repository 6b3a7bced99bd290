/**
 * Role matrix rows for access checked at every use: a collaborator removed from a plan, a
 * walk-through (and its student link) whose author was removed, and someone else's draft preset
 * typed into a plan's settings. These call routes the main matrix already covers, on records
 * whose access changed after they were made.
 */
import { DEMO } from "./client";
import type { Call } from "./role-entries-plans";
import { everyone, ok, signedIn, type Expect, type Persona, type World } from "./role-world";
import { inviteByName, uniqueName } from "./invite";
import { planWithRoles } from "./sharing";

export interface Recheck {
  /** A plan whose editor (the `editor` persona) and instructor-editor were removed after joining. */
  removedPlanId: string;
  /** A published walk-through, with a student link, the instructor built on that plan before removal. */
  removedWalkId: string;
  removedWalkToken: string;
  /** A draft walk-through with a student link, on the instructor's own plan (still served). */
  liveWalkId: string;
  liveWalkToken: string;
  /** The instructor's draft preset, and a plan of the owner whose settings.presetId names it (the instructor is a viewer there). */
  draftPresetId: string;
  draftPlanId: string;
}

export interface RecheckEntry {
  label: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  call: (w: World, r: Recheck, who: Persona) => Call;
  expect: Expect;
}

const linkToken = (url: string) => new URL(url).searchParams.get("t") ?? "";

export async function buildRecheck(w: World): Promise<Recheck> {
  const owner = w.c.owner.client;
  const instructor = { client: w.as.instructor, email: DEMO.instructor };
  const removedName = uniqueName("Matrix removed collaborators");
  const removedPlanId = await planWithRoles(w.c, removedName);
  await inviteByName(owner, removedPlanId, removedName, instructor, "editor");
  const walk = ok(await instructor.client.post("/api/v1/walkthroughs", { planId: removedPlanId, title: "Matrix removed author", steps: [], published: true }), 201, "walk").walkthrough.id as string;
  const removedWalkToken = linkToken(ok(await instructor.client.post(`/api/v1/walkthroughs/${walk}/link`), 201, "walk link").url);
  const instructorId = ok(await instructor.client.get("/api/auth/session"), 200, "session").user.id as string;
  ok(await owner.del(`/api/v1/plans/${removedPlanId}/members/${instructorId}`), 200, "remove instructor");
  ok(await owner.del(`/api/v1/plans/${removedPlanId}/members/${w.editorId}`), 200, "remove editor");

  const liveWalkId = ok(await instructor.client.post("/api/v1/walkthroughs", { planId: w.teachPlanId, title: "Matrix live draft", steps: [] }), 201, "live walk").walkthrough.id as string;
  const liveWalkToken = linkToken(ok(await instructor.client.post(`/api/v1/walkthroughs/${liveWalkId}/link`), 201, "live link").url);

  const draftPresetId = ok(await instructor.client.post("/api/v1/presets", { name: "Matrix draft", numbers: { walkwayMm: 1200 }, published: false }), 201, "draft preset").preset.id as string;
  const draftName = uniqueName("Matrix typed preset id");
  const draftPlanId = await planWithRoles(w.c, draftName);
  await inviteByName(owner, draftPlanId, draftName, instructor, "viewer");
  const plan = ok(await owner.get(`/api/v1/plans/${draftPlanId}`), 200, "plan").plan as { document: { settings: Record<string, unknown> }; version: number };
  const document = { ...plan.document, settings: { ...plan.document.settings, presetId: draftPresetId } };
  ok(await owner.put(`/api/v1/plans/${draftPlanId}`, { document, version: plan.version }), 200, "type the preset id");
  return { removedPlanId, removedWalkId: walk, removedWalkToken, liveWalkId, liveWalkToken, draftPresetId, draftPlanId };
}

/** The plan after the editor's removal: the viewer and owner keep it; the removed editor is a stranger now. */
const afterRemoval = (s: number): Expect => ({ anonymous: 401, stranger: 404, viewer: s, editor: 404, owner: s, instructor: 404, admin: 404 });

export const recheckEntries: RecheckEntry[] = [
  { label: "removed collaborator: GET plan", method: "GET", call: (_w, r) => ({ path: `/api/v1/plans/${r.removedPlanId}` }), expect: afterRemoval(200) },
  { label: "removed collaborator: GET members", method: "GET", call: (_w, r) => ({ path: `/api/v1/plans/${r.removedPlanId}/members` }), expect: afterRemoval(200) },
  { label: "removed collaborator: GET plan preset", method: "GET", call: (_w, r) => ({ path: `/api/v1/plans/${r.removedPlanId}/preset` }), expect: afterRemoval(200) },
  // The author lost the plan: the published walk-through and its student link stop serving the live plan, for everyone.
  { label: "walk-through of a removed author: GET (published)", method: "GET", call: (_w, r) => ({ path: `/api/v1/walkthroughs/${r.removedWalkId}` }), expect: everyone(404) },
  { label: "walk-through of a removed author: GET with the student link", method: "GET", call: (_w, r) => ({ path: `/api/v1/walkthroughs/${r.removedWalkId}?t=${r.removedWalkToken}` }), expect: everyone(404) },
  { label: "walk-through of a removed author: PUT (publish)", method: "PUT", call: (_w, r) => ({ path: `/api/v1/walkthroughs/${r.removedWalkId}`, body: { title: "Matrix removed author", steps: [], published: true } }), expect: signedIn(404) },
  { label: "walk-through of a removed author: POST a new student link", method: "POST", call: (_w, r) => ({ path: `/api/v1/walkthroughs/${r.removedWalkId}/link` }), expect: signedIn(404) },
  // Control: a draft's student link on a plan the author still holds opens for anyone with it.
  { label: "student link of a served draft: GET", method: "GET", call: (_w, r) => ({ path: `/api/v1/walkthroughs/${r.liveWalkId}?t=${r.liveWalkToken}` }), expect: everyone(200) },
  // Someone else's draft preset typed into settings.presetId: only its author (a viewer of that plan) reads it through the plan.
  { label: "draft preset by presetId: GET plan preset", method: "GET", call: (_w, r) => ({ path: `/api/v1/plans/${r.draftPlanId}/preset` }), expect: { anonymous: 401, stranger: 404, viewer: 404, editor: 404, owner: 404, instructor: 200, admin: 404 } },
  { label: "draft preset: GET preset", method: "GET", call: (_w, r) => ({ path: `/api/v1/presets/${r.draftPresetId}` }), expect: { ...everyone(404), instructor: 200, admin: 200 } },
];
