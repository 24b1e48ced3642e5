import 'reflect-metadata';
import { seedDemoIfEmpty } from '../seed/demo';
import { createApp } from './app';
import type { AppContext } from './context';
import { openDatabase } from './db/data-source';
import { loadConfig } from './env';
import { createLogger } from './lib/logger';

/** Starts Tandem: open and migrate the database, seed the demo if asked, listen, shut down cleanly. */
async function main() {
  const config = loadConfig();
  const logger = createLogger(config);
  const dataSource = await openDatabase(config.databasePath);
  const ctx: AppContext = { dataSource, config, logger };
  if (config.demo && (await seedDemoIfEmpty(ctx))) logger.info('demo data loaded');

  const server = createApp(ctx).listen(config.port, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    logger.info(`Tandem is listening on http://localhost:${port}`);
  });

  const shutdown = (signal: string) => {
    logger.info({ signal }, 'shutting down');
    server.close(() => {
      void dataSource.destroy().finally(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
