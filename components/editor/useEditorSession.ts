"use client";
import { useEffect, useState } from "react";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { Autosave } from "@/lib/client/autosave/autosave";
import { idbLocalCopies } from "@/lib/client/autosave/local-copy";
import { plansApi } from "@/lib/client/autosave/plans-api";
import { Editor } from "@/lib/client/editor";
import { liveEngine } from "@/lib/client/engine-live";
import { usePlanPreset } from "./usePlanPreset";

export interface PlanInit {
  id: string;
  name: string;
  version: number;
  document: PlanDocument;
  role: string;
}

/** Creates the editor and its autosave for a loaded plan, and wires them together for the page's life. */
export function useEditorSession(plan: PlanInit) {
  const [session] = useState(() => {
    const editor = new Editor({ doc: plan.document, engine: liveEngine });
    const api = plansApi((u, i) => fetch(u, i));
    const saver = new Autosave({ planId: plan.id, version: plan.version, savedDoc: plan.document, api, copies: idbLocalCopies(), getDoc: () => editor.doc, busy: () => editor.history.inGesture });
    return { editor, saver, api };
  });

  useEffect(() => {
    const { editor, saver } = session;
    saver.start();
    const readOnly = plan.role === "viewer";
    const unsub = readOnly ? () => undefined : editor.history.store.subscribe(() => saver.notifyEdit());
    void saver.checkRestore();
    const online = () => void saver.retryNow();
    const leaving = (e: BeforeUnloadEvent) => {
      if (saver.status.kind !== "saved") e.preventDefault();
    };
    window.addEventListener("online", online);
    window.addEventListener("beforeunload", leaving);
    (window as unknown as { __bwEditor?: Editor }).__bwEditor = editor;
    return () => {
      unsub();
      window.removeEventListener("online", online);
      window.removeEventListener("beforeunload", leaving);
      saver.dispose();
    };
  }, [session, plan.role]);

  usePlanPreset(session.editor, plan.id);
  return session;
}
