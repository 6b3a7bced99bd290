/** Names of the document's lists and fields in words, for import messages. */
const LIST_WORDS: Record<string, string> = { walls: "wall", fixtures: "fixture", openings: "opening", obstacles: "obstacle", materials: "material", diagonals: "diagonal", readings: "reading" };
const FIELD_WORDS: Record<string, string> = { room: "room", settings: "plan settings", params: "settings", placement: "placement", schemaVersion: "format version" };

/** "widthMm" -> "width (mm)", "offsetMm" -> "offset (mm)", "lengthIn" -> "length (in)". */
function fieldWords(key: string): string {
  const unit = /(Mm|In|Deg)$/.exec(key)?.[1];
  const bare = unit ? key.slice(0, -unit.length) : key;
  const words = bare.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
  return unit ? `${words} (${unit.toLowerCase()})` : words;
}

/** A dotted issue path ("fixtures.3.params.widthMm") in words ("fixture 4, settings, width (mm)"); empty for the whole file. */
export function issuePathInWords(path: string): string {
  if (!path) return "";
  const parts = path.split(".");
  const out: string[] = [];
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i];
    const next = parts[i + 1];
    if (LIST_WORDS[p] && next !== undefined && /^\d+$/.test(next)) {
      out.push(`${LIST_WORDS[p]} ${Number(next) + 1}`);
      i++;
    } else if (/^\d+$/.test(p)) out.push(`item ${Number(p) + 1}`);
    else out.push(FIELD_WORDS[p] ?? fieldWords(p));
  }
  return out.join(", ");
}
