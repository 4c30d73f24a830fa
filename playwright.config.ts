import { defineConfig } from '@playwright/test';

/** Debian's Chromium; Playwright's own browser downloads are never used. */
const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
// One port per run, shared with the worker processes through the environment they inherit,
// so two runs on one machine never share (and stop) each other's server.
process.env.CHANCEWISE_E2E_PORT ??= String(4300 + Math.floor(Math.random() * 600));
const port = Number(process.env.CHANCEWISE_E2E_PORT);

export default defineConfig({
  testDir: 'e2e',
  outputDir: 'test-results/e2e',
  workers: 1,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    browserName: 'chromium',
    viewport: { width: 1440, height: 1000 },
    acceptDownloads: true,
    launchOptions: {
      executablePath,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
        '--disable-quic',
      ],
    },
  },
  webServer: {
    command: `npm run web -- --port ${port}`,
    url: `http://127.0.0.1:${port}/`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
