import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { isIP } from 'node:net';
import path from 'node:path';
import { z } from 'zod';
import { SmtpEnvShape, smtpConfigOf, type SmtpConfig } from './mail/smtp-config';
import { StorageEnvShape, storageConfigOf, type StorageConfig } from './storage/storage-config';

/** The one place that reads process.env: validated configuration for the server. */

const EnvSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  DATABASE_PATH: z.string().min(1).default('data/tandem.sqlite'),
  /** Set: PostgreSQL at this URL instead of the SQLite file at DATABASE_PATH. */
  DATABASE_URL: z.preprocess(
    (value) => (value === '' ? undefined : value),
    z.string().regex(/^postgres(ql)?:\/\/[^\s]+$/, 'must be a postgres:// or postgresql:// URL').optional(),
  ),
  TANDEM_DATA_DIR: z.string().min(1).default('data'),
  TANDEM_DEMO: z.enum(['0', '1']).default('0'),
  TANDEM_JWT_SECRET: z.string().min(16).optional(),
  TANDEM_WEB_DIR: z.string().min(1).default('dist'),
  TANDEM_LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** Failed sign-ins allowed per e-mail from one address in the rate window (3× that per address). */
  TANDEM_SIGNIN_LIMIT: z.coerce.number().int().min(1).default(10),
  /** Which proxies' X-Forwarded-For to believe: `false` (none), a hop count, or addresses/subnets. */
  TANDEM_TRUST_PROXY: z.string().default('false'),
  /** Only `npm run dev` sets this: the Expo dev server's origin. */
  TANDEM_CORS_ORIGIN: z.string().url().optional(),
  /** The shop's name on reports and e-mail. */
  TANDEM_SHOP_NAME: z.string().trim().min(1).max(120).optional(),
  ...SmtpEnvShape,
  ...StorageEnvShape,
});

export interface AppConfig {
  port: number;
  databasePath: string;
  /** PostgreSQL connection URL; absent means the SQLite file at databasePath. */
  databaseUrl?: string;
  dataDir: string;
  demo: boolean;
  jwtSecret: string;
  webDir: string;
  logLevel: z.infer<typeof EnvSchema>['TANDEM_LOG_LEVEL'];
  signInLimit: number;
  /** Express's `trust proxy`: false (the default) ignores X-Forwarded-For entirely. */
  trustProxy?: TrustProxy;
  corsOrigin?: string;
  shopName?: string;
  /** Where reports are e-mailed; absent means sending is not configured (demo mode fills it in). */
  smtp?: SmtpConfig;
  /** Loopback port of the local mail service demo mode starts. */
  localMailPort?: number;
  /** Where photos and sent reports are kept; absent means local disk under the data dir. */
  storage?: StorageConfig;
}

export type TrustProxy = false | number | string[];

const PROXY_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);

/** One proxy entry: a name express knows, an address, or an address/prefix subnet. */
function isProxyEntry(entry: string): boolean {
  if (PROXY_NAMES.has(entry)) return true;
  const [address, prefix, ...rest] = entry.split('/');
  const family = isIP(address);
  if (!family || rest.length > 0) return false;
  if (prefix === undefined) return true;
  return /^[0-9]{1,3}$/.test(prefix) && Number(prefix) <= (family === 4 ? 32 : 128);
}

/**
 * TANDEM_TRUST_PROXY: `false`/empty/`0` trusts no proxy, a number trusts that many hops, and a
 * comma list trusts those proxies. `true` (trust any sender's header) is refused: it lets any
 * client pick its own address and dodge the sign-in limits.
 */
export function parseTrustProxy(raw: string): TrustProxy {
  const value = raw.trim();
  if (value === '' || value === 'false' || value === '0') return false;
  if (/^[0-9]+$/.test(value)) return Number(value);
  const entries = value
    .split(',')
    .map((entry) => entry.trim())
    .filter(Boolean);
  const bad = entries.filter((entry) => !isProxyEntry(entry));
  if (bad.length > 0 || entries.length === 0) {
    throw new Error(
      `Invalid configuration: TANDEM_TRUST_PROXY must be false, a hop count, or proxy addresses/subnets (not "${bad.join(', ') || value}").`,
    );
  }
  return entries;
}

/** Reads the JWT secret from the data dir, creating it once; it is never committed. */
function loadOrCreateSecret(dataDir: string): string {
  const file = path.join(dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid configuration: ${problems}`);
  }
  const e = parsed.data;
  const dataDir = path.resolve(e.TANDEM_DATA_DIR);
  return {
    port: e.PORT,
    databasePath: e.DATABASE_PATH === ':memory:' ? e.DATABASE_PATH : path.resolve(e.DATABASE_PATH),
    databaseUrl: e.DATABASE_URL,
    dataDir,
    demo: e.TANDEM_DEMO === '1',
    jwtSecret: e.TANDEM_JWT_SECRET ?? loadOrCreateSecret(dataDir),
    webDir: path.resolve(e.TANDEM_WEB_DIR),
    logLevel: e.TANDEM_LOG_LEVEL,
    signInLimit: e.TANDEM_SIGNIN_LIMIT,
    trustProxy: parseTrustProxy(e.TANDEM_TRUST_PROXY),
    corsOrigin: e.TANDEM_CORS_ORIGIN,
    shopName: e.TANDEM_SHOP_NAME,
    smtp: smtpConfigOf(e),
    localMailPort: e.TANDEM_LOCAL_MAIL_PORT,
    storage: storageConfigOf(e),
  };
}

/** What openDatabase opens for this configuration: the PostgreSQL URL when set, else the SQLite file. */
export function databaseTarget(config: Pick<AppConfig, 'databasePath' | 'databaseUrl'>): string {
  return config.databaseUrl ?? config.databasePath;
}

/** A short description of the database for logs (no password). */
export function databaseLabel(config: Pick<AppConfig, 'databasePath' | 'databaseUrl'>): string {
  if (!config.databaseUrl) return `SQLite ${config.databasePath}`;
  const url = new URL(config.databaseUrl);
  return `PostgreSQL ${url.hostname}${url.port ? `:${url.port}` : ''}${url.pathname}`;
}
