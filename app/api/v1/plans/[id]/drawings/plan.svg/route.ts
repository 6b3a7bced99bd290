import { requestEm } from "@/lib/server/db";
import { parseParams, route } from "@/lib/server/http";
import { svgResponse } from "@/lib/server/packet/svg-response";
import { withRetryAfter } from "@/lib/server/retry-after";
import { idParam } from "@/lib/server/schemas";
import { planDrawingFile } from "@/lib/server/services/drawing-files";
import { requireUser } from "@/lib/server/session";

/** The plan view as an SVG file (dimensioned, labelled, with a scale bar), for anyone who may read the plan. */
export const GET = route<{ params: Promise<{ id: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id } = parseParams(await ctx.params, idParam);
    const em = await requestEm();
    const user = await requireUser(em);
    return svgResponse(await planDrawingFile(em, user, id, { kind: "plan" }, { signal: req.signal }));
  }),
);
