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
const versions = new WeakMap<DataSource, { at: number; byKind: Promise<Map<string, string>> }>();

/**
 * A kind changes only when an import of that kind commits or reverts, so the count and latest id of
 * those is its version: a price commit (the frequent one) never rebuilds the equipment indexes the
 * checks read. Read in one small grouped query, so every server instance sees a change.
 */
async function catalogVersions(dataSource: DataSource): Promise<Map<string, string>> {
  const rows = await dataSource
    .getRepository(ImportRecord)
    .createQueryBuilder('i')
    .select('i.kind', 'kind')
    .addSelect('COUNT(i.committedAt)', 'committed')
    .addSelect('COUNT(i.revertedAt)', 'reverted')
    .addSelect('MAX(i.id)', 'last')
    .where('i.status != :preview', { preview: 'preview' })
    .groupBy('i.kind')
    .getRawMany<{ kind: string; committed: number; reverted: number; last: number | null }>();
  return new Map(rows.map((r) => [r.kind, `${r.committed}|${r.reverted}|${r.last ?? 0}`]));
}

/** The kind's catalog version, read at most every VERSION_TTL_MS: a check asks for several kinds at once. */
async function currentVersion(dataSource: DataSource, kind: CatalogKind): Promise<string> {
  const now = Date.now();
  let known = versions.get(dataSource);
  if (!known || now - known.at >= VERSION_TTL_MS) {
    known = { at: now, byKind: catalogVersions(dataSource) };
    versions.set(dataSource, known);
    known.byKind.catch(() => versions.delete(dataSource));
  }
  return (await known.byKind).get(kind) ?? '0|0|0';
}

/** Forgets the cached versions: an import committed or reverted in this process is seen at once. */
export function invalidateCatalogIndex(dataSource: DataSource): void {
  versions.delete(dataSource);
}

/** Forgets every cached index and version: after a write that rolled back, nothing cached is trusted. */
export function dropCatalogIndex(dataSource: DataSource): void {
  versions.delete(dataSource);
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
