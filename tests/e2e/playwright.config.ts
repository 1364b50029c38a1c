import { defineConfig } from "@playwright/test";

// The app, database and mail catcher are started by scripts/stack.mjs (npm test).
export default defineConfig({
  testDir: ".",
  outputDir: "../../test-results/e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  // The longer flows (sign-up to reset, invitation to removal) pass in 20-50 s alone; on a machine
  // shared with other builds they need more.
  timeout: 120_000,
  reporter: [["list"], ["json"]],
  use: {
    baseURL: process.env.APP_URL ?? "http://127.0.0.1:3100",
    screenshot: "only-on-failure",
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        "--disable-quic",
      ],
    },
  },
});
