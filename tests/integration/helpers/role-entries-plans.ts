/** Role matrix entries: accounts, administration, plans and revisions, prices, auth. */
import { randomUUID } from "node:crypto";
import { sampleDoc } from "./sharing";
import { everyone, ok, planEdit, planOwner, planRead, signedIn, freshPlan, type Expect, type Persona, type World } from "./role-world";

export interface Call {
  path: string;
  body?: unknown;
}

export interface Entry {
  /** Route file relative to app/api, e.g. "v1/plans/[id]/route.ts". */
  file: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** Builds the request for one persona (may create fresh records first). */
  call: (w: World, who: Persona) => Promise<Call> | Call;
  expect: Expect;
  note?: string;
}

const current = async (w: World, id: string) => ok(await w.c.owner.client.get(`/api/v1/plans/${id}`), 200, "plan").plan as { document: unknown; version: number };

export const planEntries: Entry[] = [
  { file: "auth/[...nextauth]/route.ts", method: "GET", call: () => ({ path: "/api/auth/csrf" }), expect: everyone(200) },
  { file: "health/route.ts", method: "GET", call: () => ({ path: "/api/health" }), expect: everyone(200), note: "for load balancers: no session needed" },
  // The auth endpoints take forms only: a JSON post is refused before next-auth sees it, whoever sends it.
  { file: "auth/[...nextauth]/route.ts", method: "POST", call: () => ({ path: "/api/auth/callback/credentials", body: {} }), expect: everyone(415) },
  { file: "v1/account/route.ts", method: "POST", call: () => ({ path: "/api/v1/account", body: { name: "Matrix", email: `m-${randomUUID().slice(0, 8)}@example.test`, password: "Cedar-and-elm-31" } }), expect: everyone(201), note: "sign-up is open to anyone" },
  // An empty body is refused by the schema (422) once signed in; a wrong current password would count as a failed sign-in.
  { file: "v1/account/password/route.ts", method: "PUT", call: () => ({ path: "/api/v1/account/password", body: {} }), expect: signedIn(422) },
  { file: "v1/admin/users/route.ts", method: "GET", call: () => ({ path: "/api/v1/admin/users" }), expect: { ...signedIn(403), admin: 200 } },
  { file: "v1/admin/users/[id]/route.ts", method: "PATCH", call: (w) => ({ path: `/api/v1/admin/users/${w.strangerId}`, body: { role: "member" } }), expect: { ...signedIn(403), admin: 200 } },
  { file: "v1/plans/route.ts", method: "GET", call: () => ({ path: "/api/v1/plans" }), expect: signedIn(200) },
  { file: "v1/plans/route.ts", method: "POST", call: () => ({ path: "/api/v1/plans", body: { name: "Matrix new" } }), expect: signedIn(201) },
  { file: "v1/plans/[id]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}` }), expect: planRead(200) },
  {
    file: "v1/plans/[id]/route.ts",
    method: "PUT",
    call: async (w) => {
      const p = await current(w, w.planId);
      return { path: `/api/v1/plans/${w.planId}`, body: { document: p.document, version: p.version } };
    },
    expect: planEdit(200),
  },
  { file: "v1/plans/[id]/route.ts", method: "PATCH", call: (w) => ({ path: `/api/v1/plans/${w.planId}`, body: { name: "Matrix plan" } }), expect: planEdit(200) },
  { file: "v1/plans/[id]/route.ts", method: "DELETE", call: async (w) => ({ path: `/api/v1/plans/${await freshPlan(w)}` }), expect: planOwner(200) },
  { file: "v1/plans/[id]/duplicate/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/plans/${w.planId}/duplicate` }), expect: planRead(201) },
  {
    file: "v1/plans/[id]/restore/route.ts",
    method: "POST",
    call: async (w) => {
      const id = await freshPlan(w);
      ok(await w.c.owner.client.del(`/api/v1/plans/${id}`), 200, "delete");
      return { path: `/api/v1/plans/${id}/restore` };
    },
    // A deleted plan is gone for its collaborators too: only the owner sees it to restore it.
    expect: { ...planRead(200), viewer: 404, editor: 404 },
  },
  { file: "v1/plans/[id]/revisions/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/revisions` }), expect: planRead(200) },
  { file: "v1/plans/[id]/revisions/[revId]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/revisions/${w.revId}` }), expect: planRead(200) },
  {
    file: "v1/plans/[id]/revisions/[revId]/restore/route.ts",
    method: "POST",
    call: async (w) => ({ path: `/api/v1/plans/${w.planId}/revisions/${w.revId}/restore`, body: { version: (await current(w, w.planId)).version } }),
    expect: planEdit(200),
  },
  { file: "v1/plans/[id]/export/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/export` }), expect: planRead(200) },
  { file: "v1/plans/[id]/export/parts.csv/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/export/parts.csv` }), expect: planRead(200) },
  { file: "v1/plans/[id]/build/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/build` }), expect: planRead(200) },
  { file: "v1/plans/[id]/packet.pdf/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/packet.pdf` }), expect: planRead(200) },
  { file: "v1/plans/[id]/drawings/plan.svg/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/drawings/plan.svg` }), expect: planRead(200) },
  { file: "v1/plans/[id]/drawings/walls/[file]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/drawings/walls/north.svg` }), expect: planRead(200) },
  { file: "v1/plans/[id]/export/shopping.csv/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/export/shopping.csv` }), expect: planRead(200) },
  { file: "v1/plans/[id]/progress/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/progress` }), expect: planRead(200) },
  {
    file: "v1/plans/[id]/progress/route.ts",
    method: "POST",
    call: (w) => ({ path: `/api/v1/plans/${w.planId}/progress`, body: { checks: [{ id: randomUUID(), item: "step:room-cut", delta: 1, madeAt: new Date().toISOString() }] } }),
    expect: planRead(200),
    note: "viewers record their own shop-floor progress",
  },
  { file: "v1/plans/import/route.ts", method: "POST", call: () => ({ path: "/api/v1/plans/import", body: { format: "benchwright-plan", name: "Matrix import", document: sampleDoc() } }), expect: signedIn(201) },
  { file: "v1/schema/plan/route.ts", method: "GET", call: () => ({ path: "/api/v1/schema/plan" }), expect: everyone(200), note: "the format is public" },
  { file: "v1/analyze/route.ts", method: "POST", call: () => ({ path: "/api/v1/analyze", body: sampleDoc() }), expect: everyone(200), note: "stateless: analyses the posted plan, stores nothing" },
  { file: "v1/prices/route.ts", method: "GET", call: () => ({ path: "/api/v1/prices" }), expect: signedIn(200) },
  {
    file: "v1/prices/route.ts",
    method: "PUT",
    call: async (w, who) => {
      const mine = who === "anonymous" ? { prices: { currency: "USD", items: [] } } : ok(await w.as[who].get("/api/v1/prices"), 200, "prices");
      const { currency, items } = mine.prices as { currency: string; items: unknown[] };
      return { path: "/api/v1/prices", body: { currency, items } };
    },
    expect: signedIn(200),
  },
  { file: "v1/prices/route.ts", method: "DELETE", call: () => ({ path: "/api/v1/prices" }), expect: signedIn(200) },
];
