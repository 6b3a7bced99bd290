import { NextResponse } from "next/server";
import { parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { planPartsCsv } from "@/lib/server/services/plan-exports";

/** The plan's parts list as a CSV file. */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const file = await planPartsCsv(em, user, id);
  return new NextResponse(file.text, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${file.filename}"` } });
});
