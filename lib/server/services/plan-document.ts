import { planDocumentSchema, type PlanDocument } from "@/lib/engine/plan/schema";
import { invalid } from "../errors";

/** Validates a plan document with the engine's schema; 422 with the path of each bad field. */
export function validateDocument(raw: unknown): PlanDocument {
  const parsed = planDocumentSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string> = {};
  for (const i of parsed.error.issues) {
    const key = ["document", ...i.path.map(String)].join(".");
    if (!fields[key]) fields[key] = i.message;
  }
  throw invalid("The plan document is not valid.", fields);
}

/** A new, empty plan: a plain rectangular garage to start measuring from (6.1 x 6.7 m). */
export function blankDocument(): PlanDocument {
  return planDocumentSchema.parse({
    schemaVersion: 1,
    room: {
      walls: [
        { id: "w1", label: "Door wall", lengthMm: 6100 },
        { id: "w2", label: "Right wall", lengthMm: 6700 },
        { id: "w3", label: "Back wall", lengthMm: 6100 },
        { id: "w4", label: "Left wall", lengthMm: 6700 },
      ],
    },
  });
}
