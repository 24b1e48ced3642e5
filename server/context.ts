import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import type { AppConfig } from './env';

/** What every router and service is built with: no globals, so tests build their own. */
export interface AppContext {
  dataSource: DataSource;
  config: AppConfig;
  logger: Logger;
}
