import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { presetOfDocument } from "@/lib/server/services/plan-preset";
import { tokenParam } from "@/lib/server/services/route-params";
import { openShared } from "@/lib/server/services/share-links";

/** A shared plan, read-only, without signing in. Revoked, expired or unknown links: 404. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_req, ctx) => {
  const { token } = parseParams(await ctx.params, tokenParam);
  const em = await requestEm();
  const plan = await openShared(em, token);
  const res = json({ plan, preset: await presetOfDocument(em, plan.document) });
  res.headers.set("x-robots-tag", "noindex, nofollow");
  res.headers.set("cache-control", "private, no-store");
  return res;
});
