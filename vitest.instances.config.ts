// `npm run test:instances`: the two-instance test on a test PostgreSQL (KERFWISE_TEST_DATABASE_URL).
// Kept out of `vitest run`: it needs a production build and starts servers of its own.
import { defineConfig, mergeConfig } from 'vitest/config';
import base from './vitest.config';

export default mergeConfig(
  { ...base, test: { ...base.test, projects: undefined } },
  defineConfig({ test: { include: ['tests/instances/**/*.test.ts'], testTimeout: 600_000 } }),
);
