/** Role matrix entries: links, collaborators, invitations, shared reads, e-mail tokens, photos. */
import type { Entry } from "./role-entries-plans";
import { emailToken, everyone, freshPlan, inviteToken, ok, pendingPhoto, planEdit, planOwner, planRead, signedIn } from "./role-world";
import { randomUUID } from "node:crypto";

const someone = () => `someone-${randomUUID().slice(0, 8)}@example.test`;

export const sharingEntries: Entry[] = [
  { file: "v1/plans/[id]/links/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/links` }), expect: planOwner(200) },
  { file: "v1/plans/[id]/links/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/plans/${w.planId}/links`, body: { expiresInDays: 1 } }), expect: planOwner(201) },
  {
    file: "v1/plans/[id]/links/[linkId]/route.ts",
    method: "DELETE",
    call: async (w) => ({ path: `/api/v1/plans/${w.planId}/links/${ok(await w.c.owner.client.post(`/api/v1/plans/${w.planId}/links`, {}), 201, "link").link.id}` }),
    expect: planOwner(200),
  },
  { file: "v1/plans/[id]/members/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/members` }), expect: planRead(200) },
  { file: "v1/plans/[id]/members/[userId]/route.ts", method: "PATCH", call: (w) => ({ path: `/api/v1/plans/${w.planId}/members/${w.viewerId}`, body: { role: "viewer" } }), expect: planOwner(200) },
  {
    file: "v1/plans/[id]/members/[userId]/route.ts",
    method: "DELETE",
    call: async (w) => ({ path: `/api/v1/plans/${await freshPlan(w)}/members/${w.editorId}` }),
    // Removing the editor: the owner may; the editor may remove themselves (leave); the viewer may not.
    expect: planEdit(200),
  },
  { file: "v1/plans/[id]/invitations/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/invitations` }), expect: planOwner(200) },
  { file: "v1/plans/[id]/invitations/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/plans/${w.planId}/invitations`, body: { email: someone(), role: "viewer" } }), expect: planOwner(201) },
  {
    file: "v1/plans/[id]/invitations/[invId]/route.ts",
    method: "DELETE",
    call: async (w) => ({ path: `/api/v1/plans/${w.planId}/invitations/${ok(await w.c.owner.client.post(`/api/v1/plans/${w.planId}/invitations`, { email: someone(), role: "viewer" }), 201, "invite").invitation.id}` }),
    expect: planOwner(200),
  },
  {
    file: "v1/invitations/[token]/route.ts",
    method: "GET",
    call: async (w) => ({ path: `/api/v1/invitations/${await inviteToken(w.c.owner.client, w.planId, someone())}` }),
    expect: everyone(200),
    note: "whoever holds the link may read what it is for",
  },
  {
    file: "v1/invitations/[token]/accept/route.ts",
    method: "POST",
    call: async (w) => {
      const plan = ok(await w.c.owner.client.post("/api/v1/plans", { name: "Matrix invite" }), 201, "plan").plan.id;
      return { path: `/api/v1/invitations/${await inviteToken(w.c.owner.client, plan, w.c.stranger.email)}/accept` };
    },
    // Sent to the stranger's address: only that account may accept it.
    expect: { ...signedIn(403), stranger: 200 },
  },
  { file: "v1/shared/[token]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/shared/${w.shareToken}` }), expect: everyone(200) },
  { file: "v1/shared/[token]/build/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/shared/${w.shareToken}/build` }), expect: everyone(200) },
  { file: "v1/shared/[token]/packet.pdf/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/shared/${w.shareToken}/packet.pdf` }), expect: everyone(200), note: "read-only packet for whoever holds a live link" },
  { file: "v1/shared/[token]/copy/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/shared/${w.shareToken}/copy` }), expect: signedIn(201) },
  { file: "v1/account/reset/route.ts", method: "POST", call: () => ({ path: "/api/v1/account/reset", body: { email: someone() } }), expect: everyone(202) },
  { file: "v1/account/reset/confirm/route.ts", method: "POST", call: async () => ({ path: "/api/v1/account/reset/confirm", body: { token: await emailToken("reset"), password: "Hickory-and-ash-64" } }), expect: everyone(200), note: "the e-mailed token is the credential" },
  { file: "v1/account/verify/route.ts", method: "POST", call: () => ({ path: "/api/v1/account/verify" }), expect: signedIn(202) },
  { file: "v1/account/verify/confirm/route.ts", method: "POST", call: async () => ({ path: "/api/v1/account/verify/confirm", body: { token: await emailToken("verify") } }), expect: everyone(200) },
  { file: "v1/plans/[id]/photos/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/photos` }), expect: planRead(200) },
  { file: "v1/plans/[id]/photos/route.ts", method: "POST", call: (w) => ({ path: `/api/v1/plans/${w.planId}/photos`, body: { wallId: "north", contentType: "image/jpeg", bytes: 1000 } }), expect: planEdit(201) },
  { file: "v1/plans/[id]/photos/[photoId]/route.ts", method: "GET", call: (w) => ({ path: `/api/v1/plans/${w.planId}/photos/${w.readyPhotoId}` }), expect: planRead(200) },
  { file: "v1/plans/[id]/photos/[photoId]/route.ts", method: "PATCH", call: (w) => ({ path: `/api/v1/plans/${w.planId}/photos/${w.readyPhotoId}`, body: { scale: { ax: 1, ay: 1, bx: 31, by: 1, distanceMm: 100 } } }), expect: planEdit(200) },
  { file: "v1/plans/[id]/photos/[photoId]/route.ts", method: "DELETE", call: async (w) => ({ path: `/api/v1/plans/${w.planId}/photos/${await pendingPhoto(w.c.owner.client, w.planId, false)}` }), expect: planEdit(200) },
  { file: "v1/plans/[id]/photos/[photoId]/confirm/route.ts", method: "POST", call: async (w) => ({ path: `/api/v1/plans/${w.planId}/photos/${await pendingPhoto(w.c.owner.client, w.planId, true)}/confirm` }), expect: planEdit(200) },
];
