/** A walk-through step as the presenter and the editor see it (mirrors the server's step schema). */
export interface Step {
  title: string;
  view: "3d" | "plan" | "elevation";
  camera?: { position: [number, number, number]; target: [number, number, number] };
  wallId?: string;
  highlight: { fixtureIds: string[]; zoneIds: string[] };
  ruleId?: string;
  note: string;
}

/** The next step index after a key press, or null when the key is not ours. */
export function stepForKey(key: string, current: number, count: number): number | null {
  const last = Math.max(0, count - 1);
  switch (key) {
    case "ArrowRight":
    case "ArrowDown":
    case "PageDown":
    case " ":
      return Math.min(last, current + 1);
    case "ArrowLeft":
    case "ArrowUp":
    case "PageUp":
      return Math.max(0, current - 1);
    case "Home":
      return 0;
    case "End":
      return last;
    default:
      return null;
  }
}
