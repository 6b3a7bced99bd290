/**
 * The data-folder choice of scripts/data-dir.sh (issue 17): a checkout the postgres user cannot
 * enter (under a mode-700 folder) gets a folder of its own that user can reach, keyed to the
 * checkout's path; a reachable checkout keeps .data inside; BW_DATA_DIR overrides.
 */
import { describe, it, expect, afterAll } from "vitest";
import { execFileSync } from "node:child_process";
import { chmodSync, existsSync, mkdirSync, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";

const script = resolve(__dirname, "../../../scripts/data-dir.sh");
const isRoot = process.getuid?.() === 0;
const hasPostgresUser = (() => {
  try {
    execFileSync("id", ["-u", "postgres"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
})();

function choose(checkout: string, extra: Record<string, string> = {}, create = false): string {
  const env: NodeJS.ProcessEnv = { ...process.env, ...extra };
  if (!("BW_DATA_DIR" in extra)) delete env.BW_DATA_DIR;
  return execFileSync("bash", [script, checkout, ...(create ? ["--create"] : [])], { env, encoding: "utf8" }).trim();
}
const postgresCan = (flag: "-x" | "-w", path: string) => {
  try {
    execFileSync("runuser", ["-u", "postgres", "--", "test", flag, path], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
};

const made: string[] = [];
afterAll(() => {
  for (const d of made) rmSync(d, { recursive: true, force: true });
});

describe("data folder choice", () => {
  it("keeps .data inside a checkout the database user can reach, and honours BW_DATA_DIR", () => {
    const open = mkdtempSync(join(tmpdir(), "bw-open-"));
    made.push(open);
    chmodSync(open, 0o755);
    const checkout = join(open, "shop");
    mkdirSync(checkout);
    expect(choose(checkout)).toBe(join(checkout, ".data"));
    expect(choose(checkout, { BW_DATA_DIR: "/srv/bw-data" })).toBe("/srv/bw-data");
  });

  it.skipIf(!isRoot || !hasPostgresUser)("gives a checkout under a mode-700 folder its own reachable folder, one per checkout, the same next time", () => {
    const closed = mkdtempSync(join(tmpdir(), "bw-closed-"));
    made.push(closed);
    chmodSync(closed, 0o700);
    const a = join(closed, "one", "shop");
    const b = join(closed, "two", "shop");
    mkdirSync(a, { recursive: true });
    mkdirSync(b, { recursive: true });
    // The premise: the database user really cannot enter these checkouts.
    expect(postgresCan("-x", a)).toBe(false);

    const dirA = choose(a, {}, true);
    const dirB = choose(b, {}, true);
    made.push(dirA, dirB);
    expect(dirA).toMatch(/^\/var\/(lib|tmp)\/benchwright\/shop-[0-9a-f]{12}$/);
    expect(dirA.startsWith(closed)).toBe(false);
    expect(dirB).not.toBe(dirA);
    expect(choose(a)).toBe(dirA);

    for (const d of [dirA, dirB]) {
      expect(existsSync(d)).toBe(true);
      expect(statSync(d).uid).toBe(Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" })));
      expect(postgresCan("-w", d)).toBe(true);
    }
  });
});
