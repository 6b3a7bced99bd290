/**
 * scripts/supervise.ts, the supervisor npm start and npm test run every service under: a child that
 * dies is started again and the console says so; Ctrl-C (SIGINT) ends a child stuck at 100% CPU
 * that ignores signals (SIGKILL after the grace period); a live process named in an adopt pidfile is
 * watched instead of started, and replaced when it goes away.
 */
import { describe, it, expect, afterEach } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";

const root = resolve(__dirname, "../../..");
const running: ChildProcess[] = [];
const dirs: string[] = [];

function supervise(args: string[]): { proc: ChildProcess; output: () => string; exited: Promise<number | null> } {
  const proc = spawn(process.execPath, ["--import", "tsx", "scripts/supervise.ts", ...args], { cwd: root, stdio: ["ignore", "pipe", "pipe"] });
  running.push(proc);
  let out = "";
  proc.stdout!.on("data", (d: Buffer) => (out += d.toString()));
  proc.stderr!.on("data", (d: Buffer) => (out += d.toString()));
  const exited = new Promise<number | null>((r) => proc.once("exit", (code) => r(code)));
  return { proc, output: () => out, exited };
}
const scratch = () => {
  const d = mkdtempSync(join(tmpdir(), "bw-sup-"));
  dirs.push(d);
  return d;
};
const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};
async function until(cond: () => boolean, ms: number, what: string) {
  const end = Date.now() + ms;
  while (!cond()) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
const lines = (f: string) => (existsSync(f) ? readFileSync(f, "utf8").trim().split("\n").filter(Boolean) : []);

afterEach(() => {
  for (const p of running.splice(0)) if (p.exitCode === null) p.kill("SIGKILL");
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

describe("supervise.ts", () => {
  it("starts a child again after it dies and says so on the console", { timeout: 60_000 }, async () => {
    const d = scratch();
    const starts = join(d, "starts");
    const child = `require("fs").appendFileSync(${JSON.stringify(starts)}, process.pid + "\\n"); setTimeout(() => process.exit(3), 200);`;
    const s = supervise(["--name", "flaky", "--log", join(d, "log"), "--grace", "1", "--", process.execPath, "-e", child]);
    await until(() => lines(starts).length >= 3, 30_000, "three starts");
    expect(s.output()).toMatch(/flaky exited \(code 3\) after [\d.]+ s; restarting in 0\.5 s \(restart 1/);
    expect(s.output()).toMatch(/restarting in 1\.0 s \(restart 2/); // the pause grows
    s.proc.kill("SIGTERM");
    expect(await s.exited).toBe(0);
  });

  it("ends a child stuck at 100% CPU that ignores SIGINT and SIGTERM, within the grace period", { timeout: 60_000 }, async () => {
    const d = scratch();
    const pidFile = join(d, "pid");
    const child = `process.on("SIGINT", () => {}); process.on("SIGTERM", () => {}); require("fs").writeFileSync(${JSON.stringify(pidFile)}, String(process.pid)); for (;;) {}`;
    const s = supervise(["--name", "stuck", "--log", join(d, "log"), "--grace", "1", "--", process.execPath, "-e", child]);
    await until(() => existsSync(pidFile) && readFileSync(pidFile, "utf8") !== "", 30_000, "the child to start");
    const pid = Number(readFileSync(pidFile, "utf8"));
    await new Promise((r) => setTimeout(r, 300)); // its handlers are installed and it is spinning
    const t = Date.now();
    s.proc.kill("SIGINT");
    expect(await s.exited).toBe(0);
    expect(Date.now() - t).toBeLessThan(8_000);
    expect(alive(pid)).toBe(false);
    expect(s.output()).toMatch(/stuck did not stop within 1 s; killing it \(SIGKILL\)/);
  });

  it("watches a live process from the adopt pidfile and starts its own when that one goes away", { timeout: 60_000 }, async () => {
    const d = scratch();
    const starts = join(d, "starts");
    const other = spawn(process.execPath, ["-e", "setTimeout(() => {}, 60000)"], { stdio: "ignore" });
    running.push(other);
    const pidfile = join(d, "other.pid");
    writeFileSync(pidfile, `${other.pid}\n/some/data\n`);
    const child = `require("fs").appendFileSync(${JSON.stringify(starts)}, "x\\n"); setTimeout(() => {}, 60000);`;
    const s = supervise(["--name", "db", "--log", join(d, "log"), "--grace", "1", "--adopt-pidfile", pidfile, "--", process.execPath, "-e", child]);
    await new Promise((r) => setTimeout(r, 2_500));
    expect(lines(starts)).toHaveLength(0);
    other.kill("SIGKILL");
    await until(() => lines(starts).length === 1, 30_000, "its own start");
    expect(s.output()).toMatch(/db \(pid \d+, started by another run\) has stopped; starting it here/);
    s.proc.kill("SIGTERM");
    expect(await s.exited).toBe(0);
  });
});
