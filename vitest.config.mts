import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // Server modules start with `import 'server-only'`, which throws outside React's server condition; tests import
    // them directly, so here it is the package's own empty module (what Next resolves it to on the server).
    alias: { 'server-only': fileURLToPath(new URL('./node_modules/server-only/empty.js', import.meta.url)) },
  },
  test: {
    // The app's logger stays quiet inside test processes; the HTTP tests read the log of the server they start.
    env: { LOG_LEVEL: 'silent' },
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/integration/setup.ts'],
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        // Against our server on the production build: run after `next build` (scripts/test.sh does).
        extends: true,
        test: {
          name: 'http',
          include: ['tests/http/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/http/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 60000,
        },
      },
    ],
  },
});
