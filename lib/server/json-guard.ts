/**
 * Checks on a JSON request body before any schema sees it: nesting depth (measured on the text,
 * because JSON.parse and the schema validators recurse), and strings PostgreSQL cannot store
 * (U+0000) or that are not well-formed Unicode (a lone surrogate half), keys included.
 * Pure: no server imports, so unit tests can use it directly.
 */

/** Deepest nesting a body may have: a plan document needs about ten levels. */
export const MAX_JSON_DEPTH = 64;
/** At most this many bad strings are named in one answer. */
const MAX_REPORTED = 20;

export type JsonGuardResult =
  | { ok: true; value: unknown }
  | { ok: false; reason: "too_deep"; depth: number }
  | { ok: false; reason: "invalid_json" }
  | { ok: false; reason: "bad_strings"; fields: Record<string, string> };

const OPEN_BRACE = 0x7b;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACE = 0x7d;
const CLOSE_BRACKET = 0x5d;
const QUOTE = 0x22;
const BACKSLASH = 0x5c;

/** Deepest bracket nesting in JSON text, ignoring brackets inside strings; stops counting past `limit`. */
export function jsonDepth(text: string, limit = Infinity): number {
  let depth = 0;
  let max = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === BACKSLASH) i++;
      else if (c === QUOTE) inString = false;
    } else if (c === QUOTE) inString = true;
    else if (c === OPEN_BRACE || c === OPEN_BRACKET) {
      depth++;
      if (depth > max) {
        max = depth;
        if (max > limit) return max;
      }
    } else if (c === CLOSE_BRACE || c === CLOSE_BRACKET) depth--;
  }
  return max;
}

const SUSPECT = /[\u0000\uD800-\uDFFF]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

const hex = (n: number) => n.toString(16).toUpperCase().padStart(4, "0");

/** Why a string cannot be stored, or null when it can. */
export function unstorableReason(s: string): string | null {
  if (!SUSPECT.test(s)) return null;
  if (s.includes("\u0000")) return "Contains a character that cannot be stored (U+0000).";
  const m = LONE_SURROGATE.exec(s);
  if (m) return `Contains a character that cannot be stored (a lone U+${hex(m[0].charCodeAt(0))}).`;
  return null;
}

/** A key as it may appear in a field path: unstorable characters written as \uXXXX. */
const pathKey = (k: string) => (SUSPECT.test(k) ? k.replace(/[\u0000\uD800-\uDFFF]/g, (c) => `\\u${hex(c.charCodeAt(0))}`) : k);

/** Field paths ("a.b.0.c", "_" for the body itself) of every unstorable string in a parsed JSON value; one iterative walk. */
export function unstorableStrings(value: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  let count = 0;
  const stack: [unknown, string][] = [[value, ""]];
  while (stack.length && count < MAX_REPORTED) {
    const [v, path] = stack.pop()!;
    if (typeof v === "string") {
      const why = unstorableReason(v);
      if (why) {
        out[path || "_"] = why;
        count++;
      }
    } else if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i--) stack.push([v[i], path ? `${path}.${i}` : String(i)]);
    } else if (v !== null && typeof v === "object") {
      const keys = Object.keys(v);
      for (let i = keys.length - 1; i >= 0; i--) {
        const k = keys[i];
        const at = path ? `${path}.${pathKey(k)}` : pathKey(k);
        const why = unstorableReason(k);
        if (why) {
          out[at] = `The name of this field: ${why.charAt(0).toLowerCase()}${why.slice(1)}`;
          count++;
        }
        stack.push([(v as Record<string, unknown>)[k], at]);
      }
    }
  }
  return out;
}

/** Parses JSON text with the depth and string checks above. Empty text is `undefined` (no body). */
export function parseGuardedJson(text: string, maxDepth = MAX_JSON_DEPTH): JsonGuardResult {
  if (text.trim().length === 0) return { ok: true, value: undefined };
  const depth = jsonDepth(text, maxDepth);
  if (depth > maxDepth) return { ok: false, reason: "too_deep", depth };
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return { ok: false, reason: "invalid_json" };
  }
  const fields = unstorableStrings(value);
  if (Object.keys(fields).length) return { ok: false, reason: "bad_strings", fields };
  return { ok: true, value };
}
