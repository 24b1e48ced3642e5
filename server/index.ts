import 'reflect-metadata';
import { seedDemoIfEmpty } from '../seed/demo';
import { createApp } from './app';
import type { AppContext } from './context';
import { openDatabase } from './db/data-source';
import { databaseLabel, databaseTarget, loadConfig } from './env';
import { createLogger } from './lib/logger';
import { startLocalMailService } from './mail/local-mail-service';
import { verifyStorage } from './storage/storage-for';

/** Starts Tandem: open and migrate the database, seed the demo if asked, listen, shut down cleanly. */
async function main() {
  const config = loadConfig();
  const logger = createLogger(config);
  const dataSource = await openDatabase(databaseTarget(config));
  logger.info(`database: ${databaseLabel(config)}`);
  const ctx: AppContext = { dataSource, config, logger };
  await verifyStorage(ctx);
  if (config.demo && (await seedDemoIfEmpty(ctx))) logger.info('demo data loaded');
  // Demo mode with no SMTP host: reports go to a local mail service that keeps them under the data dir.
  const localMail = config.demo && !config.smtp ? await startLocalMailService({ dataDir: config.dataDir, port: config.localMailPort ?? 2525, onError: (err) => logger.warn({ err }, 'local mail service') }) : undefined;
  if (localMail) {
    config.smtp = localMail.smtp;
    logger.info(`local mail service on 127.0.0.1:${localMail.smtp.port}, messages kept in ${localMail.dir}`);
  }

  const server = createApp(ctx).listen(config.port, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    logger.info(`Tandem is listening on http://localhost:${port}`);
  });

  const shutdown = (signal: string) => {
    logger.info({ signal }, 'shutting down');
    void localMail?.close();
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
