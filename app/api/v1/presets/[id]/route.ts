import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { currentUser, requireUser } from "@/lib/server/session";
import { deletePreset, getPreset, presetBody, updatePreset } from "@/lib/server/services/presets";

type Ctx = { params: Promise<{ id: string }> };

/** A published preset, or my own draft. */
export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  return json({ preset: await getPreset(em, await currentUser(em), id) });
});

export const PUT = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, presetBody, 20_000);
  return json({ preset: await updatePreset(em, user, id, body) });
});

export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  await deletePreset(em, user, id);
  return json({ deleted: true });
});
