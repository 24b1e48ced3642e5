import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { CreateBucketCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import type { S3StorageConfig } from '../../../server/storage/storage-config';

export interface S3Fake {
  /** Settings that reach the fake's bucket, as TANDEM_S3_* would give them. */
  config: S3StorageConfig;
  /** Keys of the objects now in the bucket. */
  listKeys(): Promise<string[]>;
  close(): Promise<void>;
}

/**
 * s3rver (a local S3 fake) on a free loopback port over its own temp folder, silent, with one bucket
 * made. s3rver accepts any credentials; its documented defaults are used.
 */
export async function startS3Fake(bucket = 'tandem-test-files'): Promise<S3Fake> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: dir });
  const { port } = await server.run();
  const config: S3StorageConfig = {
    kind: 's3',
    bucket,
    region: 'us-east-1',
    endpoint: `http://127.0.0.1:${port}`,
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
  };
  const client = new S3Client({ region: config.region, endpoint: config.endpoint, forcePathStyle: true, credentials: config.credentials });
  await client.send(new CreateBucketCommand({ Bucket: bucket }));
  return {
    config,
    async listKeys() {
      const res = await client.send(new ListObjectsV2Command({ Bucket: bucket }));
      return (res.Contents ?? []).map((o) => o.Key ?? '').sort();
    },
    async close() {
      client.destroy();
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
