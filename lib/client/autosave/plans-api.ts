import type { PlanDocument } from "@/lib/engine/plan/schema";

/** The slice of the plans API the editor uses: GET/PUT /api/v1/plans/:id, POST /api/v1/plans, revisions. */
export interface PlanRecord {
  id: string;
  name: string;
  version: number;
  document: PlanDocument;
  role?: string;
}

export interface RevisionRecord {
  id: string;
  version: number;
  name: string;
  authorName: string;
  createdAt: string;
}

/** A failed call: status 0 means the request never reached the server. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly body: unknown = null,
  ) {
    super(message);
  }
}

export type FetchLike = (input: string, init?: RequestInit) => Promise<Response>;

async function call<T>(fetchFn: FetchLike, url: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetchFn(url, { ...init, headers: { "content-type": "application/json", ...(init?.headers ?? {}) } });
  } catch (e) {
    throw new ApiError(0, "network", e instanceof Error ? e.message : "The network is unreachable.");
  }
  const body = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
  if (!res.ok) throw new ApiError(res.status, body?.error?.code ?? "http_" + res.status, body?.error?.message ?? res.statusText, body);
  return body as T;
}

export function plansApi(fetchFn: FetchLike) {
  const base = "/api/v1/plans";
  return {
    get: (id: string) => call<{ plan: PlanRecord }>(fetchFn, `${base}/${id}`).then((r) => r.plan),
    save: (id: string, document: PlanDocument, version: number) =>
      call<{ plan: PlanRecord }>(fetchFn, `${base}/${id}`, { method: "PUT", body: JSON.stringify({ document, version }) }).then((r) => r.plan),
    create: (name: string, document: PlanDocument) => call<{ plan: PlanRecord }>(fetchFn, base, { method: "POST", body: JSON.stringify({ name, document }) }).then((r) => r.plan),
    revisions: (id: string) => call<{ revisions: RevisionRecord[] }>(fetchFn, `${base}/${id}/revisions`).then((r) => r.revisions),
    restoreRevision: (id: string, revId: string, version: number) =>
      call<{ plan: PlanRecord }>(fetchFn, `${base}/${id}/revisions/${revId}/restore`, { method: "POST", body: JSON.stringify({ version }) }).then((r) => r.plan),
  };
}

export type PlansApi = ReturnType<typeof plansApi>;

/** The server's current version from a 409 body ({error:{currentVersion}}), if it says. */
export function serverVersionOf(e: ApiError): number | null {
  const v = (e.body as { error?: { currentVersion?: unknown } } | null)?.error?.currentVersion;
  return typeof v === "number" ? v : null;
}
