import { defineConfig, devices } from '@playwright/test';

// Browser tests drive Debian's Chromium (never a downloaded browser) against the built app,
// served with its own throwaway database by e2e/serve.ts.
const port = Number(process.env.E2E_PORT ?? 3100);

export default defineConfig({
  testDir: 'e2e',
  testMatch: '**/*.spec.ts',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: process.env.CI ? 'list' : [['list']],
  outputDir: 'test-results/e2e',
  use: {
    ...devices['Desktop Chrome'],
    baseURL: `http://localhost:${port}`,
    viewport: { width: 1280, height: 860 },
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  webServer: {
    // node itself, not the tsx command: tsx's launcher kills its child with SIGKILL when it does not
    // answer a signal within 30 ms, which cut the cluster's removal short (it runs synchronously)
    command: `node --import tsx e2e/serve.ts`,
    url: `http://localhost:${port}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'ignore',
    stderr: 'pipe',
    env: { E2E_PORT: String(port) },
    gracefulShutdown: { signal: 'SIGTERM', timeout: 20_000 },
  },
});
