import type { CatalogKind, RatedCombinationSpec } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import type { AppContext } from '../context';
import { notFound } from '../lib/errors';
import { kindIndex } from './catalog-index';
import { KINDS } from './catalog-kinds';
import { toItem, type EntityByKind } from './catalog-specs';
import { currentPrices, type CurrentPrice } from './prices.service';
import { RatedCombination } from './rated-combination.entity';

export interface CatalogQuery {
  q?: string;
  refrigerant?: string;
  tons?: number;
  page: number;
  pageSize: number;
}

type Row = Record<string, unknown>;
const TONS_EPSILON = 0.01;

/** Refrigerant filter: the outdoor unit's or kit's refrigerant, or the coil's / air handler's listing. */
function hasRefrigerant(kind: CatalogKind, row: Row, refrigerant: string): boolean {
  if (kind === 'outdoor-units' || kind === 'metering-devices') return row.refrigerant === refrigerant;
  if (kind === 'indoor-coils' || kind === 'air-handlers') return Array.isArray(row.refrigerants) && row.refrigerants.includes(refrigerant);
  return true;
}

/** Tons filter: an outdoor unit's nominal size equals it; a coil, air handler or kit covers it. */
function coversTons(kind: CatalogKind, row: Row, tons: number): boolean {
  if (kind === 'outdoor-units') return Math.abs(Number(row.nominalTons) - tons) < TONS_EPSILON;
  if (kind === 'rated-combinations') return true;
  const min = row.minTons as number | null;
  const max = row.maxTons as number | null;
  return (min == null || min <= tons + TONS_EPSILON) && (max == null || tons <= max + TONS_EPSILON);
}

/** One page of a kind, fuzzy-searched (best match first) or by model, then filtered. */
export async function listCatalog(ctx: AppContext, kind: CatalogKind, query: CatalogQuery) {
  const index = await kindIndex(ctx.dataSource, kind);
  const q = query.q?.trim();
  let rows: Row[] = q ? index.search.search(q) : [...index.rows].sort(byLabel(kind));
  if (query.refrigerant) rows = rows.filter((r) => hasRefrigerant(kind, r, query.refrigerant!));
  if (query.tons !== undefined) rows = rows.filter((r) => coversTons(kind, r, query.tons!));
  const start = (query.page - 1) * query.pageSize;
  const items = rows.slice(start, start + query.pageSize).map((r) => toItem(kind, r as unknown as EntityByKind[typeof kind]));
  return { items, total: rows.length, page: query.page, pageSize: query.pageSize };
}

const byLabel = (kind: CatalogKind) => {
  const key = kind === 'rated-combinations' ? 'outdoorModel' : 'model';
  return (a: Row, b: Row) => String(a[key]).localeCompare(String(b[key])) || Number(a.id) - Number(b.id);
};

/** Which rated-combination column names an item of this kind. */
const COMBINATION_COLUMN: Partial<Record<CatalogKind, keyof RatedCombination>> = {
  'outdoor-units': 'normalizedOutdoorModel',
  'indoor-coils': 'normalizedIndoorModel',
  'air-handlers': 'normalizedAirHandlerModel',
};

/** One item with its current price per distributor and the rated combinations that include it. */
export async function getCatalogDetail(ctx: AppContext, kind: CatalogKind, id: number) {
  const repo = ctx.dataSource.getRepository(KINDS[kind].entity);
  const entity = (await repo.findOneBy({ id })) as unknown as Row | null;
  if (!entity) throw notFound('Catalog item');
  const item = toItem(kind, entity as unknown as EntityByKind[typeof kind]);
  let prices: CurrentPrice[] = [];
  let ratedCombinations: (RatedCombinationSpec & { id: number })[] = [];
  const column = COMBINATION_COLUMN[kind];
  if (kind !== 'rated-combinations') prices = await currentPrices(ctx, String(entity.model));
  if (column) {
    const combos = await ctx.dataSource
      .getRepository(RatedCombination)
      .find({ where: { [column]: normalizeModel(String(entity.model)) }, order: { seer2: 'DESC', id: 'ASC' } });
    ratedCombinations = combos.map((c) => toItem('rated-combinations', c));
  }
  return { item, prices, ratedCombinations };
}

