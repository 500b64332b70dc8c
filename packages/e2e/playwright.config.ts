import { defineConfig } from '@playwright/test';

const baseURL = process.env.E2E_BASE_URL;
if (!baseURL)
  throw new Error('E2E_BASE_URL is not set: run the browser tests through `npm test`, which starts the app for them.');

/** Debian's Chromium, never a downloaded browser; the flags keep it off the network it cannot reach. */
export default defineConfig({
  testDir: 'tests',
  // Screenshots and traces; `npm test` puts them in its own data folder so that parallel runs never share one.
  outputDir: process.env.E2E_OUTPUT_DIR ?? 'test-results',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  reporter: [['list'], ['json', { outputFile: process.env.E2E_JSON_REPORT ?? 'test-results/report.json' }]],
  use: {
    baseURL,
    screenshot: 'on',
    trace: 'retain-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--enable-unsafe-swiftshader',
      ],
    },
  },
});
