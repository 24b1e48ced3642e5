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
/** How long a read catalog version is trusted before asking the database again (other instances' imports). */
const VERSION_TTL_MS = 250;
const versions = new WeakMap<DataSource, { at: number; version: Promise<string> }>();

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

/** The catalog version, read at most every VERSION_TTL_MS: a check asks for several kinds at once. */
function currentVersion(dataSource: DataSource): Promise<string> {
  const now = Date.now();
  const known = versions.get(dataSource);
  if (known && now - known.at < VERSION_TTL_MS) return known.version;
  const version = catalogVersion(dataSource);
  versions.set(dataSource, { at: now, version });
  version.catch(() => versions.delete(dataSource));
  return version;
}

/** Forgets the cached version: an import committed or reverted in this process is seen at once. */
export function invalidateCatalogIndex(dataSource: DataSource): void {
  versions.delete(dataSource);
}

/** The kind's index, rebuilt when an import has committed or reverted since it was built. */
export async function kindIndex(dataSource: DataSource, kind: CatalogKind): Promise<KindIndex> {
  let perSource = cache.get(dataSource);
  if (!perSource) cache.set(dataSource, (perSource = new Map()));
  const version = await currentVersion(dataSource);
  const current = perSource.get(kind);
  if (current && current.version === version) return current;
  const rows = (await dataSource.getRepository(KINDS[kind].entity).find({ order: { id: 'ASC' } })) as unknown as Row[];
  const keys = SEARCH_KEYS[kind].length > 0 ? SEARCH_KEYS[kind] : EQUIPMENT_KEYS;
  const built = { version, rows, byId: new Map(rows.map((r) => [r.id, r])), byOutdoorModel: kind === 'rated-combinations' ? groupByOutdoor(rows) : new Map(), search: new CatalogSearch(rows, keys) };
  perSource.set(kind, built);
  return built;
}
