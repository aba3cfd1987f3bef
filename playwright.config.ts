import { defineConfig } from '@playwright/test';

const PORT = Number(process.env.PLUMBLINE_E2E_PORT ?? 3100);

// Debian's Chromium, never a downloaded browser; the flags keep it quiet on a closed network.
export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: 'tests/.artifacts/playwright',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 90_000,
  expect: { timeout: 15_000 },
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
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
      ],
    },
  },
  webServer: {
    // Our server in front of Next (server/), bundled by scripts/bundle.mjs; its log goes to the test artefacts.
    command: `mkdir -p tests/.artifacts && exec node .build/server.mjs >tests/.artifacts/e2e-server.log`,
    url: `http://127.0.0.1:${PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    env: { NODE_ENV: 'production', PORT: String(PORT) },
  },
});
