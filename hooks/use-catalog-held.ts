import { useQueryClient } from '@tanstack/react-query';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { heldCatalogItems, searchHeldItems, type HeldFilters } from './held-catalog';
import type { CatalogEntry } from './use-catalog';

export interface HeldSearch {
  /** Matches among the held parts, best first. */
  items: CatalogEntry[];
  /** How many parts of this kind the phone holds in all. */
  heldCount: number;
}

/** Search over the parts saved on this phone (used with no signal); cheap enough to run per render. */
export function useHeldCatalogSearch(kind: CatalogKind, q: string, filters: HeldFilters = {}, enabled = true): HeldSearch {
  const client = useQueryClient();
  if (!enabled) return { items: [], heldCount: 0 };
  const held = heldCatalogItems(client, kind);
  return { items: searchHeldItems(held, q, filters), heldCount: held.length };
}
