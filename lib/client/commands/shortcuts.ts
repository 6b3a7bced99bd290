import type { Command, KeyInput } from "./types";

interface Chord {
  key: string;
  mod: boolean;
  shift: boolean;
  alt: boolean;
}

function parse(chord: string): Chord {
  const parts = chord.split("+");
  const key = parts.pop() ?? "";
  return { key: key.toLowerCase(), mod: parts.includes("Mod"), shift: parts.includes("Shift"), alt: parts.includes("Alt") };
}

/** True when a key press matches a chord. Printable symbols ("?") ignore Shift, since Shift makes them. */
export function matches(chord: string, e: KeyInput): boolean {
  const c = parse(chord);
  const mod = e.ctrlKey || e.metaKey;
  if (c.key !== e.key.toLowerCase() || c.mod !== mod || c.alt !== e.altKey) return false;
  const symbol = c.key.length === 1 && !/[a-z0-9]/.test(c.key);
  return symbol || c.shift === e.shiftKey;
}

/** The first enabled command whose shortcut matches the key press. */
export function findCommand(commands: readonly Command[], e: KeyInput): Command | undefined {
  return commands.find((c) => c.shortcuts.some((s) => matches(s, e)));
}

/** A chord as shown to people: Mod becomes Ctrl or the Cmd sign. */
export function describeChord(chord: string, mac: boolean): string {
  const names: Record<string, string> = { ArrowLeft: "←", ArrowRight: "→", ArrowUp: "↑", ArrowDown: "↓", Escape: "Esc", Delete: "Del" };
  return chord
    .split("+")
    .map((p) => (p === "Mod" ? (mac ? "⌘" : "Ctrl") : (names[p] ?? (p.length === 1 ? p.toUpperCase() : p))))
    .join(mac ? "" : "+");
}
