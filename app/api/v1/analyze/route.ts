import { z } from "zod";
import { requestEm } from "@/lib/server/db";
import { analyzeInWorker, testKnobs } from "@/lib/server/engine-pool/engine";
import { parseBody, route } from "@/lib/server/http";
import { withRetryAfter } from "@/lib/server/retry-after";
import { currentUser } from "@/lib/server/session";
import { limitAnonymousAnalysis, MAX_ANONYMOUS_BODY_BYTES, MAX_SIGNED_IN_BODY_BYTES, readAnalyzeRequest } from "@/lib/server/services/analysis";

/** Anything JSON: a bare plan document, or `{ plan, preset? }` (read by readAnalyzeRequest). */
const analyzeBody = z.unknown();

/**
 * Stateless analysis: findings of every rule, keep-clear zones and a parts summary for a posted plan,
 * worked out in the engine's worker pool (time-limited, size-bounded answer). Anonymous callers are
 * rate-limited by address and get a smaller body cap.
 */
export const POST = route(
  withRetryAfter(async (req) => {
    const em = await requestEm();
    const user = await currentUser(em);
    if (!user) await limitAnonymousAnalysis(em, req.headers);
    const raw = await parseBody(req, analyzeBody, user ? MAX_SIGNED_IN_BODY_BYTES : MAX_ANONYMOUS_BODY_BYTES);
    const { plan, preset } = readAnalyzeRequest(raw);
    const text = await analyzeInWorker(plan, preset, { signal: req.signal, test: testKnobs(req.headers) });
    return new Response(text, { headers: { "content-type": "application/json" } });
  }),
);
