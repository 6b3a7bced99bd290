"use client";
import { useCallback, useEffect, useState } from "react";
import type { Autosave } from "@/lib/client/autosave/autosave";
import type { PlansApi, RevisionRecord } from "@/lib/client/autosave/plans-api";
import type { Editor } from "@/lib/client/editor";

/** Earlier saved versions of the plan; restoring one saves it as the newest version. */
export function RevisionsPanel({ api, planId, saver, editor }: { api: PlansApi; planId: string; saver: Autosave; editor: Editor }) {
  const [list, setList] = useState<RevisionRecord[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const load = useCallback(() => {
    api.revisions(planId).then(setList, (e: Error) => setError(e.message));
  }, [api, planId]);
  useEffect(load, [load]);
  return (
    <section aria-labelledby="revisions-h" className="flex flex-col gap-2">
      <div className="flex items-center justify-between">
        <h2 id="revisions-h" className="text-sm font-semibold text-walnut-900">
          Earlier versions
        </h2>
        <button type="button" className="text-xs underline" onClick={load}>
          Refresh
        </button>
      </div>
      {error ? <p role="alert" className="text-xs text-brick-700">{error}</p> : null}
      {list === null ? <p className="text-xs text-walnut-500">Loading…</p> : null}
      {list?.length === 0 ? <p className="text-xs text-walnut-500">No earlier versions yet: each save keeps the one before it.</p> : null}
      <ol className="flex flex-col gap-1">
        {list?.map((r) => (
          <li key={r.id} className="flex items-center justify-between gap-2 rounded border border-walnut-100 bg-white p-2 text-xs">
            <span>
              Version {r.version} · {new Date(r.createdAt).toLocaleString()} · {r.authorName}
            </span>
            <button
              type="button"
              className="rounded border border-walnut-300 px-1.5 py-0.5"
              onClick={async () => {
                await saver.flush();
                try {
                  const plan = await api.restoreRevision(planId, r.id, saver.store.getState().version);
                  saver.adopt(plan);
                  editor.history.replace(plan.document);
                  load();
                } catch (e) {
                  setError(e instanceof Error ? e.message : String(e));
                }
              }}
            >
              Restore
            </button>
          </li>
        ))}
      </ol>
    </section>
  );
}
