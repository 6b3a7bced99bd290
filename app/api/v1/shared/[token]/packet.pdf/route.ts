import { requestEm } from "@/lib/server/db";
import { parseParams, route } from "@/lib/server/http";
import { packetResponse } from "@/lib/server/packet/response";
import { withRetryAfter } from "@/lib/server/retry-after";
import { tokenParam } from "@/lib/server/services/route-params";
import { sharedPacket } from "@/lib/server/services/packet";

/** A shared plan's build packet, read-only, without signing in. Revoked, expired or unknown links: 404. */
export const GET = route<{ params: Promise<{ token: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { token } = parseParams(await ctx.params, tokenParam);
    const em = await requestEm();
    return packetResponse(await sharedPacket(em, token, { signal: req.signal }), { "x-robots-tag": "noindex, nofollow" });
  }),
);
