import { defineConfig } from "@playwright/test";

// Browser tests run against the app server that scripts/stack.ts started
// (APP_ORIGIN). Debian's chromium, never a downloaded browser.
export default defineConfig({
  testDir: "tests/browser",
  fullyParallel: false,
  workers: 2,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"], ["json", { outputFile: process.env.PLAYWRIGHT_JSON_OUTPUT_NAME ?? ".data/test/reports/playwright.json" }]],
  use: {
    baseURL: process.env.APP_ORIGIN ?? "http://127.0.0.1:3100",
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
});
