import { defineConfig } from "@playwright/test";

const baseURL = process.env.BASE_URL ?? "http://127.0.0.1:3100";

// Driven by `npm test`, which starts the services and `next start` first and passes BASE_URL.
export default defineConfig({
  testDir: "tests/e2e",
  testMatch: "**/*.spec.ts",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  outputDir: ".data/test/playwright",
  use: {
    baseURL,
    // A browser sends its page's Origin with every write; the tests' scripted requests do the same,
    // since the app refuses cookie-carried writes from anywhere else.
    extraHTTPHeaders: { origin: baseURL },
    trace: "retain-on-failure",
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
  projects: [{ name: "desktop", use: { viewport: { width: 1280, height: 900 } } }],
});
