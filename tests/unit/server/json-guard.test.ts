import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { MAX_JSON_DEPTH, jsonDepth, parseGuardedJson, unstorableReason, unstorableStrings } from "@/lib/server/json-guard";

describe("jsonDepth: bracket nesting on the text, strings ignored", () => {
  it("counts objects and arrays, not brackets inside strings or after escaped quotes", () => {
    expect(jsonDepth("1")).toBe(0);
    expect(jsonDepth('{"a":[1,{"b":[]}]}')).toBe(4);
    expect(jsonDepth('{"a":"[[[[{{{{"}')).toBe(1);
    expect(jsonDepth('["\\"[[[", []]')).toBe(2);
    expect(jsonDepth('["\\\\", [[]]]')).toBe(3);
  });

  it("agrees with the parsed value's depth on random JSON", () => {
    const depthOf = (v: unknown): number =>
      Array.isArray(v) ? 1 + Math.max(0, ...v.map(depthOf)) : v !== null && typeof v === "object" ? 1 + Math.max(0, ...Object.values(v).map(depthOf)) : 0;
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 6 }), (v) => {
        expect(jsonDepth(JSON.stringify(v))).toBe(depthOf(v));
      }),
      { seed: 4104, numRuns: 300 },
    );
  });

  it("stops early past its limit on a very deep text", () => {
    const text = "[".repeat(1_000_000) + "]".repeat(1_000_000);
    expect(jsonDepth(text, MAX_JSON_DEPTH)).toBe(MAX_JSON_DEPTH + 1);
  });
});

describe("parseGuardedJson", () => {
  it("refuses 3000-deep nesting before JSON.parse, and names the reason", () => {
    const r = parseGuardedJson("[".repeat(3000) + "]".repeat(3000));
    expect(r).toEqual({ ok: false, reason: "too_deep", depth: MAX_JSON_DEPTH + 1 });
    expect(parseGuardedJson("[".repeat(MAX_JSON_DEPTH) + "]".repeat(MAX_JSON_DEPTH)).ok).toBe(true);
  });

  it("treats empty text as no body and bad text as invalid JSON", () => {
    expect(parseGuardedJson("")).toEqual({ ok: true, value: undefined });
    expect(parseGuardedJson("  \n")).toEqual({ ok: true, value: undefined });
    expect(parseGuardedJson("{nope")).toEqual({ ok: false, reason: "invalid_json" });
  });

  it("refuses U+0000 and lone surrogates at their path, keys too, and never changes a value", () => {
    const text = '{"name":"saw\\u0000","fixtures":[{"label":"ok"},{"label":"half \\ud83d"}],"k\\u0000ey":1,"emoji":"\\ud83d\\ude00","tail":"\\udc00x"}';
    const r = parseGuardedJson(text);
    expect(r.ok).toBe(false);
    if (r.ok || r.reason !== "bad_strings") throw new Error("expected bad strings");
    expect(r.fields).toEqual({
      name: "Contains a character that cannot be stored (U+0000).",
      "fixtures.1.label": "Contains a character that cannot be stored (a lone U+D83D).",
      "k\\u0000ey": "The name of this field: contains a character that cannot be stored (U+0000).",
      tail: "Contains a character that cannot be stored (a lone U+DC00).",
    });
    const good = parseGuardedJson('{"emoji":"\\ud83d\\ude00 ok","n":1e308}');
    expect(good).toEqual({ ok: true, value: { emoji: "😀 ok", n: 1e308 } });
  });

  it("reports a bare bad string as the body itself", () => {
    expect(unstorableStrings("\u0000")).toEqual({ _: "Contains a character that cannot be stored (U+0000)." });
  });

  it("accepts every well-formed string without U+0000", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 40 }), (s) => {
        expect(unstorableReason(s)).toBe(s.includes("\u0000") ? "Contains a character that cannot be stored (U+0000)." : null);
      }),
      { seed: 4105, numRuns: 500 },
    );
  });
});
