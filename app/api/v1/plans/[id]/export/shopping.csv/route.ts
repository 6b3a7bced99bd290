import { NextResponse } from "next/server";
import { z } from "zod";
import { requestEm } from "@/lib/server/db";
import { invalid } from "@/lib/server/errors";
import { parseParams, route } from "@/lib/server/http";
import { withRetryAfter } from "@/lib/server/retry-after";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { planShoppingCsv } from "@/lib/server/services/plan-exports";

const query = z.object({ allowance: z.coerce.number().min(0, "0 to 100.").max(100, "0 to 100.").optional() });

/** The plan's shopping list as a CSV file, priced with my price list; ?allowance=10 sets the waste allowance, percent (written in the engine's worker pool). */
export const GET = route<{ params: Promise<{ id: string }> }>(
  withRetryAfter(async (req, ctx) => {
    const { id } = parseParams(await ctx.params, idParam);
    const raw = new URL(req.url).searchParams.get("allowance");
    const q = query.safeParse({ allowance: raw ?? undefined });
    if (!q.success) throw invalid("The allowance must be a percentage from 0 to 100.", { allowance: "0 to 100." });
    const em = await requestEm();
    const user = await requireUser(em);
    const file = await planShoppingCsv(em, user, id, { wasteAllowancePct: q.data.allowance, signal: req.signal });
    return new NextResponse(file.text, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${file.filename}"` } });
  }),
);
