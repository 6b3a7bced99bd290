import { checkHealth } from "@/lib/server/services/health";

export const dynamic = "force-dynamic";

/**
 * GET /api/health, for load balancers and the supervisor's operators: 200 when the database answers
 * and no migration is pending, 503 naming the part that is not. No session, no secrets. Not wrapped
 * in route(): a balancer polls it every few seconds and a log line per poll would drown the rest.
 */
export async function GET(): Promise<Response> {
  const h = await checkHealth();
  return Response.json(h, { status: h.ok ? 200 : 503, headers: { "cache-control": "no-store" } });
}
