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
import { createSystem } from '../server/systems/systems.service';
import { openJobsFixture } from './jobs-fixture';

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
  const saveCpuMs = await cpuMs(20, () => createSystem(ctx, jobId, body, techId));
  const pdfCpuMs = await cpuMs(10, () => renderSystemReport(ctx, recordId, { paper: 'letter' }));

  const server = createApp(ctx).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const token = signToken(config.jwtSecret, { userId: techId, role: 'tech' });
  process.stdout.write(
    `${JSON.stringify({ port: (server.address() as AddressInfo).port, token, jobId, recordId, body, saveCpuMs, pdfCpuMs })}\n`,
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
