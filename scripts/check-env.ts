/** Validates the configuration at start-up, before anything is served. */
import { env } from "../lib/server/env";

try {
  env();
} catch (e) {
  console.error((e as Error).message);
  process.exit(1);
}
