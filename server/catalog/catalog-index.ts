import type { DataSource } from 'typeorm';
import type { CatalogKind } from '../../shared/schemas/equipment';
import { ImportRecord } from '../imports/import.entity';
import { KINDS } from './catalog-kinds';
import { CatalogSearch } from './catalog-search';

type Row = Record<string, unknown> & { id: number };

/** One kind's rows in memory with their search index, valid for one catalog version. */
export interface KindIndex {
  version: string;
  rows: Row[];
  search: CatalogSearch;
}

const SEARCH_KEYS: Record<CatalogKind, { name: string; weight: number }[]> = {
  'outdoor-units': [],
  'indoor-coils': [],
  'air-handlers': [],
  'metering-devices': [],
  'rated-combinations': [
    { name: 'outdoorModel', weight: 2 },
    { name: 'indoorModel', weight: 2 },
    { name: 'airHandlerModel', weight: 1 },
    { name: 'reference', weight: 1 },
  ],
};
const EQUIPMENT_KEYS = [
  { name: 'model', weight: 3 },
  { name: 'brand', weight: 1 },
  { name: 'description', weight: 1 },
];

const cache = new WeakMap<DataSource, Map<CatalogKind, KindIndex>>();

/**
 * The catalog changes only when an import commits or reverts, so the count and latest time of those
 * is its version: checked per request (one tiny query), so every server instance sees a change.
 */
async function catalogVersion(dataSource: DataSource): Promise<string> {
  const row = await dataSource
    .getRepository(ImportRecord)
    .createQueryBuilder('i')
    .select('COUNT(i.committedAt)', 'committed')
    .addSelect('COUNT(i.revertedAt)', 'reverted')
    .addSelect('MAX(i.id)', 'last')
    .where('i.status != :preview', { preview: 'preview' })
    .getRawOne<{ committed: number; reverted: number; last: number | null }>();
  return `${row?.committed ?? 0}|${row?.reverted ?? 0}|${row?.last ?? 0}`;
}

/** The kind's index, rebuilt when an import has committed or reverted since it was built. */
export async function kindIndex(dataSource: DataSource, kind: CatalogKind): Promise<KindIndex> {
  let perSource = cache.get(dataSource);
  if (!perSource) cache.set(dataSource, (perSource = new Map()));
  const version = await catalogVersion(dataSource);
  const current = perSource.get(kind);
  if (current && current.version === version) return current;
  const rows = (await dataSource.getRepository(KINDS[kind].entity).find({ order: { id: 'ASC' } })) as unknown as Row[];
  const keys = SEARCH_KEYS[kind].length > 0 ? SEARCH_KEYS[kind] : EQUIPMENT_KEYS;
  const built = { version, rows, search: new CatalogSearch(rows, keys) };
  perSource.set(kind, built);
  return built;
}
