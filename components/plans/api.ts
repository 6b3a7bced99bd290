/** Browser calls to the plans API; errors carry the server's message. */
export interface PlanRow {
  id: string;
  name: string;
  version: number;
  role: "owner" | "editor" | "viewer";
  ownerName: string;
  updatedAt: string;
  deletedAt: string | null;
}

export class ApiError extends Error {
  constructor(readonly status: number, message: string, readonly body: unknown) {
    super(message);
  }
}

export async function api<T>(path: string, init: RequestInit = {}): Promise<T> {
  const res = await fetch(path, { ...init, headers: { "content-type": "application/json", ...(init.headers ?? {}) } });
  const data = (await res.json().catch(() => null)) as ({ error?: { message?: string } } & T) | null;
  if (!res.ok) throw new ApiError(res.status, data?.error?.message ?? `Request failed (${res.status}).`, data);
  return data as T;
}

export const plansApi = {
  list: () => api<{ plans: PlanRow[] }>("/api/v1/plans").then((r) => r.plans),
  create: (name: string) => api<{ plan: PlanRow }>("/api/v1/plans", { method: "POST", body: JSON.stringify({ name }) }).then((r) => r.plan),
  rename: (id: string, name: string) => api<{ plan: PlanRow }>(`/api/v1/plans/${id}`, { method: "PATCH", body: JSON.stringify({ name }) }),
  duplicate: (id: string) => api<{ plan: PlanRow }>(`/api/v1/plans/${id}/duplicate`, { method: "POST" }),
  remove: (id: string) => api<{ plan: PlanRow }>(`/api/v1/plans/${id}`, { method: "DELETE" }),
  restore: (id: string) => api<{ plan: PlanRow }>(`/api/v1/plans/${id}/restore`, { method: "POST" }),
};
