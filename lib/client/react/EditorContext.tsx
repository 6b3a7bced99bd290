"use client";
import { createContext, useContext, type ReactNode } from "react";
import type { Editor } from "../editor";

const Ctx = createContext<Editor | null>(null);

export function EditorProvider({ editor, children }: { editor: Editor; children: ReactNode }) {
  return <Ctx.Provider value={editor}>{children}</Ctx.Provider>;
}

/** The editor of the page; components read its stores with the hooks in useEditorState.ts. */
export function useEditor(): Editor {
  const ed = useContext(Ctx);
  if (!ed) throw new Error("useEditor outside EditorProvider");
  return ed;
}
