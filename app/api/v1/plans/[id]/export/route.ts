import { NextResponse } from "next/server";
import { parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { getPlan } from "@/lib/server/services/plans";

/** The plan as a file in Benchwright's documented JSON format (docs/plan-format.md). */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const plan = await getPlan(em, user, id);
  const file = { format: "benchwright-plan", name: plan.name, exportedAt: new Date().toISOString(), document: plan.document };
  const slug = plan.name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "plan";
  return new NextResponse(JSON.stringify(file, null, 2), {
    headers: { "content-type": "application/json; charset=utf-8", "content-disposition": `attachment; filename="${slug}.benchwright.json"` },
  });
});
