import type { EntityManager } from 'typeorm';
import type { CatalogKind, ImportKind } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import { EQUIPMENT_KINDS, KINDS } from '../catalog/catalog-kinds';
import { sqliteHandle } from '../db/sqlite-handle';
import type { ParsedRow } from './import-parse';

type Row = Record<string, unknown> & { id: number; importId: number | null };

/** What a commit would do with a file's valid rows against the tables as they are now. */
export interface ImportPlan {
  kind: ImportKind;
  inserts: ParsedRow[];
  updates: { row: ParsedRow; existing: Row }[];
  unchanged: number;
  unmatched: number;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** Plans a catalog import: a row is new, or changes an existing one, or leaves it as it is (by normalised key). */
export async function planCatalog(manager: EntityManager, kind: CatalogKind, rows: ParsedRow[]): Promise<ImportPlan> {
  const info = KINDS[kind];
  const existing = (await manager.getRepository(info.entity).find()) as unknown as Row[];
  const byKey = new Map(existing.map((e) => [Object.values(info.keyColumns(e)).join('|'), e]));
  const plan: ImportPlan = { kind, inserts: [], updates: [], unchanged: 0, unmatched: 0 };
  for (const row of rows) {
    const found = byKey.get(row.key);
    if (!found) plan.inserts.push(row);
    else if (Object.entries(row.values).every(([f, v]) => same(found[f], v))) plan.unchanged++;
    else plan.updates.push({ row, existing: found });
  }
  return plan;
}

/** Rows looked up between two yields to the event loop while a price file is planned (a few ms of work). */
const LOOKUPS_PER_SLICE = 1000;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

const PRICE_COLUMNS = 'id, normalizedModel, effectiveFrom, priceCents, currency, description, model, importId';

/**
 * Lookups for planning a price file: the distributor's stored entry under a row's key (a point
 * lookup on the unique index for each of the file's rows, rather than reading the distributor's
 * whole price history, which only grows: read whole, it held the event loop longer with every
 * commit, issue 8 fault 6) and whether a model is in the catalog (its models read once per file).
 */
interface PriceLookups {
  existing(normalizedModel: string, effectiveFrom: string): Row | undefined | Promise<Row | undefined>;
  inCatalog(normalizedModel: string): boolean | Promise<boolean>;
}

function priceLookups(manager: EntityManager, distributorId: number | null): PriceLookups {
  const raw = sqliteHandle(manager);
  const tables = EQUIPMENT_KINDS.map((kind) => KINDS[kind].table);
  if (raw) {
    const entry = raw.prepare(`SELECT ${PRICE_COLUMNS} FROM price_entries WHERE distributorId = ? AND normalizedModel = ? AND effectiveFrom = ?`);
    // The catalog's models, read once per file (bounded by the catalog, unlike the price history).
    const models = new Set<string>();
    for (const table of tables) {
      for (const model of raw.prepare(`SELECT normalizedModel FROM ${table}`).pluck().all()) models.add(model as string);
    }
    // Synchronous on SQLite: no promise per row for a 100,000-row file.
    return {
      existing: (model, from) => (distributorId === null ? undefined : (entry.get(distributorId, model, from) as Row | undefined)),
      inCatalog: (model) => models.has(model),
    };
  }
  // Other drivers: the same lookups through the query builder (its parameters suit every driver).
  return {
    existing: async (model, from) =>
      distributorId === null
        ? undefined
        : ((await manager
            .createQueryBuilder()
            .select(PRICE_COLUMNS.split(', ').map((c) => `p.${c} AS ${c}`))
            .from('price_entries', 'p')
            .where('p.distributorId = :distributorId AND p.normalizedModel = :model AND p.effectiveFrom = :from', { distributorId, model, from })
            .getRawOne<Row>()) ?? undefined),
    inCatalog: async (model) => {
      for (const table of tables) {
        if (await manager.createQueryBuilder().select('e.id').from(table, 'e').where('e.normalizedModel = :model', { model }).getRawOne()) return true;
      }
      return false;
    },
  };
}

/**
 * Plans a price import for one distributor (null: not yet created, so nothing exists). A blank
 * description keeps the stored one, so it is not a change. Yields to the event loop every
 * LOOKUPS_PER_SLICE rows so checks keep being answered while a large file is planned.
 */
export async function planPrices(manager: EntityManager, distributorId: number | null, rows: ParsedRow[]): Promise<ImportPlan> {
  const lookups = priceLookups(manager, distributorId);
  const plan: ImportPlan = { kind: 'prices', inserts: [], updates: [], unchanged: 0, unmatched: 0 };
  for (let i = 0; i < rows.length; i++) {
    if (i > 0 && i % LOOKUPS_PER_SLICE === 0) await nextTurn();
    const row = rows[i];
    const v = row.values;
    const model = normalizeModel(String(v.model));
    const listed = lookups.inCatalog(model);
    if (!(listed instanceof Promise ? await listed : listed)) plan.unmatched++;
    const stored = lookups.existing(model, String(v.effectiveFrom));
    const found = stored instanceof Promise ? await stored : stored;
    if (!found) plan.inserts.push(row);
    else if (found.priceCents === v.price && found.currency === v.currency && (v.description === undefined || same(found.description, v.description)))
      plan.unchanged++;
    else plan.updates.push({ row, existing: found });
  }
  return plan;
}
