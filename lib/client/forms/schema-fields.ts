import type { z } from "zod";

/** A form field described from a zod schema; `path` is dot-separated from the params root. */
export type FieldSpec =
  | { kind: "length"; path: string; label: string; allowZero: boolean; /** Set for a length that may be left empty: what empty means. */ emptyMeans?: string }
  | { kind: "number"; path: string; label: string; min?: number; max?: number; int: boolean }
  | { kind: "choice"; path: string; label: string; options: { value: string | number; label: string }[] }
  | { kind: "toggle"; path: string; label: string }
  | { kind: "material"; path: string; label: string }
  | { kind: "text"; path: string; label: string }
  | { kind: "group"; path: string; label: string; fields: FieldSpec[] }
  | { kind: "list"; path: string; label: string; item: FieldSpec[]; min: number; max: number };

interface Def {
  type: string;
  innerType?: z.ZodType;
  in?: z.ZodType;
  options?: z.ZodType[];
  values?: unknown[];
  entries?: Record<string, string | number>;
  element?: z.ZodType;
  checks?: { _zod: { def: { check: string; value?: number; inclusive?: boolean; format?: string; minimum?: number; maximum?: number } } }[];
}

const defOf = (s: z.ZodType): Def => (s as unknown as { _zod: { def: Def } })._zod.def;

/** Left and right are as a person standing in the room facing the wall sees them (door hinges, sides of a blade). */
const SIDE_WORDS: Readonly<Record<string, string>> = { left: "left, as you face the wall", right: "right, as you face the wall" };

/** Strips defaults, optionals and prefaults. */
function unwrap(s: z.ZodType): z.ZodType {
  let cur = s;
  for (let i = 0; i < 10; i++) {
    const d = defOf(cur);
    if ((d.type === "default" || d.type === "optional" || d.type === "prefault" || d.type === "nullable" || d.type === "readonly") && d.innerType) cur = d.innerType;
    else if (d.type === "pipe" && d.in) cur = d.in;
    else break;
  }
  return cur;
}

/** "carcassHeightMm" -> "Carcass height"; "coreMaterialId" -> "Core material". */
export function labelOf(key: string): string {
  const words = key
    .replace(/(Mm|Id)$/, "")
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function numberBounds(d: Def): { min?: number; max?: number; int: boolean } {
  const out: { min?: number; max?: number; int: boolean } = { int: false };
  for (const c of d.checks ?? []) {
    const cd = c._zod.def;
    if (cd.check === "greater_than" && cd.value !== undefined) out.min = cd.value;
    if (cd.check === "less_than" && cd.value !== undefined) out.max = cd.value;
    if (cd.check === "number_format" && (cd.format === "safeint" || cd.format === "int32")) out.int = true;
  }
  return out;
}

function fieldOf(key: string, path: string, schema: z.ZodType, parentKey: string): FieldSpec | null {
  const s = unwrap(schema);
  const d = defOf(s);
  const label = labelOf(key);
  switch (d.type) {
    case "number":
      if (/Mm$/.test(key)) {
        const emptyMeans = schema.safeParse(undefined).success ? schema.description : undefined;
        return { kind: "length", path, label, allowZero: s.safeParse(0).success, ...(emptyMeans ? { emptyMeans } : {}) };
      }
      return { kind: "number", path, label, ...numberBounds(d) };
    case "boolean":
      return { kind: "toggle", path, label };
    case "enum":
      return { kind: "choice", path, label, options: Object.values(d.entries ?? {}).map((v) => ({ value: v, label: SIDE_WORDS[String(v)] ?? String(v) })) };
    case "union": {
      const lits = (d.options ?? []).map((o) => defOf(o)).filter((o) => o.type === "literal");
      if (lits.length !== (d.options ?? []).length) return null;
      return { kind: "choice", path, label, options: lits.flatMap((l) => (l.values ?? []).map((v) => ({ value: v as string | number, label: String(v) }))) };
    }
    case "string":
      return /MaterialId$/.test(key) || parentKey === "materials" || key === "materialId" ? { kind: "material", path, label } : { kind: "text", path, label };
    case "object":
      return { kind: "group", path, label, fields: fieldsOf(s, path) };
    case "array": {
      const el = d.element ? unwrap(d.element) : null;
      if (!el || defOf(el).type !== "object") return null;
      const bounds = { min: 0, max: 20 };
      for (const c of d.checks ?? []) {
        const cd = c._zod.def;
        if (cd.check === "min_length" && cd.minimum !== undefined) bounds.min = cd.minimum;
        if (cd.check === "max_length" && cd.maximum !== undefined) bounds.max = cd.maximum;
      }
      return { kind: "list", path, label, item: fieldsOf(el, ""), ...bounds };
    }
    default:
      return null;
  }
}

/** Describes the fields of a zod object schema, in declaration order; unknown shapes are left out. */
export function fieldsOf(schema: z.ZodType, base = ""): FieldSpec[] {
  const s = unwrap(schema);
  const shape = (s as unknown as { shape?: Record<string, z.ZodType> }).shape;
  if (!shape) return [];
  const parentKey = base.split(".").pop() ?? "";
  const out: FieldSpec[] = [];
  for (const [key, child] of Object.entries(shape)) {
    const f = fieldOf(key, base ? `${base}.${key}` : key, child, parentKey);
    if (f) out.push(f);
  }
  return out;
}

/** Reads a dot path from a value. */
export function getPath(obj: unknown, path: string): unknown {
  return path.split(".").reduce<unknown>((o, k) => (o == null ? undefined : (o as Record<string, unknown>)[k]), obj);
}

/** Returns a copy with the value at a dot path replaced (numeric keys index arrays). */
export function setPath<T>(obj: T, path: string, value: unknown): T {
  const [head, ...rest] = path.split(".");
  const cur = obj as unknown as Record<string, unknown> | unknown[];
  const copy: Record<string, unknown> | unknown[] = Array.isArray(cur) ? cur.slice() : { ...(cur ?? {}) };
  const next = rest.length ? setPath((copy as Record<string, unknown>)[head], rest.join("."), value) : value;
  (copy as Record<string, unknown>)[head] = next;
  return copy as unknown as T;
}
