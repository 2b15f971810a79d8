import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { defineConfig, devices } from '@playwright/test';
import { E2E } from './e2e/support/env';

// A fresh data folder for every run: the server sees a new database and loads the demo scenario into it.
const dataDir = process.env.E2E_DATA_DIR ?? mkdtempSync(path.join(tmpdir(), 'tickwright-e2e-'));
process.env.E2E_DATA_DIR = dataDir;

export default defineConfig({
  testDir: 'e2e',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: process.env.CI ? 'line' : 'list',
  use: {
    baseURL: E2E.baseUrl,
    trace: 'retain-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
      ],
    },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'] } }],
  webServer: {
    command: 'npx tsx server/index.ts',
    url: `${E2E.baseUrl}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      NODE_ENV: 'production',
      PORT: String(E2E.port),
      APP_URL: E2E.baseUrl,
      DATA_DIR: dataDir,
      DEV_SMTP_PORT: String(E2E.smtpPort),
      DEV_MAIL_WEB_PORT: String(E2E.mailWebPort),
      LOG_LEVEL: 'warn',
    },
  },
});
