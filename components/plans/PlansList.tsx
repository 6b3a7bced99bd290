"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { plansApi, type PlanRow } from "./api";
import { ImportPlan } from "./ImportPlan";
import { PlanCard } from "./PlanCard";

/** My plans: create, rename, duplicate, delete with undo; newest change first. */
export function PlansList() {
  const qc = useQueryClient();
  const router = useRouter();
  const plans = useQuery({ queryKey: ["plans"], queryFn: plansApi.list });
  const [undo, setUndo] = useState<PlanRow | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const refresh = () => qc.invalidateQueries({ queryKey: ["plans"] });
  const fail = (e: Error) => setProblem(e.message);

  const create = useMutation({ mutationFn: plansApi.create, onSuccess: (p) => router.push(`/plans/${p.id}`), onError: fail });
  const rename = useMutation({ mutationFn: (v: { id: string; name: string }) => plansApi.rename(v.id, v.name), onSettled: refresh, onError: fail });
  const duplicate = useMutation({ mutationFn: plansApi.duplicate, onSettled: refresh, onError: fail });
  const remove = useMutation({ mutationFn: (p: PlanRow) => plansApi.remove(p.id), onSuccess: (_r, p) => setUndo(p), onSettled: refresh, onError: fail });
  const restore = useMutation({ mutationFn: plansApi.restore, onSuccess: () => setUndo(null), onSettled: refresh, onError: fail });

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const name = String(new FormData(e.currentTarget).get("name") ?? "").trim();
    if (!name) return setProblem("Give the plan a name.");
    setProblem(null);
    create.mutate(name);
  }

  return (
    <div className="flex flex-col gap-6">
      <form onSubmit={submit} className="flex flex-wrap items-end gap-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="new-plan" className="text-sm font-medium">New plan</label>
          <input id="new-plan" name="name" placeholder="e.g. North bay workshop" maxLength={120} className="w-72 max-w-full rounded-md border border-walnut-300 bg-white px-3 py-2" />
        </div>
        <button type="submit" disabled={create.isPending} className="rounded-md bg-walnut-700 px-4 py-2 font-medium text-paper disabled:opacity-60">
          {create.isPending ? "Creating…" : "Create plan"}
        </button>
      </form>
      <ImportPlan onImported={(id) => router.push(`/plans/${id}`)} />
      {problem && <p role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-sm text-brick-700">{problem}</p>}
      {undo && (
        <div role="status" className="flex items-center gap-3 rounded-md bg-walnut-700 px-4 py-2 text-sm text-paper">
          “{undo.name}” was deleted. It stays restorable for 30 days.
          <button type="button" onClick={() => restore.mutate(undo.id)} className="rounded bg-paper px-2 py-0.5 font-medium text-walnut-900">Undo</button>
        </div>
      )}
      {plans.isPending && <p className="text-walnut-500" aria-busy="true">Loading your plans…</p>}
      {plans.isError && (
        <div role="alert" className="rounded-md bg-brick-100 px-3 py-2 text-sm text-brick-700">
          Your plans could not be loaded: {plans.error.message} <button className="underline" onClick={() => plans.refetch()}>Try again</button>
        </div>
      )}
      {plans.data && plans.data.length === 0 && (
        <div className="rounded-lg border border-dashed border-walnut-300 p-8 text-center text-walnut-700">
          <p className="font-medium">No plans yet.</p>
          <p className="text-sm">Name your first plan above: you will start by measuring the garage walls.</p>
        </div>
      )}
      {plans.data && plans.data.length > 0 && (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Plans, most recently changed first">
          {plans.data.map((p) => (
            <PlanCard key={p.id} plan={p} onRename={(name) => rename.mutate({ id: p.id, name })} onDuplicate={() => duplicate.mutate(p.id)} onDelete={() => remove.mutate(p)} />
          ))}
        </ul>
      )}
    </div>
  );
}
