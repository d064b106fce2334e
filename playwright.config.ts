import { defineConfig, devices } from "@playwright/test";

// Debian's Chromium, never a browser download. The app runs from a production build on :3100
// against its own fresh database (scripts/serve-e2e.sh). E2E_PORT and NEXT_DIST_DIR let runs coexist.
const chromiumArgs = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic"];

const port = Number(process.env.E2E_PORT ?? 3100);
const baseURL = `http://localhost:${port}`;

export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  reporter: [["list"]],
  use: {
    baseURL,
    headless: true,
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs },
  },
  projects: [
    // signs each role in once and saves its state under .auth/ (tests/e2e/support-auth.setup.ts); the specs start from those
    { name: "setup", testMatch: /support-auth\.setup\.ts$/, use: { ...devices["Desktop Chrome"], launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs } } },
    { name: "chromium", dependencies: ["setup"], use: { ...devices["Desktop Chrome"], launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs } } },
  ],
  webServer: {
    command: "bash scripts/serve-e2e.sh",
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: "ignore",
    stderr: "pipe",
    // SIGTERM, not the default SIGKILL: scripts/serve-e2e.sh then stops the mail sink and the fake S3 server it started
    gracefulShutdown: { signal: "SIGTERM", timeout: 15_000 },
  },
});
