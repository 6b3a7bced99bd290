/**
 * Bundles the server's engine worker (lib/server/engine-pool/worker.ts with lib/engine/) into one
 * plain JS file, and the packet worker (lib/server/packet/worker.ts) into another ES module, inside
 * a build folder, for piscina to load: Next bundles server code, so the pools need real files on disk. Also bundles the shop view's service worker
 * (lib/client/shop/service-worker.ts), which app/shop-sw.js serves from the same folder. Run after
 * `next build` by scripts/lib.sh build_app:
 *   tsx scripts/build-worker.ts <dist folder>
 */
import path from "node:path";
import { fileURLToPath } from "node:url";
import { build, type BuildOptions } from "esbuild";
import { PACKET_WORKER_FILE_NAME, WORKER_FILE_NAME } from "../lib/server/engine-pool/worker-file";
import { SHOP_SW_FILE_NAME } from "../lib/server/shop-sw-file";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

/** One bundle of `entry` into `outFile` with the options every bundle here shares; returns its path. */
async function bundle(entry: string, outFile: string, options: BuildOptions): Promise<string> {
  await build({ absWorkingDir: ROOT, entryPoints: [entry], outfile: outFile, bundle: true, tsconfig: "tsconfig.json", legalComments: "none", logLevel: "warning", ...options });
  return outFile;
}

/** Writes the worker bundle to `outFile` (CommonJS, Node 20); returns its path. */
export const buildEngineWorker = (outFile: string) => bundle("lib/server/engine-pool/worker.ts", outFile, { platform: "node", target: "node20", format: "cjs" });

/**
 * Writes the packet worker (lib/server/packet/worker.ts: the PDF pages and the engine) to `outFile`
 * as an ES module. Packages stay outside the bundle and load from node_modules, so React and the
 * PDF renderer are the one copy each that the rest of the server uses.
 */
export const buildPacketWorker = (outFile: string) =>
  bundle("lib/server/packet/worker.ts", outFile, { packages: "external", platform: "node", target: "node20", format: "esm", jsx: "automatic" });

/** Writes the shop view's service worker (one classic script for the browser, minified). */
export const buildShopServiceWorker = (outFile: string) =>
  bundle("lib/client/shop/service-worker.ts", outFile, { platform: "browser", target: "es2022", format: "iife", minify: true, define: { "process.env.NODE_ENV": '"production"' } });

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const dist = process.argv[2];
  if (!dist) {
    console.error("usage: tsx scripts/build-worker.ts <dist folder>");
    process.exit(2);
  }
  const out = await buildEngineWorker(path.resolve(ROOT, dist, WORKER_FILE_NAME));
  console.log(`engine worker bundled: ${path.relative(ROOT, out)}`);
  const packet = await buildPacketWorker(path.resolve(ROOT, dist, PACKET_WORKER_FILE_NAME));
  console.log(`packet worker bundled: ${path.relative(ROOT, packet)}`);
  const sw = await buildShopServiceWorker(path.resolve(ROOT, dist, SHOP_SW_FILE_NAME));
  console.log(`shop service worker bundled: ${path.relative(ROOT, sw)}`);
}
