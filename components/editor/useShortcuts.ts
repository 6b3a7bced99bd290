"use client";
import { useEffect } from "react";
import { handleKey } from "@/lib/client/commands/registry";
import type { Editor } from "@/lib/client/editor";

/** Keys typed into fields stay there; the editor's shortcuts get the rest. */
function typingIn(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null;
  if (!el) return false;
  const tag = el.tagName;
  return tag === "INPUT" || tag === "TEXTAREA" || tag === "SELECT" || el.isContentEditable;
}

/** Routes key presses to the registered commands. */
export function useShortcuts(ed: Editor): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || typingIn(e.target)) return;
      // Arrow keys on buttons and lists keep their own meaning unless something is selected.
      if (handleKey(ed, e)) e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [ed]);
}
