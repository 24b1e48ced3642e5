import { useQuery } from '@tanstack/react-query';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { catalogListQuery } from './use-catalog';
import { OFFLINE_CACHE_MAX_AGE } from './stale-times';

/** Results a part picker shows per search (a phone screen's worth). */
export const LOOKUP_PAGE_SIZE = 8;

/**
 * Catalog search as the tech types (GET /api/catalog/:kind?q=). The query lives under ['catalog'],
 * which the persister keeps, so parts searched earlier are still there with no signal.
 */
export function useCatalogLookup(kind: CatalogKind, q: string) {
  const term = q.trim();
  return useQuery({
    ...catalogListQuery(kind, { q: term, page: 1, pageSize: LOOKUP_PAGE_SIZE }),
    enabled: term.length >= 2,
    gcTime: OFFLINE_CACHE_MAX_AGE,
  });
}
