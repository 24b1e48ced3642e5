import { createSyncStoragePersister } from '@tanstack/query-sync-storage-persister';
import type { Query } from '@tanstack/react-query';
import type { PersistQueryClientOptions } from '@tanstack/react-query-persist-client';
import { OFFLINE_CACHE_MAX_AGE } from './stale-times';

/**
 * Query key prefixes kept on the device: catalog lists/items and the rule settings (offline checks), and
 * the records and jobs seen (a record edited with no signal still opens after a reload).
 */
const PERSISTED_PREFIXES: readonly (readonly string[])[] = [['catalog'], ['settings', 'rules'], ['systems', 'detail'], ['jobs']];

/** Bump when a persisted response shape changes, so old copies are dropped. */
const CACHE_BUSTER = 'tandem-offline-1';

/** True for a successful query whose key starts with a persisted prefix. */
export function shouldPersistQuery(query: Pick<Query, 'queryKey' | 'state'>): boolean {
  if (query.state.status !== 'success') return false;
  return PERSISTED_PREFIXES.some((prefix) => prefix.every((part, i) => query.queryKey[i] === part));
}

function webStorage(): Storage | undefined {
  try {
    return typeof window !== 'undefined' ? window.localStorage : undefined;
  } catch {
    // Private modes may refuse storage: the app then simply keeps nothing.
    return undefined;
  }
}

/** Options for PersistQueryClientProvider: localStorage on the web, nothing kept elsewhere. */
export function persistOptions(): Omit<PersistQueryClientOptions, 'queryClient'> {
  return {
    persister: createSyncStoragePersister({ storage: webStorage(), key: 'tandem-query-cache' }),
    maxAge: OFFLINE_CACHE_MAX_AGE,
    buster: CACHE_BUSTER,
    dehydrateOptions: { shouldDehydrateQuery: shouldPersistQuery },
  };
}
