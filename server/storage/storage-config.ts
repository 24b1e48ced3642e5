import { z } from 'zod';

/** Object-store settings as read from the environment (validated in server/env.ts, the one reader of process.env). */
export const StorageEnvShape = {
  /** `local`: files under the data dir (the default); `s3`: an S3-compatible object store. */
  TANDEM_STORAGE: z.enum(['local', 's3']).default('local'),
  /** S3 bucket rules: 3–63 lowercase letters, digits, dots and hyphens, starting and ending with a letter or digit. */
  TANDEM_S3_BUCKET: z
    .string()
    .trim()
    .regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, 'must be a valid bucket name (3–63 lowercase letters, digits, dots, hyphens)')
    .optional(),
  /** Only for a store other than AWS itself (a self-hosted store, another cloud's S3-compatible API). */
  TANDEM_S3_ENDPOINT: z.string().trim().url().optional(),
  TANDEM_S3_REGION: z.string().trim().min(1).max(64).optional(),
  TANDEM_S3_ACCESS_KEY_ID: z.string().trim().min(1).max(256).optional(),
  TANDEM_S3_SECRET_ACCESS_KEY: z.string().min(1).max(1024).optional(),
  /** `1`/`true`: bucket in the path (http://host/bucket/key), which most self-hosted stores need. */
  TANDEM_S3_FORCE_PATH_STYLE: z.enum(['0', '1', 'true', 'false']).default('0'),
};

export interface S3StorageConfig {
  kind: 's3';
  bucket: string;
  region: string;
  endpoint?: string;
  forcePathStyle: boolean;
  /** Absent: the AWS SDK's default credential chain (e.g. an instance or task role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

export type StorageConfig = { kind: 'local' } | S3StorageConfig;

type StorageEnv = z.infer<z.ZodObject<typeof StorageEnvShape>>;

/**
 * Where files go. `s3` needs a bucket and a region; the key id and secret go together (neither
 * means the SDK's own credential chain). S3 settings without TANDEM_STORAGE=s3 are refused so a
 * half-done switch does not quietly keep writing to local disk.
 */
export function storageConfigOf(e: StorageEnv): StorageConfig {
  if ((e.TANDEM_S3_ACCESS_KEY_ID === undefined) !== (e.TANDEM_S3_SECRET_ACCESS_KEY === undefined)) {
    throw new Error('Invalid configuration: TANDEM_S3_ACCESS_KEY_ID and TANDEM_S3_SECRET_ACCESS_KEY go together');
  }
  if (e.TANDEM_STORAGE === 'local') {
    const stray = (['TANDEM_S3_BUCKET', 'TANDEM_S3_ENDPOINT', 'TANDEM_S3_REGION', 'TANDEM_S3_ACCESS_KEY_ID'] as const).filter(
      (name) => e[name] !== undefined,
    );
    if (stray.length > 0) {
      throw new Error(`Invalid configuration: ${stray.join(', ')} set but TANDEM_STORAGE is not "s3" (set TANDEM_STORAGE=s3 to use them)`);
    }
    return { kind: 'local' };
  }
  const bucket = e.TANDEM_S3_BUCKET;
  const region = e.TANDEM_S3_REGION;
  if (bucket === undefined || region === undefined) {
    const missing = [bucket === undefined && 'TANDEM_S3_BUCKET', region === undefined && 'TANDEM_S3_REGION'].filter(Boolean);
    throw new Error(`Invalid configuration: TANDEM_STORAGE=s3 needs ${missing.join(' and ')}`);
  }
  return {
    kind: 's3',
    bucket,
    region,
    endpoint: e.TANDEM_S3_ENDPOINT,
    forcePathStyle: e.TANDEM_S3_FORCE_PATH_STYLE === '1' || e.TANDEM_S3_FORCE_PATH_STYLE === 'true',
    credentials:
      e.TANDEM_S3_ACCESS_KEY_ID && e.TANDEM_S3_SECRET_ACCESS_KEY
        ? { accessKeyId: e.TANDEM_S3_ACCESS_KEY_ID, secretAccessKey: e.TANDEM_S3_SECRET_ACCESS_KEY }
        : undefined,
  };
}
