import { requestEm } from "@/lib/server/db";
import { parseParams, route } from "@/lib/server/http";
import { packetResponse } from "@/lib/server/packet/response";
import { withRetryAfter } from "@/lib/server/retry-after";
import { idParam } from "@/lib/server/schemas";
import { planPacket } from "@/lib/server/services/packet";
import { requireUser } from "@/lib/server/session";

/** The plan's build packet as a PDF (owners, editors and viewers), built in the packet worker; the same file again while the plan is unchanged. */
export const GET = route<{ params: Promise<{ id: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id } = parseParams(await ctx.params, idParam);
    const em = await requestEm();
    const user = await requireUser(em);
    return packetResponse(await planPacket(em, user, id, { signal: req.signal }));
  }),
);
