import { afterAll, beforeAll } from 'vitest';
import { buildFixture, type Fixture } from '../server/systems/system-fixtures';
import type { AppConfig } from '../../server/env';
import { createTestApp, type TestApp } from './test-app';

/**
 * The usual API test file setup: one test app with the invented catalog fixture for the whole file, closed after
 * it. `use` hands both over once they exist (assign them to the file's own `t` and `f`).
 */
export function useFixtureApp(use: (t: TestApp, f: Fixture) => void): void {
  let app: TestApp | undefined;
  beforeAll(async () => {
    app = await createTestApp();
    use(app, await buildFixture(app));
  });
  afterAll(async () => {
    await app?.close();
  });
}

/** One test app (no fixture) for the whole file, closed after it; `use` hands it over once it exists. */
export function useTestApp(use: (t: TestApp) => void, overrides: Partial<AppConfig> = {}): void {
  let app: TestApp | undefined;
  beforeAll(async () => {
    app = await createTestApp(overrides);
    use(app);
  });
  afterAll(async () => {
    await app?.close();
  });
}
