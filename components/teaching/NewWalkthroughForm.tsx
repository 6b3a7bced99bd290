"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { api } from "@/components/plans/api";

/** Starts a walk-through on one of the instructor's plans, then opens the step editor. */
export function NewWalkthroughForm({ plans }: { plans: { id: string; name: string }[] }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    try {
      const r = await api<{ walkthrough: { id: string } }>("/api/v1/walkthroughs", {
        method: "POST",
        body: JSON.stringify({ planId: f.get("planId"), title: f.get("title"), steps: [{ title: "The room", view: "plan", note: "" }] }),
      });
      router.push(`/present/${r.walkthrough.id}/edit`);
    } catch (err) {
      setError((err as Error).message);
    }
  }
  if (!plans.length) return <p className="text-sm text-walnut-700">Make a plan first; a walk-through is built on a plan you can edit.</p>;
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2 rounded-md bg-paper-deep p-3">
      <label className="flex flex-col text-sm">
        Title
        <input name="title" required maxLength={120} className="rounded-md border border-walnut-300 bg-white px-2 py-1" />
      </label>
      <label className="flex flex-col text-sm">
        Plan
        <select name="planId" className="rounded-md border border-walnut-300 bg-white px-2 py-1">
          {plans.map((p) => (
            <option key={p.id} value={p.id}>{p.name}</option>
          ))}
        </select>
      </label>
      <button type="submit" className="rounded-md bg-walnut-700 px-3 py-1.5 text-sm font-medium text-paper">New walk-through</button>
      {error && <p role="alert" className="w-full text-sm text-brick-700">{error}</p>}
    </form>
  );
}
