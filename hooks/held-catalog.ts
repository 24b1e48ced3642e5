import type { QueryClient } from '@tanstack/react-query';
import Fuse from 'fuse.js';
import type { CatalogKind } from '@/shared/schemas/equipment';
import { catalogKeys, type CatalogDetail, type CatalogEntry, type CatalogPage } from './use-catalog';

/**
 * The parts this phone already holds: every catalog list page and item detail in the (persisted)
 * query cache, one entry per id. This is what search answers from with no signal.
 */
export function heldCatalogItems(client: QueryClient, kind: CatalogKind): CatalogEntry[] {
  const byId = new Map<number, CatalogEntry>();
  for (const [, data] of client.getQueriesData<CatalogPage | CatalogDetail>({ queryKey: catalogKeys.kind(kind) })) {
    if (!data) continue;
    if ('items' in data && Array.isArray(data.items)) for (const item of data.items) byId.set(item.id, item);
    if ('item' in data && data.item) byId.set(data.item.id, data.item);
  }
  return [...byId.values()];
}

export interface HeldFilters {
  refrigerant?: string;
  /** Nominal size in tons: an outdoor unit's size, or within a coil's or handler's range. */
  tons?: number;
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Any = Record<string, any>;

function passes(item: Any, filters: HeldFilters): boolean {
  if (filters.refrigerant) {
    const refs: unknown[] = [item.refrigerant, ...(Array.isArray(item.refrigerants) ? item.refrigerants : [])];
    if (!refs.includes(filters.refrigerant)) return false;
  }
  if (filters.tons != null) {
    if (item.nominalTons != null) return item.nominalTons === filters.tons;
    if (item.minTons != null && filters.tons < item.minTons) return false;
    if (item.maxTons != null && filters.tons > item.maxTons) return false;
    if (item.minTons == null && item.maxTons == null) return false;
  }
  return true;
}

const KEYS = [
  { name: 'model', weight: 3 },
  { name: 'outdoorModel', weight: 2 },
  { name: 'indoorModel', weight: 2 },
  { name: 'brand', weight: 1 },
  { name: 'refrigerant', weight: 1 },
  { name: 'refrigerants', weight: 1 },
  { name: 'description', weight: 0.5 },
];

const squash = (s: string) => s.toLowerCase().replace(/[\s\-./]/g, '');

/**
 * Held parts matching the words typed (all of them when none) and the filters, best first: parts
 * whose model holds the words come first, then fuse.js's fuzzy matches (a typo still finds its part).
 */
export function searchHeldItems(items: CatalogEntry[], q: string, filters: HeldFilters = {}): CatalogEntry[] {
  const pool = items.filter((item) => passes(item as Any, filters));
  const term = q.trim();
  if (!term) return pool.sort((a, b) => modelOf(a).localeCompare(modelOf(b)));
  const literal = pool.filter((item) => squash(KEYS.map((k) => String((item as Any)[k.name] ?? '')).join(' ')).includes(squash(term)));
  const fuzzy = new Fuse(pool, { keys: KEYS, threshold: 0.4, ignoreLocation: true }).search(term).map((r) => r.item);
  const seen = new Set(literal.map((i) => i.id));
  return [...literal, ...fuzzy.filter((i) => !seen.has(i.id))];
}

function modelOf(item: CatalogEntry): string {
  const e = item as Any;
  return String(e.model ?? `${e.outdoorModel ?? ''} ${e.indoorModel ?? ''}`);
}
