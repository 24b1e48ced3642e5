import path from 'node:path';
import type { AppContext } from '../context';
import { LocalDiskStorage } from './local-disk-storage';
import type { FileStorage } from './storage';

const stores = new WeakMap<AppContext['config'], FileStorage>();

/** The file store of an app (local disk under the data dir; one per configuration, made on first use). */
export function storageFor(ctx: AppContext): FileStorage {
  let store = stores.get(ctx.config);
  if (!store) {
    store = new LocalDiskStorage(path.join(ctx.config.dataDir, 'files'));
    stores.set(ctx.config, store);
  }
  return store;
}
