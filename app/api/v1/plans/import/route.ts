import { z } from "zod";
import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { planName } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { createPlan } from "@/lib/server/services/plans";

const importBody = z.object({ format: z.literal("benchwright-plan", { message: "This is not a Benchwright plan file." }), name: planName, document: z.unknown() });

/** A new plan from an exported file; older document versions are upgraded, bad ones answer 422 with paths. */
export const POST = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, importBody, 5_000_000);
  return json({ plan: await createPlan(em, user, { name: body.name, document: body.document }) }, 201);
});
