import { randomBytes } from 'node:crypto';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { S3StorageConfig } from './storage-config';
import { STORAGE_KEY_PATTERN, type FileStorage } from './storage';

/**
 * Files as objects in one bucket of an S3-compatible store, named by the same random 128-bit hex
 * keys the local disk store makes. Any key that is not store-made is refused before a request is
 * built, so a caller can never reach another object in the bucket.
 */
export class S3Storage implements FileStorage {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(config: S3StorageConfig) {
    this.bucket = config.bucket;
    this.client = new S3Client({
      region: config.region,
      endpoint: config.endpoint,
      forcePathStyle: config.forcePathStyle,
      credentials: config.credentials,
      // A store that hangs must fail a request, not hold it forever.
      requestHandler: { connectionTimeout: 5_000, requestTimeout: 60_000 },
      // Many S3-compatible stores reject the newer default CRC checksums; send them only where
      // S3 requires them. Photo rows keep their own sha256 either way.
      ...(config.endpoint ? { requestChecksumCalculation: 'WHEN_REQUIRED', responseChecksumValidation: 'WHEN_REQUIRED' } : {}),
    });
  }

  async put(data: Buffer): Promise<string> {
    const key = randomBytes(16).toString('hex');
    // No overwrite guard: conditional PUT is not supported by every S3-compatible store, and a
    // collision of 128 random bits is not a case to design for.
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: data, ContentLength: data.length }));
    return key;
  }

  async get(key: string): Promise<Buffer | null> {
    const objectKey = this.objectKey(key);
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: objectKey }));
      if (!res.Body) return null;
      return Buffer.from(await res.Body.transformToByteArray());
    } catch (err) {
      if (err instanceof NoSuchKey || (err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404)) return null;
      throw err;
    }
  }

  /** S3's DELETE answers success for a missing key, so deleting twice is harmless. */
  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
  }

  /**
   * Fails with a message an operator can act on when the bucket cannot be reached (wrong name,
   * endpoint, region or keys), so a bad setting stops the server at start, not at the first photo.
   */
  async verify(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch (err) {
      const status = err instanceof S3ServiceException ? ` (HTTP ${err.$metadata.httpStatusCode ?? '?'})` : '';
      const reason = err instanceof Error ? `${err.name}${status}: ${err.message}` : String(err);
      throw new Error(`Object store: bucket "${this.bucket}" is not reachable with the TANDEM_S3_* settings — ${reason}`);
    }
  }

  /** Closes the client's sockets (tests and shutdown). */
  close(): void {
    this.client.destroy();
  }

  private objectKey(key: string): string {
    if (!STORAGE_KEY_PATTERN.test(key)) throw new Error('invalid storage key');
    return key;
  }
}
