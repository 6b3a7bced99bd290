import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { adoptPreset, getPlanPreset } from "@/lib/server/services/plan-preset";
import { adoptPresetBody } from "@/lib/server/services/route-params";

type Ctx = { params: Promise<{ id: string }> };

/** The preset this plan has adopted (null when none). */
export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ preset: await getPlanPreset(em, user, id) });
});

/** Adopt a preset or none: { presetId | null, version } (a versioned save; stale: 409). */
export const PUT = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, adoptPresetBody, 10_000);
  return json(await adoptPreset(em, user, id, body));
});
