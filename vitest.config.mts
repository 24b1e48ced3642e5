import { defineConfig } from 'vitest/config';

// One config, three projects: pure unit tests, API tests in-process, and browser tests that
// build the web export once and drive it in Debian's Chromium.
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
        test: {
          name: 'api',
          include: ['tests/server/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/helpers/setup-reflect.ts'],
          testTimeout: 30000,
        },
      },
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
