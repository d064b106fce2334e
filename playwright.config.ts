import { defineConfig, devices } from "@playwright/test";

// Debian's Chromium, never a browser download. The app runs from a production build on :3100
// against its own fresh database (scripts/serve-e2e.sh).
const chromiumArgs = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic"];

export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  reporter: [["list"]],
  use: {
    baseURL: "http://localhost:3100",
    headless: true,
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs },
  },
  projects: [{ name: "chromium", use: { ...devices["Desktop Chrome"], launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs } } }],
  webServer: {
    command: "bash scripts/serve-e2e.sh",
    url: "http://localhost:3100/api/health",
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: "ignore",
    stderr: "pipe",
  },
});
