import { z } from "zod";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { derivePlan } from "@/lib/engine/derive";
import { parsePlan } from "@/lib/engine/plan/parse";
import { invalid } from "@/lib/server/errors";
import { fieldErrors, json, parseBody, route } from "@/lib/server/http";
import { presetNumbersSchema } from "@/lib/server/services/presets";

/** 1 MB: a plan with the schema's 2000 fixtures is well under it. */
const MAX_BODY_BYTES = 1_000_000;

/** Anything JSON: a bare plan document, or `{ plan, preset? }`. The plan is read with parsePlan below. */
const analyzeBody = z.unknown();

/** Stateless analysis: findings of every rule, keep-clear zones and a parts summary for a posted plan. */
export const POST = route(async (req) => {
  const raw = await parseBody(req, analyzeBody, MAX_BODY_BYTES);
  const wrapped = typeof raw === "object" && raw !== null && !Array.isArray(raw) && "plan" in raw && !("schemaVersion" in raw);
  const body = raw as Record<string, unknown>;
  const prefix = wrapped ? "plan." : "";
  const parsed = parsePlan(wrapped ? body.plan : raw);
  if (!parsed.ok) {
    const fields: Record<string, string> = {};
    for (const i of parsed.issues) {
      const key = prefix + (i.path || "_");
      if (!fields[key]) fields[key] = i.message;
    }
    throw invalid("Some fields of the plan are not valid.", fields);
  }
  let preset: z.infer<typeof presetNumbersSchema> | undefined;
  if (wrapped && body.preset !== undefined) {
    const p = presetNumbersSchema.safeParse(body.preset);
    if (!p.success) {
      const fields: Record<string, string> = {};
      for (const [k, v] of Object.entries(fieldErrors(p.error))) fields[`preset.${k}`] = v;
      throw invalid("Some preset numbers are not valid.", fields);
    }
    preset = p.data;
  }
  return json(analyzePlan(parsed.plan, derivePlan(parsed.plan), { preset }));
});
