import { z } from "zod";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "./schema";

/** JSON Schema (draft 2020-12) of what a plan document file may contain, generated from the zod schema: defaulted fields are optional. */
export function planJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(planDocumentSchema, { io: "input", target: "draft-2020-12" }) as Record<string, unknown>;
  return {
    ...generated,
    title: `Benchwright plan document, version ${PLAN_SCHEMA_VERSION}`,
    description: "A workshop plan: settings, the measured room, materials and fixtures. Lengths in millimetres, angles in degrees. See docs/plan-format.md.",
  };
}
