import type { EntityManager } from 'typeorm';
import type { CatalogKind, ImportKind } from '../../shared/schemas/equipment';
import { EQUIPMENT_KINDS, KINDS } from '../catalog/catalog-kinds';
import { sqliteHandle } from '../db/sqlite-handle';
import { normalizedModelOfPriceKey, type ParsedRow } from './import-parse';

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
/** Keys per PostgreSQL lookup statement: one round trip for many rows, bounded in size. */
const KEYS_PER_QUERY = 5000;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

const PRICE_COLUMNS = ['id', 'normalizedModel', 'effectiveFrom', 'priceCents', 'currency', 'description', 'model', 'importId'] as const;
const PRICE_SELECT = PRICE_COLUMNS.map((c) => `"${c}"`).join(', ');

/** A distributor's stored entry under a price row's key, or undefined. */
type StoredPrice = (row: ParsedRow) => Row | undefined;
const nothingStored: StoredPrice = () => undefined;

/**
 * Lookups for planning a price file, by the file's own keys only: never the distributor's whole
 * price history, which only grows (read whole, it held the event loop longer with every commit,
 * issue 8 fault 6). A distributor with nothing stored yet (its first file) needs no lookup at all;
 * that is settled once, before anything of the file is written.
 * SQLite: a point lookup on the unique index per row, synchronous (no promise per row).
 * PostgreSQL: the keys go in batches as two arrays joined to the unique index, one round trip each.
 */
async function storedPricesOf(manager: EntityManager, distributorId: number | null): Promise<(rows: ParsedRow[]) => Promise<StoredPrice>> {
  const none = () => Promise.resolve(nothingStored);
  if (distributorId === null) return none;
  const raw = sqliteHandle(manager);
  if (raw) {
    if (raw.prepare('SELECT 1 FROM "price_entries" WHERE "distributorId" = ? LIMIT 1').get(distributorId) === undefined) return none;
    const entry = raw.prepare(`SELECT ${PRICE_SELECT} FROM "price_entries" WHERE "distributorId" = ? AND "normalizedModel" = ? AND "effectiveFrom" = ?`);
    const stored: StoredPrice = (row) => entry.get(distributorId, normalizedModelOfPriceKey(row.key), String(row.values.effectiveFrom)) as Row | undefined;
    return () => Promise.resolve(stored);
  }
  const any = (await manager.query('SELECT 1 FROM "price_entries" WHERE "distributorId" = $1 LIMIT 1', [distributorId])) as unknown[];
  if (any.length === 0) return none;
  return async (rows) => {
    const byKey = new Map<string, Row>();
    for (let i = 0; i < rows.length; i += KEYS_PER_QUERY) {
      const batch = rows.slice(i, i + KEYS_PER_QUERY);
      const found = (await manager.query(
        `SELECT ${PRICE_COLUMNS.map((c) => `p."${c}"`).join(', ')} FROM "price_entries" p ` +
          'JOIN unnest($2::text[], $3::text[]) AS k("normalizedModel", "effectiveFrom") ' +
          'ON p."normalizedModel" = k."normalizedModel" AND p."effectiveFrom" = k."effectiveFrom" WHERE p."distributorId" = $1',
        [distributorId, batch.map((r) => normalizedModelOfPriceKey(r.key)), batch.map((r) => String(r.values.effectiveFrom))],
      )) as Row[];
      for (const e of found) byKey.set(`${String(e.normalizedModel)}|${String(e.effectiveFrom)}`, e);
    }
    return (row) => byKey.get(row.key);
  };
}

/** The catalog's models (every equipment kind), read once per file: bounded by the catalog, unlike the price history. */
async function catalogModels(manager: EntityManager): Promise<Set<string>> {
  const models = new Set<string>();
  const raw = sqliteHandle(manager);
  for (const kind of EQUIPMENT_KINDS) {
    const table = KINDS[kind].table;
    const found = raw
      ? (raw.prepare(`SELECT "normalizedModel" FROM "${table}"`).pluck().all() as string[])
      : ((await manager.query(`SELECT "normalizedModel" FROM "${table}"`)) as { normalizedModel: string }[]).map((r) => r.normalizedModel);
    for (const model of found) models.add(model);
  }
  return models;
}

/** Plans price rows for one distributor; a file's rows may come a part at a time (see pricePlanner). */
export type PricePlanner = (rows: ParsedRow[]) => Promise<ImportPlan>;

/**
 * A planner for one distributor's price rows (null: not yet created, so nothing exists). What it reads
 * once (the catalog's models, whether the distributor has any price) is read here, before the caller
 * writes any of the file: parts planned later see the tables as they were then, less nothing of the
 * file itself, since a file's keys are unique. A blank description keeps the stored one, so it is not a
 * change. Yields to the event loop every LOOKUPS_PER_SLICE rows so checks keep being answered.
 */
export async function pricePlanner(manager: EntityManager, distributorId: number | null): Promise<PricePlanner> {
  const storedFor = await storedPricesOf(manager, distributorId);
  const models = await catalogModels(manager);
  return async (rows) => {
    const stored = await storedFor(rows);
    const plan: ImportPlan = { kind: 'prices', inserts: [], updates: [], unchanged: 0, unmatched: 0 };
    for (let i = 0; i < rows.length; i++) {
      if (i > 0 && i % LOOKUPS_PER_SLICE === 0) await nextTurn();
      const row = rows[i];
      const v = row.values;
      if (!models.has(normalizedModelOfPriceKey(row.key))) plan.unmatched++;
      const found = stored(row);
      if (!found) plan.inserts.push(row);
      else if (found.priceCents === v.price && found.currency === v.currency && (v.description === undefined || same(found.description, v.description)))
        plan.unchanged++;
      else plan.updates.push({ row, existing: found });
    }
    return plan;
  };
}

/** Plans a whole price file for one distributor (null: not yet created, so nothing exists). */
export async function planPrices(manager: EntityManager, distributorId: number | null, rows: ParsedRow[]): Promise<ImportPlan> {
  return (await pricePlanner(manager, distributorId))(rows);
}
