import { defineConfig } from '@playwright/test';

// Debian's Chromium, never a downloaded browser. The test command (scripts/test-all.sh) starts the app
// and sets E2E_BASE_URL; run alone, point it at a running app.
const baseURL = process.env.E2E_BASE_URL ?? 'http://localhost:3000';

export default defineConfig({
  testDir: 'tests/e2e',
  timeout: 60_000,
  fullyParallel: false,
  workers: 1,
  retries: 0,
  outputDir: '.tmp/playwright-results',
  use: {
    baseURL,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic', '--no-first-run'],
    },
  },
  projects: [{ name: 'chromium', use: { browserName: 'chromium' } }],
});
