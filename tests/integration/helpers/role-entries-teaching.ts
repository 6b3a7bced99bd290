/** Role matrix entries: rule presets, plan preset adoption, walk-throughs. */
import type { Entry } from "./role-entries-plans";
import { everyone, ok, planEdit, planRead, signedIn, type Expect, type World } from "./role-world";

const teacherOnly = (s: number): Expect => ({ ...signedIn(403), instructor: s, admin: s });
/** A draft walk-through: its author and admins act; everyone else is told it does not exist. */
const draftAuthor = (s: number): Expect => ({ ...signedIn(404), anonymous: 401, instructor: s, admin: s });

const newPreset = async (w: World) => ok(await w.as.instructor.post("/api/v1/presets", { name: "Matrix temp", numbers: { walkwayMm: 1100 }, published: true }), 201, "preset").preset.id as string;
const newWalk = async (w: World) => ok(await w.as.instructor.post("/api/v1/walkthroughs", { planId: w.teachPlanId, title: "Matrix temp", steps: [] }), 201, "walk").walkthrough.id as string;
const presetBody = { name: "Matrix preset", numbers: { walkwayMm: 1066.8 }, published: true };

export const teachingEntries: Entry[] = [
  { file: "v1/presets/route.ts", method: "GET", call: () => ({ path: "/api/v1/presets" }), expect: everyone(200), note: "published presets are public" },
  { file: "v1/presets/route.ts", method: "POST", call: () => ({ path: "/api/v1/presets", body: presetBody }), expect: teacherOnly(201) },
  { file: "v1/presets/[id]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/presets/${w.presetId}` }), expect: everyone(200) },
  { file: "v1/presets/[id]/route.ts", method: "PUT", call: (w) => ({ path: `/api/v1/presets/${w.presetId}`, body: presetBody }), expect: teacherOnly(200) },
  { file: "v1/presets/[id]/route.ts", method: "DELETE", call: async (w) => ({ path: `/api/v1/presets/${await newPreset(w)}` }), expect: teacherOnly(200) },
  { file: "v1/plans/[id]/preset/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/preset` }), expect: planRead(200) },
  {
    file: "v1/plans/[id]/preset/route.ts",
    method: "PUT",
    call: async (w) => ({ path: `/api/v1/plans/${w.planId}/preset`, body: { presetId: w.presetId, version: ok(await w.c.owner.client.get(`/api/v1/plans/${w.planId}`), 200, "plan").plan.version } }),
    expect: planEdit(200),
  },
  { file: "v1/walkthroughs/route.ts", method: "GET", call: () => ({ path: "/api/v1/walkthroughs" }), expect: signedIn(200) },
  // On the instructor's own plan: members are refused for their account role (403); the admin teaches but has no role on that plan (404).
  { file: "v1/walkthroughs/route.ts", method: "POST", call: (w) => ({ path: "/api/v1/walkthroughs", body: { planId: w.teachPlanId, title: "Matrix new", steps: [] } }), expect: { ...signedIn(403), instructor: 201, admin: 404 } },
  { file: "v1/walkthroughs/[id]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/walkthroughs/${w.walkId}` }), expect: { ...draftAuthor(200), anonymous: 404 } },
  { file: "v1/walkthroughs/[id]/route.ts", method: "PUT", call: (w) => ({ path: `/api/v1/walkthroughs/${w.walkId}`, body: { title: "Matrix draft", steps: [] } }), expect: draftAuthor(200) },
  { file: "v1/walkthroughs/[id]/route.ts", method: "DELETE", call: async (w) => ({ path: `/api/v1/walkthroughs/${await newWalk(w)}` }), expect: draftAuthor(200) },
  { file: "v1/walkthroughs/[id]/link/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/walkthroughs/${w.walkId}/link` }), expect: draftAuthor(201) },
  { file: "v1/walkthroughs/[id]/link/route.ts", method: "DELETE", call: (w) => ({ path: `/api/v1/walkthroughs/${w.walkId}/link` }), expect: draftAuthor(200) },
];
