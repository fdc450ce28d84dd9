import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\/(.*)$/, replacement: fileURLToPath(new URL('./$1', import.meta.url)) },
      // `server-only` throws outside a React server bundle; tests import data-access modules directly.
      {
        find: 'server-only',
        replacement: fileURLToPath(new URL('./tests/support/empty.ts', import.meta.url)),
      },
    ],
  },
  test: {
    include: ['tests/**/*.test.ts'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 30_000,
    // The first file to need the demo yard seeds it for the whole run; on a busy machine that is slow.
    hookTimeout: 300_000,
    pool: 'forks',
    setupFiles: ['tests/support/setup.ts'],
    globalSetup: ['tests/support/global-setup.ts'],
  },
});
