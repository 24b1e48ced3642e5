/**
 * The server side of bench/jobs.bench.ts, in its own process (as in production): the fixture of
 * bench/jobs-fixture.ts, then one line of JSON on stdout with the port, a token, the ids and a record body.
 */
import 'reflect-metadata';
import { rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createApp } from '../server/app';
import { signToken } from '../server/auth/tokens';
import { renderSystemReport } from '../server/reports/system-report';
import { createJob } from '../server/jobs/jobs.service';
import { createSystem, patchSystem } from '../server/systems/systems.service';
import { openJobsFixture } from './jobs-fixture';

/** How many techs edit their own record at once in the edit load (one per connection). */
const OWN_RECORDS = 20;

async function main() {
  const { ctx, dir, techId, jobId, recordId, body } = await openJobsFixture();
  const { dataSource, config } = ctx;
  // CPU time per operation, in-process and one at a time: on a shared, loaded machine wall-clock
  // latency mostly measures the queue for a core, so the load figures carry this beside them.
  const cpuMs = async (times: number, work: () => Promise<unknown>) => {
    await work();
    const started = process.cpuUsage();
    for (let i = 0; i < times; i++) await work();
    const used = process.cpuUsage(started);
    return (used.user + used.system) / 1000 / times;
  };
  // Saves are measured 20 at a time, as they arrive under the load (they share commits then).
  const inFlight = (work: () => Promise<unknown>) => () => Promise.all(Array.from({ length: OWN_RECORDS }, work));
  const saveCpuMs =
    (await cpuMs(
      10,
      inFlight(() => createSystem(ctx, jobId, body, techId)),
    )) / OWN_RECORDS;
  // One job and one record per tech: the edit load PATCHes each record only from its own connection.
  const ownRecords: { id: number; revision: number }[] = [];
  for (let i = 0; i < OWN_RECORDS; i++) {
    const job = await createJob(ctx, { customerName: `Bench Customer ${i + 1}`, siteAddress: `${i + 1} Bench Way`, state: 'TX' }, techId);
    const record = await createSystem(ctx, job.id, body, techId);
    ownRecords.push({ id: record.id, revision: record.revision });
  }
  const edit = (n: number) => ({ serials: { outdoor: `BJ2611A${String(n).padStart(5, '0')}` } });
  const patchCpuMs =
    (await cpuMs(5, () =>
      Promise.all(
        ownRecords.map(
          async (r) => (r.revision = (await patchSystem(ctx, r.id, { revision: r.revision, ...edit(r.revision) }, techId)).view.revision),
        ),
      ),
    )) / OWN_RECORDS;
  const pdfCpuMs = await cpuMs(10, () => renderSystemReport(ctx, recordId, { paper: 'letter' }));

  const server = createApp(ctx).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const token = signToken(config.jwtSecret, { userId: techId, role: 'tech' });
  process.stdout.write(
    `${JSON.stringify({ port: (server.address() as AddressInfo).port, token, jobId, recordId, body, saveCpuMs, patchCpuMs, pdfCpuMs, ownRecords })}\n`,
  );
  process.on('SIGTERM', () => {
    server.close(
      () =>
        void dataSource.destroy().finally(() => {
          rmSync(dir, { recursive: true, force: true });
          process.exit(0);
        }),
    );
  });
}

void main();
