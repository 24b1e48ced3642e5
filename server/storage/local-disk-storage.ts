import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { STORAGE_KEY_PATTERN, type FileStorage } from './storage';

/**
 * Files under one folder of the data dir, named by random key in two-character shards. A key that
 * is not exactly a store-made key is refused before any path is built, so no traversal is possible.
 */
export class LocalDiskStorage implements FileStorage {
  constructor(private readonly rootDir: string) {}

  async put(data: Buffer): Promise<string> {
    const key = randomBytes(16).toString('hex');
    const file = this.pathOf(key);
    await mkdir(path.dirname(file), { recursive: true });
    // 'wx': never overwrite (a collision of 128 random bits would be a bug, not a save).
    await writeFile(file, data, { flag: 'wx', mode: 0o600 });
    return key;
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      return await readFile(this.pathOf(key));
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  private pathOf(key: string): string {
    if (!STORAGE_KEY_PATTERN.test(key)) throw new Error('invalid storage key');
    return path.join(this.rootDir, key.slice(0, 2), key);
  }
}
