import "server-only";
import PgBoss from "pg-boss";
import { requestEm } from "../db";
import { env } from "../env";
import { log, logError } from "../log";
import { expireUploads } from "../services/upload-expiry";

/** Queue names; every web instance shares them through the same PostgreSQL. */
export const QUEUES = { uploadCleanup: "upload-cleanup" } as const;

const g = globalThis as unknown as { __bwBoss?: PgBoss; __bwBossStarting?: boolean };

/** First retry of a failed start (the database may still be starting); doubles up to a minute. */
const FIRST_RETRY_MS = 2_000;

async function cleanUpUploads(): Promise<void> {
  const result = await expireUploads(await requestEm());
  if (result.rows || result.objects) log.info(result, "expired unconfirmed uploads removed");
}

async function startOnce(): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: env().DATABASE_URL,
    schema: "pgboss",
    application_name: "benchwright-jobs",
    max: 2,
  });
  // Without a listener an error event (the database going away) would end the process.
  boss.on("error", (e) => logError("job queue", e));
  try {
    await boss.start();
    // "stately": at most one clean-up queued and one running, however many instances tick.
    await boss.createQueue(QUEUES.uploadCleanup, { name: QUEUES.uploadCleanup, policy: "stately", retryLimit: 3, retryDelay: 60, expireInSeconds: 600 });
    await boss.schedule(QUEUES.uploadCleanup, env().UPLOAD_CLEANUP_CRON);
    await boss.work(QUEUES.uploadCleanup, { batchSize: 1 }, cleanUpUploads);
    return boss;
  } catch (e) {
    await boss.stop({ graceful: false, wait: false }).catch(() => undefined);
    throw e;
  }
}

/**
 * Starts the job queue once per process (from instrumentation.ts), retrying while PostgreSQL is
 * not there yet. BW_JOBS=off leaves it out. No signal handlers of its own: a listener would keep
 * the process from ending on SIGTERM; a job cut short by the process ending expires and is retried.
 */
export function startJobs(): void {
  if (g.__bwBoss || g.__bwBossStarting || process.env.BW_JOBS === "off") return;
  g.__bwBossStarting = true;
  let delay = FIRST_RETRY_MS;
  const attempt = () => {
    startOnce()
      .then((boss) => {
        g.__bwBoss = boss;
        g.__bwBossStarting = false;
        log.info({ queues: Object.values(QUEUES) }, "job queue started");
      })
      .catch((e: unknown) => {
        logError(`job queue did not start; retrying in ${delay / 1000} s`, e);
        setTimeout(attempt, delay).unref();
        delay = Math.min(60_000, delay * 2);
      });
  };
  attempt();
}
