"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useStore } from "zustand";
import type { Autosave } from "@/lib/client/autosave/autosave";
import type { Editor } from "@/lib/client/editor";

/** 409 from the server: the plan was saved elsewhere. The user loads the newer plan or keeps theirs as a copy. */
export function ConflictDialog({ saver, editor, name }: { saver: Autosave; editor: Editor; name: string }) {
  const status = useStore(saver.store, (x) => x.status);
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (status.kind !== "conflict") return null;
  const act = async (fn: () => Promise<void>) => {
    setBusy(true);
    setError(null);
    try {
      await fn();
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-walnut-900/40 p-4">
      <div role="alertdialog" aria-modal="true" aria-labelledby="conflict-h" aria-describedby="conflict-d" className="w-full max-w-md rounded-lg bg-paper p-4 shadow-xl">
        <h2 id="conflict-h" className="text-lg font-semibold text-walnut-900">
          This plan was changed elsewhere
        </h2>
        <p id="conflict-d" className="mt-1 text-sm text-walnut-700">
          Someone (or another tab) saved version {status.serverVersion ?? "?"} while you were editing. Nothing was overwritten. Your changes are kept on this device until you choose.
        </p>
        {error ? (
          <p role="alert" className="mt-2 text-sm text-brick-700">
            {error}
          </p>
        ) : null}
        <div className="mt-3 flex flex-wrap gap-2">
          <button
            type="button"
            disabled={busy}
            className="rounded bg-walnut-700 px-3 py-1.5 text-sm text-paper focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
            onClick={() =>
              act(async () => {
                const plan = await saver.loadNewer();
                editor.history.replace(plan.document);
              })
            }
          >
            Load the newer plan
          </button>
          <button
            type="button"
            disabled={busy}
            className="rounded border border-walnut-700 px-3 py-1.5 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
            onClick={() =>
              act(async () => {
                const plan = await saver.keepMineAsCopy(`${name} (my copy)`.slice(0, 120));
                router.push(`/plans/${plan.id}`);
              })
            }
          >
            Keep mine as a copy
          </button>
        </div>
      </div>
    </div>
  );
}

/** On opening: work kept on this device that never reached the server. */
export function RestoreBanner({ saver, editor }: { saver: Autosave; editor: Editor }) {
  const pending = useStore(saver.store, (x) => x.pendingRestore);
  if (!pending) return null;
  const when = new Date(pending.savedAt).toLocaleString();
  return (
    <div role="region" aria-label="Unsaved work found" className="flex flex-wrap items-center gap-2 border-b border-amberline-500 bg-amberline-100 px-3 py-2 text-sm">
      <span>Unsaved changes from {when} were kept on this device (they started from version {pending.baseVersion}).</span>
      <button
        type="button"
        className="rounded bg-walnut-700 px-2 py-1 text-paper"
        onClick={async () => {
          const doc = await saver.settleRestore(true);
          if (doc) editor.edit(() => doc);
        }}
      >
        Restore them
      </button>
      <button type="button" className="rounded border border-walnut-700 px-2 py-1" onClick={() => void saver.settleRestore(false)}>
        Discard
      </button>
    </div>
  );
}
