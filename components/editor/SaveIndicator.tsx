"use client";
import { useStore } from "zustand";
import type { Autosave } from "@/lib/client/autosave/autosave";

/** Save status in words (never colour alone); Offline offers Retry. */
export function SaveIndicator({ saver }: { saver: Autosave }) {
  const s = useStore(saver.store, (x) => x.status);
  let text = "";
  let cls = "text-walnut-500";
  switch (s.kind) {
    case "saved":
      text = s.at ? "All changes saved" : "Saved";
      break;
    case "dirty":
      text = "Unsaved changes";
      break;
    case "saving":
      text = "Saving…";
      break;
    case "offline":
      text = s.reason === "network" ? "Offline: changes kept on this device" : "Not saved (server problem): kept on this device";
      cls = "text-amberline-700 font-semibold";
      break;
    case "conflict":
      text = "Changed elsewhere: choose what to keep";
      cls = "text-brick-700 font-semibold";
      break;
  }
  return (
    <div className="flex items-center gap-2 text-xs" data-testid="save-status" data-state={s.kind}>
      <span role="status" aria-live="polite" className={cls}>
        {text}
      </span>
      {s.kind === "offline" ? (
        <button type="button" className="rounded border border-walnut-300 px-1.5 py-0.5 underline" onClick={() => void saver.retryNow()}>
          Retry now
        </button>
      ) : null}
    </div>
  );
}
