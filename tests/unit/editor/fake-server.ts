import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { FetchLike } from "@/lib/client/autosave/plans-api";

/**
 * A fake of the plans API for tests only: one plan in memory with optimistic locking, answering
 * the same shapes as the real handlers ({plan}, 409 {error:{code:"stale_version",currentVersion}}).
 */
export function fakeServer(doc: PlanDocument) {
  const s = {
    plans: new Map<string, { id: string; name: string; version: number; document: PlanDocument }>([["p1", { id: "p1", name: "Shop", version: 1, document: doc }]]),
    mode: "up" as "up" | "down" | "error",
    calls: [] as { method: string; url: string; body: unknown }[],
    created: 0,
  };
  const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });
  const fetch: FetchLike = async (url, init) => {
    const method = init?.method ?? "GET";
    const body = init?.body ? JSON.parse(String(init.body)) : null;
    s.calls.push({ method, url, body });
    if (s.mode === "down") throw new TypeError("Failed to fetch");
    if (s.mode === "error") return json(500, { error: { code: "internal", message: "Something went wrong on our side." } });
    const m = url.match(/^\/api\/v1\/plans\/([^/]+)$/);
    if (m && method === "GET") return json(200, { plan: s.plans.get(m[1]) });
    if (m && method === "PUT") {
      const p = s.plans.get(m[1])!;
      if (body.version !== p.version) return json(409, { error: { code: "stale_version", message: `Now version ${p.version}.`, currentVersion: p.version } });
      p.version += 1;
      p.document = body.document;
      return json(200, { plan: p });
    }
    if (url === "/api/v1/plans" && method === "POST") {
      const id = `copy${++s.created}`;
      const p = { id, name: body.name, version: 1, document: body.document };
      s.plans.set(id, p);
      return json(201, { plan: p });
    }
    return json(404, { error: { code: "not_found", message: "Not found" } });
  };
  /** Someone else saves the plan meanwhile. */
  const bump = () => {
    const p = s.plans.get("p1")!;
    p.version += 1;
  };
  return { s, fetch, bump };
}
