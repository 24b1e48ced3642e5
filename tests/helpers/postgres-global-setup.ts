import type { TestProject } from 'vitest/node';
// @ts-expect-error -- a plain .mjs script shared with scripts/with-postgres.mjs and the benches
import { startCluster } from '../../scripts/postgres-cluster.mjs';

/**
 * The api-pg project's PostgreSQL: the server in TANDEM_TEST_DATABASE_URL when one is given (e.g. by
 * scripts/with-postgres.mjs), else a throwaway cluster started here and removed after the run.
 */
export default async function setup(project: TestProject) {
  const given = process.env.TANDEM_TEST_DATABASE_URL;
  if (given) {
    project.provide('postgresUrl', given);
    return undefined;
  }
  const cluster = (await startCluster()) as { url: string; stop(): Promise<void> };
  project.provide('postgresUrl', cluster.url);
  return () => cluster.stop();
}
