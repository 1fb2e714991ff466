import { defineConfig, devices } from "@playwright/test";
import { chromiumArgs } from "./e2e/support/chromium-args";

// Playwright in Debian's Chromium (never a downloaded browser) against `next start` of the test
// build. scripts/test.sh prepares the database and passes its URL in the environment.
const port = Number(process.env.PLUMBLINE_E2E_APP_PORT ?? 3300);
const baseURL = `http://127.0.0.1:${port}`;

function stringEnv(source: NodeJS.ProcessEnv): Record<string, string> {
  return Object.fromEntries(
    Object.entries(source).filter((pair): pair is [string, string] => pair[1] !== undefined),
  );
}

export default defineConfig({
  testDir: "e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: process.env.CI ? [["list"]] : [["list"]],
  outputDir: "test-results",
  use: {
    baseURL,
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: chromiumArgs,
    },
  },
  projects: [{ name: "phone", use: { ...devices["Pixel 7"], browserName: "chromium" } }],
  webServer: [
    {
      command: "node_modules/.bin/tsx scripts/services.ts",
      port: Number(process.env.SMTP_PORT ?? 2725),
      reuseExistingServer: false,
      timeout: 30_000,
    },
    {
      command: `node_modules/.bin/next start -H 127.0.0.1 -p ${port}`,
      // The browser tests sign in to the demo's accounts: ask for the demo (the default is live).
      env: { ...stringEnv(process.env), PLUMBLINE_MODE: "demo" },
      url: `${baseURL}/api/health`,
      reuseExistingServer: false,
      timeout: 90_000,
    },
    {
      // The job worker: re-derives verdicts after a sync and sends the e-mail.
      command: "node_modules/.bin/tsx --conditions=react-server scripts/worker.ts",
      env: { ...stringEnv(process.env), PLUMBLINE_MODE: "demo", PLUMBLINE_WORKER_POLL_MS: "50" },
      wait: { stdout: /\[worker\] ready/ },
      reuseExistingServer: false,
      timeout: 30_000,
    },
  ],
});
