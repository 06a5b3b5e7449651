import { defineConfig } from "@playwright/test";

const PORT = Number(process.env.E2E_PORT ?? 3210);

export default defineConfig({
  testDir: "test",
  testMatch: ["e2e/**/*.spec.ts", "routes/**/*.spec.ts"],
  workers: 1,
  timeout: 90_000,
  retries: 0,
  outputDir: "test-results/playwright",
  reporter: [["list"], ["json", { outputFile: "test-results/playwright.json" }]],
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
    viewport: { width: 1280, height: 800 },
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
  webServer: {
    // the server of `npm start` directly (through npx an orphaned next-server is left when killed)
    command: `node scripts/serve.mjs ${PORT}`,
    url: `http://127.0.0.1:${PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    env: {
      OZONE_DATA_DIR: "test-results/e2e-data",
      NEXT_TELEMETRY_DISABLED: "1",
      NODE_ENV: "production",
      // one trusted hop: a route test counts as another client by sending its own X-Forwarded-For (test/routes/public.spec.ts)
      OZONE_TRUSTED_PROXIES: "1",
    },
  },
});
