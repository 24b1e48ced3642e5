import path from 'node:path';
import type { AppContext } from '../context';
import { LocalDiskStorage } from './local-disk-storage';
import { S3Storage } from './s3-storage';
import type { StorageConfig } from './storage-config';
import type { FileStorage } from './storage';

const stores = new WeakMap<AppContext['config'], FileStorage>();

/** The store a configuration names: local disk under the data dir unless TANDEM_STORAGE=s3. */
export function createStorage(storage: StorageConfig | undefined, dataDir: string): FileStorage {
  if (storage?.kind === 's3') return new S3Storage(storage);
  return new LocalDiskStorage(path.join(dataDir, 'files'));
}

/** The file store of an app (one per configuration, made on first use). */
export function storageFor(ctx: AppContext): FileStorage {
  let store = stores.get(ctx.config);
  if (!store) {
    store = createStorage(ctx.config.storage, ctx.config.dataDir);
    stores.set(ctx.config, store);
  }
  return store;
}

/** At server start: an S3 store must answer for its bucket (local disk needs no check). */
export async function verifyStorage(ctx: AppContext): Promise<void> {
  const store = storageFor(ctx);
  if (store instanceof S3Storage) await store.verify();
}
