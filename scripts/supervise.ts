/**
 * Keeps one service running for `npm start` and `npm test` (scripts/lib.sh starts one of these per
 * service):
 *
 *   tsx scripts/supervise.ts --name app --log FILE [--port P] [--grace 5] [--stop-signal SIGTERM]
 *                            [--uid U --gid G] [--adopt-pidfile FILE] -- command args...
 *
 * - The command runs in its own process group with its output appended to FILE ("-": this console).
 * - When it exits on its own, the rest of its group is killed and it is started again after a
 *   growing pause (0.5 s doubling to 15 s; back to 0.5 s once it has run 30 s), saying so.
 * - SIGINT, SIGTERM or SIGHUP (or the parent script going away) stop it: the stop signal to its
 *   group, then SIGKILL after the grace period, so a child stuck at 100% CPU cannot hold Ctrl-C.
 * - With --adopt-pidfile, a live process named in that file (PostgreSQL's postmaster.pid, from
 *   another run sharing the data folder) is watched instead of started; when it goes away this
 *   supervisor starts its own copy. An adopted process is never stopped by this supervisor.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { closeSync, openSync, readFileSync } from "node:fs";
import { connect } from "node:net";

interface Options {
  name: string;
  log: string;
  port?: number;
  graceMs: number;
  stopSignal: NodeJS.Signals;
  uid?: number;
  gid?: number;
  adoptPidfile?: string;
  command: string[];
}

const MIN_PAUSE_MS = 500;
const MAX_PAUSE_MS = 15_000;
/** A run this long counts as healthy: the next crash restarts after the shortest pause again. */
const HEALTHY_RUN_MS = 30_000;

function parse(argv: string[]): Options {
  const dash = argv.indexOf("--");
  if (dash < 0 || dash === argv.length - 1) throw new Error("usage: supervise.ts --name N --log FILE [options] -- command args...");
  const flags = new Map<string, string>();
  for (let i = 0; i < dash; i += 2) flags.set(argv[i].replace(/^--/, ""), argv[i + 1] ?? "");
  const num = (k: string) => (flags.has(k) ? Number(flags.get(k)) : undefined);
  return {
    name: flags.get("name") ?? "service",
    log: flags.get("log") ?? "/dev/null",
    port: num("port"),
    graceMs: (num("grace") ?? 5) * 1000,
    stopSignal: (flags.get("stop-signal") ?? "SIGTERM") as NodeJS.Signals,
    uid: num("uid"),
    gid: num("gid"),
    adoptPidfile: flags.get("adopt-pidfile"),
    command: argv.slice(dash + 1),
  };
}

const opts = parse(process.argv.slice(2));
const say = (msg: string) => process.stderr.write(`\x1b[1;33m[benchwright]\x1b[0m ${msg}\n`);
const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === "EPERM";
  }
};
const killGroup = (pid: number, signal: NodeJS.Signals) => {
  try {
    process.kill(-pid, signal);
  } catch {
    /* the group is already gone */
  }
};

let child: ChildProcess | null = null;
let stopping = false;
let restarts = 0;
let pauseMs = MIN_PAUSE_MS;
let restartTimer: NodeJS.Timeout | null = null;
let adoptTimer: NodeJS.Timeout | null = null;

function portOpen(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const s = connect({ host: "127.0.0.1", port });
    s.once("connect", () => (s.destroy(), resolve(true)));
    s.once("error", () => resolve(false));
  });
}

/** After a restart, tells the console when the service answers again. */
async function announceBack(started: number, me: ChildProcess) {
  if (!opts.port) return;
  while (!stopping && child === me && Date.now() - started < 120_000) {
    if (await portOpen(opts.port)) {
      say(`${opts.name} is back (127.0.0.1:${opts.port}, ${((Date.now() - started) / 1000).toFixed(1)} s after its restart)`);
      return;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
}

function start() {
  restartTimer = null;
  if (stopping) return;
  const out = opts.log === "-" ? "inherit" : openSync(opts.log, "a");
  const started = Date.now();
  const me = spawn(opts.command[0], opts.command.slice(1), {
    detached: true, // its own process group: Ctrl-C reaches this supervisor, which decides the order
    stdio: ["ignore", out, out],
    ...(opts.uid !== undefined ? { uid: opts.uid } : {}),
    ...(opts.gid !== undefined ? { gid: opts.gid } : {}),
  });
  if (typeof out === "number") closeSync(out);
  child = me;
  me.once("error", (e) => say(`${opts.name} could not be started: ${e.message}`));
  me.once("exit", (code, signal) => {
    if (me.pid) killGroup(me.pid, "SIGKILL"); // whatever the crashed process left behind
    child = null;
    if (stopping) return finish();
    const ran = Date.now() - started;
    if (ran > HEALTHY_RUN_MS) pauseMs = MIN_PAUSE_MS;
    restarts += 1;
    const how = signal ? `was killed (${signal})` : `exited (code ${code})`;
    say(`${opts.name} ${how} after ${(ran / 1000).toFixed(1)} s; restarting in ${(pauseMs / 1000).toFixed(1)} s (restart ${restarts}${opts.log === "-" ? "" : `, log: ${opts.log}`})`);
    restartTimer = setTimeout(start, pauseMs);
    pauseMs = Math.min(MAX_PAUSE_MS, pauseMs * 2);
  });
  if (restarts > 0) void announceBack(started, me);
}

function adoptedPid(): number | null {
  if (!opts.adoptPidfile) return null;
  try {
    const pid = Number(readFileSync(opts.adoptPidfile, "utf8").split("\n")[0]);
    return Number.isInteger(pid) && pid > 0 && alive(pid) ? pid : null;
  } catch {
    return null;
  }
}

/** Watches a process another run started; takes over when it goes away. */
function watchAdopted(pid: number) {
  adoptTimer = setInterval(() => {
    if (alive(pid)) return;
    clearInterval(adoptTimer!);
    adoptTimer = null;
    if (stopping) return finish();
    say(`${opts.name} (pid ${pid}, started by another run) has stopped; starting it here`);
    start();
  }, 1000);
}

function finish() {
  if (child) return;
  process.exit(0);
}

function stop() {
  if (stopping) return;
  stopping = true;
  if (restartTimer) clearTimeout(restartTimer);
  if (adoptTimer) clearInterval(adoptTimer);
  const me = child;
  if (!me?.pid || me.exitCode !== null || me.signalCode !== null) return process.exit(0);
  killGroup(me.pid, opts.stopSignal);
  setTimeout(() => {
    if (child === me) {
      say(`${opts.name} did not stop within ${opts.graceMs / 1000} s; killing it (SIGKILL)`);
      killGroup(me.pid!, "SIGKILL");
    }
  }, opts.graceMs).unref();
}

for (const s of ["SIGINT", "SIGTERM", "SIGHUP"] as const) process.on(s, stop);
// If the script that started us dies without cleaning up, stop too rather than linger.
const parent = process.ppid;
setInterval(() => {
  if (process.ppid !== parent) stop();
}, 1000).unref();

const adopted = adoptedPid();
if (adopted) watchAdopted(adopted);
else start();
