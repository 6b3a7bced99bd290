import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";

/** Name of the bundled worker inside the build folder (scripts/build-worker.ts writes it). */
export const WORKER_FILE_NAME = "engine-worker.cjs";

/** Name of the packet worker bundle (the build packet's PDF), beside the engine worker. */
export const PACKET_WORKER_FILE_NAME = "packet-worker.mjs";

/** Where the worker bundle of the running build is: inside BW_DIST_DIR (or .next), from the working folder. */
export function workerFilePath(name = WORKER_FILE_NAME): string {
  return path.resolve(process.cwd(), process.env.BW_DIST_DIR ?? ".next", name);
}

/**
 * The worker bundle's path, built first when it is missing (a build made before the worker existed)
 * or when running `next dev` (the sources change under it). A production build makes it in
 * scripts/lib.sh build_app; this is the fallback, through the same script, in a child process so
 * the server's bundler never sees esbuild.
 */
export function ensureWorkerFile(file = workerFilePath()): string {
  if (existsSync(file) && process.env.NODE_ENV !== "development") return file;
  const tsx = path.resolve(process.cwd(), "node_modules/.bin/tsx");
  execFileSync(tsx, ["scripts/build-worker.ts", path.dirname(file)], { cwd: process.cwd(), stdio: ["ignore", "ignore", "inherit"], timeout: 120_000 });
  return file;
}
