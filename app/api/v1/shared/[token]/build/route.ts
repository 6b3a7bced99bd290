import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { withRetryAfter } from "@/lib/server/retry-after";
import { tokenParam } from "@/lib/server/services/route-params";
import { sharedBuild } from "@/lib/server/services/plan-build";

/** A shared plan's labelled parts, setups, stop tables and build steps, without signing in. Revoked, expired or unknown links: 404. */
export const GET = route<{ params: Promise<{ token: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { token } = parseParams(await ctx.params, tokenParam);
    const em = await requestEm();
    const res = json(await sharedBuild(em, token, { signal: req.signal }));
    res.headers.set("x-robots-tag", "noindex, nofollow");
    res.headers.set("cache-control", "private, no-store");
    return res;
  }),
);
