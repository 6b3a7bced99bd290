import type { Editor } from "../editor";
import { editCommands } from "./edit-commands";
import { findCommand } from "./shortcuts";
import type { Command, KeyInput } from "./types";
import { viewCommands } from "./view-commands";

/** Every command, in the order the help sheet lists them. */
export const commands: readonly Command[] = [...editCommands, ...viewCommands];

const byName = new Map(commands.map((c) => [c.name, c]));

export function getCommand(name: string): Command {
  const c = byName.get(name);
  if (!c) throw new Error(`Unknown command ${name}`);
  return c;
}

/** Runs a command by name if it is enabled. Returns whether it ran. */
export function run(ed: Editor, name: string): boolean {
  const c = getCommand(name);
  if (c.enabled && !c.enabled(ed)) return false;
  c.perform(ed);
  return true;
}

/** Handles a key press: returns true when a command took it (the caller then prevents the default). */
export function handleKey(ed: Editor, e: KeyInput): boolean {
  const c = findCommand(commands, e);
  if (!c) return false;
  if (c.enabled && !c.enabled(ed)) return false;
  c.perform(ed);
  return true;
}
