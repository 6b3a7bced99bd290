"use client";

import Link from "next/link";
import { useState } from "react";
import type { PlanRow } from "./api";

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: "medium", timeStyle: "short" });

export function PlanCard({ plan, onRename, onDuplicate, onDelete }: { plan: PlanRow; onRename: (name: string) => void; onDuplicate: () => void; onDelete: () => void }) {
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(plan.name);
  return (
    <li className="flex flex-col gap-3 rounded-lg border border-walnut-100 bg-white/70 p-4" data-testid="plan-card">
      {editing ? (
        <form
          onSubmit={(e) => {
            e.preventDefault();
            if (name.trim()) onRename(name.trim());
            setEditing(false);
          }}
          className="flex gap-2"
        >
          <label className="sr-only" htmlFor={`rename-${plan.id}`}>New name</label>
          <input id={`rename-${plan.id}`} autoFocus value={name} maxLength={120} onChange={(e) => setName(e.target.value)} className="flex-1 rounded border border-walnut-300 px-2 py-1" />
          <button className="rounded bg-walnut-700 px-2 text-sm text-paper">Save</button>
        </form>
      ) : (
        <Link href={`/plans/${plan.id}`} className="text-lg font-semibold text-walnut-900 hover:underline">{plan.name}</Link>
      )}
      <p className="text-xs text-walnut-500">
        Changed {when(plan.updatedAt)} · version {plan.version}
        {plan.role !== "owner" && ` · ${plan.role}, shared by ${plan.ownerName}`}
      </p>
      <div className="flex flex-wrap gap-2 text-sm">
        <Link href={`/plans/${plan.id}`} className="rounded-md bg-walnut-700 px-3 py-1 text-paper">Open</Link>
        {plan.role !== "viewer" && <button type="button" onClick={() => setEditing(true)} className="rounded-md border border-walnut-300 px-3 py-1">Rename</button>}
        <button type="button" onClick={onDuplicate} className="rounded-md border border-walnut-300 px-3 py-1">Duplicate</button>
        {plan.role === "owner" && <button type="button" onClick={onDelete} className="rounded-md border border-brick-500 px-3 py-1 text-brick-700">Delete</button>}
      </div>
    </li>
  );
}
