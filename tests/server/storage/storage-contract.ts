import { randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { STORAGE_KEY_PATTERN, type FileStorage } from '../../../server/storage/storage';

/**
 * The one contract every FileStorage backend meets (server/storage/storage.ts). Each backend's test
 * file calls this with its own store, so local disk and S3 answer the same questions.
 */
export function fileStorageContract(name: string, store: () => FileStorage): void {
  describe(`${name}: FileStorage contract`, () => {
    it('when bytes are put, then the key is 32 lowercase hex characters (128 random bits) and get returns the same bytes', async () => {
      const data = Buffer.from('nameplate photo bytes');
      const key = await store().put(data);
      expect(key).toMatch(STORAGE_KEY_PATTERN);
      expect(key).toMatch(/^[0-9a-f]{32}$/);
      const got = await store().get(key);
      expect(got).not.toBeNull();
      expect(Buffer.compare(got as Buffer, data)).toBe(0);
    });

    it('when every byte value and a 10 MB random buffer are put, then both come back byte for byte', async () => {
      const allBytes = Buffer.from(Array.from({ length: 256 }, (_, i) => i));
      const big = randomBytes(10 * 1024 * 1024);
      const [smallKey, bigKey] = [await store().put(allBytes), await store().put(big)];
      const small = await store().get(smallKey);
      expect(Buffer.compare(small as Buffer, allBytes)).toBe(0);
      const back = await store().get(bigKey);
      expect(back?.length).toBe(10 * 1024 * 1024);
      expect(Buffer.compare(back as Buffer, big)).toBe(0);
    });

    it('when an empty buffer is put, then it comes back empty (not null)', async () => {
      const key = await store().put(Buffer.alloc(0));
      const got = await store().get(key);
      expect(got).not.toBeNull();
      expect(got?.length).toBe(0);
    });

    it('when the same bytes are put twice, then they get two different keys and both stay readable', async () => {
      const data = Buffer.from('same bytes');
      const a = await store().put(data);
      const b = await store().put(data);
      expect(a).not.toBe(b);
      await store().delete(a);
      expect(await store().get(a)).toBeNull();
      expect((await store().get(b))?.toString()).toBe('same bytes');
    });

    it('when a well-formed key was never stored, then get answers null', async () => {
      expect(await store().get(randomBytes(16).toString('hex'))).toBeNull();
    });

    it('when a key is deleted, then get answers null, and deleting it again or deleting a never-stored key succeeds', async () => {
      const key = await store().put(Buffer.from('to delete'));
      await store().delete(key);
      expect(await store().get(key)).toBeNull();
      await expect(store().delete(key)).resolves.toBeUndefined();
      await expect(store().delete(randomBytes(16).toString('hex'))).resolves.toBeUndefined();
    });

    it('when a key is not store-made (traversal, upper case, wrong length, a prefix), then get and delete refuse it', async () => {
      const key = await store().put(Buffer.from('kept'));
      for (const bad of ['../jwt-secret', `../${key}`, key.toUpperCase(), key.slice(1), `${key}0`, `files/${key}`, '']) {
        await expect(store().get(bad)).rejects.toThrow(/invalid storage key/);
        await expect(store().delete(bad)).rejects.toThrow(/invalid storage key/);
      }
      expect((await store().get(key))?.toString()).toBe('kept');
    });
  });
}
