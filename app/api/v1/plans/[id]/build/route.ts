import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { withRetryAfter } from "@/lib/server/retry-after";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { planBuild } from "@/lib/server/services/plan-build";

/** The plan's labelled parts, setups, stop tables and build steps (owners, editors, viewers; worked out in the engine's worker pool). */
export const GET = route<{ params: Promise<{ id: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id } = parseParams(await ctx.params, idParam);
    const em = await requestEm();
    const user = await requireUser(em);
    const res = json(await planBuild(em, user, id, { signal: req.signal }));
    res.headers.set("cache-control", "private, no-store");
    return res;
  }),
);
