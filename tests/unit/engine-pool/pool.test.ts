import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { AppError } from "@/lib/server/errors";
import { EnginePool } from "@/lib/server/engine-pool/pool";
import { WORKER_FILE_NAME } from "@/lib/server/engine-pool/worker-file";
import { buildEngineWorker } from "@/scripts/build-worker";

// The misbehaving tasks run only with test hooks on; workers inherit this process's environment.
process.env.BW_TEST_HOOKS = "1";

let dir: string;
let pool: EnginePool;

beforeAll(async () => {
  dir = mkdtempSync(path.join(tmpdir(), "bw-engine-pool-"));
  const file = await buildEngineWorker(path.join(dir, WORKER_FILE_NAME));
  pool = new EnginePool({ filename: file, minThreads: 1, maxThreads: 1, maxQueue: 2, heapMb: 64 });
}, 120_000);

afterAll(async () => {
  await pool?.close();
  rmSync(dir, { recursive: true, force: true });
});

async function rejection(p: Promise<unknown>): Promise<AppError> {
  const e = await p.then(
    () => null,
    (err: unknown) => err,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
}

describe("engine worker pool", () => {
  it("runs a task in a worker and answers with its result", async () => {
    const text = await pool.run<unknown, string>("analyze", { plan: newPlanDocument(), maxAnswerBytes: 1_000_000 }, { timeLimitMs: 30_000, doing: "analyse" });
    const answer = JSON.parse(text);
    expect(answer.summary.fixtures).toBe(0);
    expect(Array.isArray(answer.findings)).toBe(true);
  });

  it("stops a task over its time limit with a 503 in words, and answers the next task", async () => {
    const e = await rejection(pool.run("testHook", { hook: "spin" }, { timeLimitMs: 500, doing: "analyse" }));
    expect(e.status).toBe(503);
    expect(e.code).toBe("too_slow");
    expect(e.message).toMatch(/takes too long to analyse on the server/);
    await expect(pool.run("ping", {}, { timeLimitMs: 30_000, doing: "answer" })).resolves.toBe("pong");
  });

  it("ends a worker that runs out of its heap with a 413, and a new worker takes the next task", async () => {
    const e = await rejection(pool.run("testHook", { hook: "hog" }, { timeLimitMs: 60_000, doing: "analyse" }));
    expect(e.status).toBe(413);
    expect(e.code).toBe("too_large");
    expect(e.message).toMatch(/more memory/);
    await expect(pool.run("ping", {}, { timeLimitMs: 30_000, doing: "answer" })).resolves.toBe("pong");
  }, 90_000);

  it("answers 503 busy with a retry time when the queue is full", async () => {
    const running = pool.run("testHook", { hook: "spin" }, { timeLimitMs: 3000, doing: "analyse" }).catch((e: unknown) => e);
    // Wait until the spin holds the only worker, then fill the queue of two.
    await new Promise((r) => setTimeout(r, 200));
    const queued = [1, 2].map(() => pool.run("ping", {}, { timeLimitMs: 30_000, doing: "answer" }));
    const e = await rejection(pool.run("ping", {}, { timeLimitMs: 30_000, doing: "answer" }));
    expect(e.status).toBe(503);
    expect(e.code).toBe("busy");
    expect(e.extra).toEqual({ retryAfterSeconds: expect.any(Number) });
    expect(await running).toBeInstanceOf(AppError);
    await expect(Promise.all(queued)).resolves.toEqual(["pong", "pong"]);
  }, 30_000);

  it("ends the task of a client that went away", async () => {
    const ctl = new AbortController();
    const p = pool.run("testHook", { hook: "spin" }, { timeLimitMs: 30_000, signal: ctl.signal, doing: "analyse" });
    setTimeout(() => ctl.abort(), 200);
    const e = await rejection(p);
    expect(e.code).toBe("cancelled");
    await expect(pool.run("ping", {}, { timeLimitMs: 30_000, doing: "answer" })).resolves.toBe("pong");
  });
});
