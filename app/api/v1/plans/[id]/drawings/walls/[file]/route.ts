import { z } from "zod";
import { requestEm } from "@/lib/server/db";
import { parseParams, route } from "@/lib/server/http";
import { svgResponse } from "@/lib/server/packet/svg-response";
import { withRetryAfter } from "@/lib/server/retry-after";
import { planDrawingFile } from "@/lib/server/services/drawing-files";
import { requireUser } from "@/lib/server/session";

/** `[wallId].svg`: wall ids are the plan document's ids (letters, digits, - and _). */
const params = z.object({ id: z.string().uuid(), file: z.string().max(80).regex(/^[A-Za-z0-9_-]{1,64}\.svg$/) });

/** One wall's elevation as an SVG file (dimension chains, fixture labels, a scale bar); unknown walls 404. */
export const GET = route<{ params: Promise<{ id: string; file: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id, file } = parseParams(await ctx.params, params);
    const em = await requestEm();
    const user = await requireUser(em);
    return svgResponse(await planDrawingFile(em, user, id, { kind: "wall", wallId: file.slice(0, -4) }, { signal: req.signal }));
  }),
);
