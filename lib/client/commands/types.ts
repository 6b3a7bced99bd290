import type { Editor } from "../editor";

export type CommandGroup = "edit" | "arrange" | "view" | "tools" | "help";

/** A user command, registered once; the toolbar, the keyboard and the help sheet all read it. */
export interface Command {
  name: string;
  label: string;
  group: CommandGroup;
  /** Key chords, e.g. "Mod+Z", "Shift+ArrowLeft", "?" ("Mod" is Ctrl, or Cmd on a Mac). */
  shortcuts: string[];
  perform(ed: Editor): void;
  enabled?(ed: Editor): boolean;
}

/** The fields of a keyboard event the matcher reads. */
export interface KeyInput {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}
