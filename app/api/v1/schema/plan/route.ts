import { NextResponse } from "next/server";
import { planJsonSchema } from "@/lib/engine/plan/json-schema";
import { route } from "@/lib/server/http";

/** The plan document's JSON Schema (draft 2020-12), generated from the same zod schema the API validates with. */
export const GET = route(async () =>
  NextResponse.json(planJsonSchema(), { headers: { "content-type": "application/schema+json; charset=utf-8", "cache-control": "public, max-age=3600" } }),
);
