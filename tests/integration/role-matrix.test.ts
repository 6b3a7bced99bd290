import { describe, it, expect, beforeAll } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import { hasServer } from "./helpers/client";
import { planEntries, type Entry } from "./helpers/role-entries-plans";
import { sharingEntries } from "./helpers/role-entries-sharing";
import { teachingEntries } from "./helpers/role-entries-teaching";
import { buildRecheck, recheckEntries, type Recheck } from "./helpers/role-entries-access";
import { buildWorld, PERSONAS, type World } from "./helpers/role-world";

/**
 * Every route handler under app/api, called as each persona, with the status each must get.
 * Adding a route file (or a method) without an entry here fails the first test, with or without a server.
 */
const ENTRIES: Entry[] = [...planEntries, ...sharingEntries, ...teachingEntries];

const API = join(process.cwd(), "app/api");

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) => (d.isDirectory() ? routeFiles(join(dir, d.name)) : d.name === "route.ts" ? [join(dir, d.name)] : []));
}

/** "METHOD file" for each exported handler, read from the source (named exports or `export { h as GET }`). */
function handlers(): string[] {
  const out: string[] = [];
  for (const f of routeFiles(API)) {
    const src = readFileSync(f, "utf8");
    const rel = relative(API, f).split("\\").join("/");
    const methods = new Set<string>();
    for (const m of src.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) methods.add(m[1]);
    for (const m of src.matchAll(/export\s*\{([^}]*)\}/g)) for (const n of m[1].matchAll(/\bas\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) methods.add(n[1]);
    for (const m of methods) out.push(`${m} ${rel}`);
  }
  return out.sort();
}

describe("role matrix covers every route handler", () => {
  it("has exactly one entry per exported handler under app/api", () => {
    const keys = ENTRIES.map((e) => `${e.method} ${e.file}`);
    const dupes = keys.filter((k, i) => keys.indexOf(k) !== i);
    expect(dupes, "duplicate entries").toEqual([]);
    const found = handlers();
    expect(found.length).toBeGreaterThan(40);
    expect(found.filter((h) => !keys.includes(h)), "route handlers without a role-matrix entry (add one in tests/integration/helpers/role-entries-*.ts)").toEqual([]);
    // Entries whose file is gone are skipped below rather than failing: another helper's route may not have landed yet.
    const stale = keys.filter((k) => !found.includes(k));
    if (stale.length) console.warn(`role matrix: entries without a route file (skipped): ${stale.join(", ")}`);
  });
});

describe.skipIf(!hasServer)("role matrix against the running server", () => {
  let w: World;
  let again: Recheck;
  beforeAll(async () => {
    w = await buildWorld();
    again = await buildRecheck(w);
  }, 180_000);

  const present = new Set(handlers());
  for (const e of ENTRIES) {
    it.skipIf(!present.has(`${e.method} ${e.file}`))(`${e.method} ${e.file}`, async () => {
      const got: Record<string, number> = {};
      for (const who of PERSONAS) {
        const call = await e.call(w, who);
        const client = w.as[who];
        const r = await client.req(e.method, call.path, call.body ?? (e.method === "GET" || e.method === "DELETE" ? undefined : {}));
        got[who] = r.status;
      }
      expect(got).toEqual(e.expect);
    }, 90_000);
  }

  // Access checked at every use: the same routes on records whose access changed after they were made.
  for (const e of recheckEntries) {
    it(`recheck: ${e.label}`, async () => {
      const got: Record<string, number> = {};
      for (const who of PERSONAS) {
        const call = e.call(w, again, who);
        const res = await w.as[who].req(e.method, call.path, call.body ?? (e.method === "GET" || e.method === "DELETE" ? undefined : {}));
        got[who] = res.status;
      }
      expect(got).toEqual(e.expect);
    }, 90_000);
  }
});
