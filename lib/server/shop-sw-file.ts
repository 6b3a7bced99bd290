import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";

/** Name of the shop view's service worker inside the build folder (scripts/build-worker.ts writes it). */
export const SHOP_SW_FILE_NAME = "shop-sw.js";

/** The service worker of the running build, built first when missing or under `next dev` (as the engine worker is). */
export function ensureShopServiceWorker(): string {
  const file = path.resolve(process.cwd(), process.env.BW_DIST_DIR ?? ".next", SHOP_SW_FILE_NAME);
  if (existsSync(file) && process.env.NODE_ENV !== "development") return file;
  const tsx = path.resolve(process.cwd(), "node_modules/.bin/tsx");
  execFileSync(tsx, ["scripts/build-worker.ts", path.dirname(file)], { cwd: process.cwd(), stdio: ["ignore", "ignore", "inherit"], timeout: 120_000 });
  return file;
}
