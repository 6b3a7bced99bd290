"use client";

import { useState } from "react";

const ROLES = ["member", "instructor", "admin"] as const;

export function RoleSelect({ userId, role, self }: { userId: string; role: string; self: boolean }) {
  const [value, setValue] = useState(role);
  const [state, setState] = useState<"idle" | "saving" | "saved" | string>("idle");
  async function change(next: string) {
    const prev = value;
    setValue(next);
    setState("saving");
    const res = await fetch(`/api/v1/admin/users/${userId}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ role: next }) });
    if (res.ok) return setState("saved");
    const data = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
    setValue(prev);
    setState(data?.error?.message ?? "Could not change the role.");
  }
  return (
    <div className="flex items-center gap-2">
      <label className="sr-only" htmlFor={`role-${userId}`}>Role</label>
      <select id={`role-${userId}`} value={value} disabled={self} onChange={(e) => change(e.target.value)} className="rounded border border-walnut-300 bg-white px-2 py-1">
        {ROLES.map((r) => (
          <option key={r} value={r}>{r}</option>
        ))}
      </select>
      <span className="text-xs text-walnut-500" role="status">
        {state === "saving" ? "saving…" : state === "saved" ? "saved" : state === "idle" ? "" : state}
      </span>
    </div>
  );
}
