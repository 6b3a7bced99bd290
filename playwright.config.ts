import { defineConfig } from "@playwright/test";

const port = Number(process.env.BW_APP_PORT ?? 3210);

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: "test-results",
  timeout: 90_000,
  expect: { timeout: 15_000 },
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  reporter: [["list"]],
  use: {
    baseURL: process.env.BW_BASE_URL ?? `http://127.0.0.1:${port}`,
    screenshot: "only-on-failure",
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: process.env.BW_CHROMIUM ?? "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic", "--use-angle=swiftshader", "--enable-unsafe-swiftshader"],
    },
  },
});
