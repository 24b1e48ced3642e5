import pino from 'pino';
import type { AppConfig } from '../env';

export function createLogger(config: Pick<AppConfig, 'logLevel'>) {
  return pino({ level: config.logLevel, redact: ['req.headers.authorization', 'password'] });
}
