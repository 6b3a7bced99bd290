import { NextResponse } from "next/server";
import { requestEm } from "@/lib/server/db";
import { parseParams, route } from "@/lib/server/http";
import { withRetryAfter } from "@/lib/server/retry-after";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { planPartsCsv } from "@/lib/server/services/plan-exports";

/** The plan's parts list as a CSV file (written in the engine's worker pool). */
export const GET = route<{ params: Promise<{ id: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id } = parseParams(await ctx.params, idParam);
    const em = await requestEm();
    const user = await requireUser(em);
    const file = await planPartsCsv(em, user, id, { signal: req.signal });
    return new NextResponse(file.text, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${file.filename}"` } });
  }),
);
