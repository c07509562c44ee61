import { defineConfig } from '@playwright/test'

// The test server (scripts/serve-test.ts): test database, demo users, SMTP sink, built client.
const e2ePort = process.env.CHIMELINE_E2E_PORT ?? '3100'
const baseURL = process.env.E2E_BASE_URL ?? `http://127.0.0.1:${e2ePort}`

export default defineConfig({
  testDir: 'e2e',
  timeout: 60_000,
  retries: process.env.CI ? 1 : 0,
  workers: 1,
  reporter: [['list']],
  use: {
    baseURL,
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
    screenshot: 'only-on-failure',
  },
  webServer: process.env.E2E_BASE_URL
    ? undefined
    : {
        command: 'npx tsx scripts/serve-test.ts',
        url: `${baseURL}/api/health`,
        env: { CHIMELINE_E2E_PORT: e2ePort },
        // A fresh server per run, so a stale one with old code is never tested.
        reuseExistingServer: false,
        timeout: 60_000,
        stdout: 'ignore',
        stderr: 'pipe',
      },
})
