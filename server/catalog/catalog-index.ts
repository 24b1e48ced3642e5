import type { DataSource } from 'typeorm';
import type { CatalogKind } from '../../shared/schemas/equipment';
import { KINDS } from './catalog-kinds';
import { catalogVersions, forgetCatalogVersions } from './catalog-version';
import { CatalogSearch } from './catalog-search';

type Row = Record<string, unknown> & { id: number };

/** One kind's rows in memory with their search index, valid for one catalog version. */
export interface KindIndex {
  version: string;
  rows: Row[];
  /** Rows by id, for resolving `{ id }` parts without a query. */
  byId: Map<number, Row>;
  /** Rated combinations grouped by normalised outdoor model (empty for other kinds). */
  byOutdoorModel: Map<string, Row[]>;
  search: CatalogSearch;
}

function groupByOutdoor(rows: Row[]): Map<string, Row[]> {
  const map = new Map<string, Row[]>();
  for (const row of rows) {
    const key = row.normalizedOutdoorModel as string | undefined;
    if (!key) continue;
    const list = map.get(key);
    if (list) list.push(row);
    else map.set(key, [row]);
  }
  return map;
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
 * A kind changes only when an import of that kind commits or reverts, which bumps its row in
 * catalog_versions in the same transaction: a price commit (the frequent one) never rebuilds the
 * equipment indexes the checks read, and every server instance sees a change on its next request.
 */
async function currentVersion(dataSource: DataSource, kind: CatalogKind): Promise<string> {
  return String((await catalogVersions(dataSource)).get(kind) ?? 0);
}

/** Forgets the version read in flight: an import committed or reverted in this process is seen at once. */
export function invalidateCatalogIndex(dataSource: DataSource): void {
  forgetCatalogVersions(dataSource);
}

/** Forgets every cached index and version: after a write that rolled back, nothing cached is trusted. */
export function dropCatalogIndex(dataSource: DataSource): void {
  forgetCatalogVersions(dataSource);
  cache.delete(dataSource);
}

/** The kind's index, rebuilt when an import has committed or reverted since it was built. */
export async function kindIndex(dataSource: DataSource, kind: CatalogKind): Promise<KindIndex> {
  let perSource = cache.get(dataSource);
  if (!perSource) cache.set(dataSource, (perSource = new Map()));
  const version = await currentVersion(dataSource, kind);
  const current = perSource.get(kind);
  if (current && current.version === version) return current;
  const rows = (await dataSource.getRepository(KINDS[kind].entity).find({ order: { id: 'ASC' } })) as unknown as Row[];
  const keys = SEARCH_KEYS[kind].length > 0 ? SEARCH_KEYS[kind] : EQUIPMENT_KEYS;
  const built = { version, rows, byId: new Map(rows.map((r) => [r.id, r])), byOutdoorModel: kind === 'rated-combinations' ? groupByOutdoor(rows) : new Map(), search: new CatalogSearch(rows, keys) };
  perSource.set(kind, built);
  return built;
}
