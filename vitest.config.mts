import { defineConfig } from 'vitest/config';
import { postgresBinDir } from './scripts/postgres-cluster.mjs';

// The API suite runs twice when PostgreSQL is at hand (installed, or TANDEM_TEST_DATABASE_URL given):
// once on SQLite (`api`) and once on PostgreSQL (`api-pg`). Without it, only on SQLite.
const withPostgres = Boolean(process.env.TANDEM_TEST_DATABASE_URL) || postgresBinDir() !== null;

const apiTest = {
  include: ['tests/server/**/*.test.ts'],
  environment: 'node' as const,
  setupFiles: ['tests/helpers/setup-reflect.ts'],
  testTimeout: 30000,
};

// One config, up to four projects: pure unit tests, API tests in-process (on each database), and
// browser tests that build the web export once and drive it in Debian's Chromium.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    pool: 'forks',
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['tests/shared/**/*.test.ts', 'tests/app/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: { name: 'api', ...apiTest, env: { TANDEM_TEST_ON_SQLITE: '1' } },
      },
      ...(withPostgres
        ? [
            {
              extends: true,
              test: { name: 'api-pg', ...apiTest, globalSetup: ['tests/helpers/postgres-global-setup.ts'] },
            },
          ]
        : []),
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 120000,
          hookTimeout: 240000,
          fileParallelism: false,
          // A cold page on a busy 2-core machine can take seconds to settle: polls wait up to 15 s.
          expect: { poll: { timeout: 15000 } },
        },
      },
    ],
  },
});
