import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { currentUser, requireUser } from "@/lib/server/session";
import { createPreset, listPresets, presetBody } from "@/lib/server/services/presets";
import { ownerQuery } from "@/lib/server/services/route-params";

/** Published presets (?owner=<id> for one instructor's) and, when signed in, my drafts. */
export const GET = route(async (req) => {
  const em = await requestEm();
  const ownerId = ownerQuery.catch(undefined).parse(new URL(req.url).searchParams.get("owner") ?? undefined);
  return json({ presets: await listPresets(em, await currentUser(em), { ownerId }) });
});

/** An instructor's new preset: { name, description?, numbers: { walkwayMm: 1066.8, ... }, published? }. */
export const POST = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, presetBody, 20_000);
  return json({ preset: await createPreset(em, user, body) }, 201);
});
