/**
 * Request bodies for the write-route fuzz suite: random JSON, wrong types, extreme numbers, strings
 * PostgreSQL cannot store, huge strings, deep nesting, broken JSON text, and valid-shaped bodies
 * with one to three fields mutated. Each body is the raw text sent, so malformed JSON is possible.
 */
import fc from "fast-check";

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

const EXTREME_NUMBERS = [0, -0, -1, 1, 1e-9, -1e-9, 5e-324, 0.1, 1 / 3, 1e9, -1e9, 1e15, 1e21, 2 ** 53 + 2, 1.7976931348623157e308, -1.7976931348623157e308];
/** Numbers JSON can spell but JavaScript cannot hold exactly (1e400 parses to Infinity). */
const RAW_NUMBERS = ["1e400", "-1e400", "1e-400", "123456789012345678901234567890", "-0.0", "1E+2"];
const NASTY_STRINGS = [
  "",
  " ",
  "\u0000",
  "a\u0000b",
  "\ud800",
  "tail \udfff",
  "\u202eright-to-left",
  "<script>alert(1)</script>",
  "'; drop table plan; --",
  "../../../../etc/passwd",
  "%ff%fe",
  "\\u0000",
  "🪚".repeat(300),
  "x".repeat(10_000),
  "NaN",
  "null",
  "__proto__",
  "constructor",
];

const extremeNumber = fc.constantFrom(...EXTREME_NUMBERS);
const nastyString = fc.constantFrom(...NASTY_STRINGS);
/** A string of about 2 MB (some routes take 5 MB bodies). */
const hugeString = fc.constantFrom("y".repeat(2_000_000), "é".repeat(1_100_000));
const smallJson = fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>;

/** A value to put where a field was. */
const weirdValue: fc.Arbitrary<Json> = fc.oneof(
  { weight: 4, arbitrary: extremeNumber },
  { weight: 4, arbitrary: nastyString },
  { weight: 2, arbitrary: fc.constantFrom<Json>(null, true, false, [], {}, [null], { "": null }) },
  { weight: 3, arbitrary: smallJson },
  { weight: 1, arbitrary: fc.integer({ min: 65, max: 400 }).map((n) => nest(n)) },
);

/** An array nested n deep around a number. */
function nest(n: number): Json {
  let v: Json = 1;
  for (let i = 0; i < n; i++) v = [v];
  return v;
}

/** Every path into a value (root first): keys of objects and indexes of arrays. */
function paths(v: Json, at: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(at);
  if (out.length > 5000) return out;
  if (Array.isArray(v)) v.forEach((x, i) => paths(x, [...at, i], out));
  else if (v !== null && typeof v === "object") for (const k of Object.keys(v)) paths(v[k], [...at, k], out);
  return out;
}

type Mutation = { pick: number; action: "replace" | "delete" | "add" | "swap-type"; value: Json; key: string };

function mutate(seed: Json, muts: Mutation[]): Json {
  let doc = structuredClone(seed);
  for (const raw of muts) {
    // Values may be shared constants: insert copies, so no sample can end up containing itself.
    const m = { ...raw, value: structuredClone(raw.value) };
    const all = paths(doc);
    const path = all[m.pick % all.length];
    if (path.length === 0) {
      doc = m.action === "add" && doc !== null && typeof doc === "object" && !Array.isArray(doc) ? { ...doc, [m.key]: m.value } : m.value;
      continue;
    }
    const parent = path.slice(0, -1).reduce<Json>((o, k) => (o as Record<string, Json>)[k as string], doc);
    const last = path[path.length - 1];
    const box = parent as Record<string | number, Json>;
    const current = box[last];
    if (m.action === "delete") {
      if (Array.isArray(parent)) parent.splice(last as number, 1);
      else delete box[last];
    } else if (m.action === "add" && current !== null && typeof current === "object" && !Array.isArray(current)) {
      (current as Record<string, Json>)[m.key] = m.value;
    } else if (m.action === "swap-type") {
      box[last] = typeof current === "number" ? String(current) : typeof current === "string" ? Number(current) || 0 : typeof current === "boolean" ? (current ? 1 : 0) : Array.isArray(current) ? {} : current === null ? "null" : [];
    } else box[last] = m.value;
  }
  return doc;
}

const mutation: fc.Arbitrary<Mutation> = fc.record({
  pick: fc.nat({ max: 10_000 }),
  action: fc.constantFrom("replace", "replace", "replace", "delete", "add", "swap-type"),
  value: weirdValue,
  key: fc.oneof(fc.constantFrom("__proto__", "constructor", "extra", "id", "\u0000", "\ud800"), fc.string({ maxLength: 12 })),
});

/** Replaces the n-th number in JSON text with a number JavaScript cannot hold. */
function rawNumberIn(text: string, n: number, raw: string): string {
  let i = 0;
  return text.replace(/(?<=[:[,])-?\d+(\.\d+)?([eE][+-]?\d+)?(?=[,\]}])/g, (m) => (i++ === n ? raw : m));
}

export interface FuzzBody {
  /** The raw body text. */
  text: string;
  /** What kind of body it is, for failure reports. */
  kind: string;
}

/** Bodies for a route whose valid body looks like `seed` (undefined: the route takes no body). */
export function bodies(seed: Json | undefined): fc.Arbitrary<FuzzBody> {
  const base = seed ?? {};
  const asBody = (kind: string) => (v: Json) => ({ text: JSON.stringify(v), kind });
  return fc.oneof(
    { weight: 3, arbitrary: smallJson.map(asBody("random JSON")) },
    { weight: 1, arbitrary: fc.constantFrom("null", "1", '"text"', "[]", "true", "{}", "[{}]", '""').map((text) => ({ text, kind: "wrong top-level type" })) },
    { weight: 10, arbitrary: fc.array(mutation, { minLength: 1, maxLength: 3 }).map((ms) => ({ text: JSON.stringify(mutate(base, ms)), kind: "valid shape, mutated" })) },
    { weight: 2, arbitrary: fc.tuple(fc.nat({ max: 50 }), fc.constantFrom(...RAW_NUMBERS)).map(([n, raw]) => ({ text: rawNumberIn(JSON.stringify(base), n, raw), kind: "number out of range" })) },
    {
      weight: 1,
      arbitrary: fc.constantFrom("{", '{"a":}', "[1,]", "\u0000", "\ufeff{}", "{'a':1}", '{"a":1}{"b":2}', "NaN", "Infinity", '{"a":"\\x41"}', "[".repeat(3000) + "]".repeat(3000)).map((text) => ({ text, kind: "broken or deep JSON text" })),
    },
    { weight: 1, arbitrary: fc.integer({ min: 65, max: 3000 }).map((n) => ({ text: JSON.stringify(seed !== null && typeof seed === "object" && !Array.isArray(seed) ? { ...seed, deep: nest(n) } : nest(n)), kind: `nested ${n} deep` })) },
    { weight: 1, arbitrary: hugeString.map((s) => ({ text: JSON.stringify(mutate(base, [{ pick: 1, action: "replace", value: s, key: "x" }])), kind: "huge string" })) },
  );
}
