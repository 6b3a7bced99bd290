/** Next calls register() once when a server process starts: the job queue starts here (Node only, not while building). */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.NEXT_PHASE === "phase-production-build") return;
  const { startJobs } = await import("./lib/server/jobs/queue");
  startJobs();
}
