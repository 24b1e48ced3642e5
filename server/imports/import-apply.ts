import type { EntityManager } from 'typeorm';
import type { CatalogKind } from '../../shared/schemas/equipment';
import { KINDS } from '../catalog/catalog-kinds';
import { PriceEntry } from '../catalog/price-entry.entity';
import { ImportChange } from './import-change.entity';
import { normalizedModelOfPriceKey } from './import-parse';
import type { ImportPlan } from './import-plan';
import { dialectOf } from '../db/dialect';

const BATCH = 500;
/** Rows written between two yields to the event loop (a few ms), so checks are answered during a large commit. */
const ROWS_PER_SLICE = 2000;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

function chunks<T>(items: T[], size = BATCH): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

/** Writes a catalog plan inside the caller's transaction: inserts carry the import id, updates keep their old values. */
export async function applyCatalogPlan(manager: EntityManager, kind: CatalogKind, plan: ImportPlan, importId: number): Promise<void> {
  const info = KINDS[kind];
  for (const batch of chunks(plan.inserts, 100)) {
    await manager.insert(
      info.entity,
      batch.map((r) => ({ ...r.values, ...info.keyColumns(r.values), importId })),
    );
  }
  const changes: Partial<ImportChange>[] = [];
  for (const { row, existing } of plan.updates) {
    const { id, ...before } = existing;
    changes.push({ importId, entity: info.table, rowId: id, before: JSON.stringify(before), beforeImportId: existing.importId });
    await manager.update(info.entity, id, { ...row.values, importId });
  }
  for (const batch of chunks(changes)) await manager.insert(ImportChange, batch);
}

const PRICE_INSERT_COLUMNS: (keyof PriceEntry & string)[] = ['distributorId', 'model', 'normalizedModel', 'priceCents', 'currency', 'effectiveFrom', 'description', 'importId'];
const PRICE_UPDATE_COLUMNS: (keyof PriceEntry & string)[] = ['model', 'priceCents', 'currency', 'description', 'importId'];
const CHANGE_COLUMNS: (keyof ImportChange & string)[] = ['importId', 'entity', 'rowId', 'before', 'beforeImportId'];

/**
 * Writes a price plan for one distributor through the database's bulk path (prepared statements on
 * SQLite, array-parameter statements on PostgreSQL), yielding to the event loop every ROWS_PER_SLICE
 * rows. Each slice's parameters are built just before it is written (no copy of the whole file).
 * The caller holds the write lock and the transaction throughout, so other writers wait and a crash
 * still leaves all or nothing.
 */
export async function applyPricePlan(manager: EntityManager, distributorId: number, plan: ImportPlan, importId: number): Promise<void> {
  const dialect = dialectOf(manager);
  await inSlicesOf(plan.inserts, (row) => {
    const v = row.values;
    const description = v.description as string | undefined;
    return [distributorId, v.model, normalizedModelOfPriceKey(row.key), v.price, v.currency, v.effectiveFrom, description ?? null, importId];
  }, (rows) => dialect.insertRows(manager, PriceEntry, PRICE_INSERT_COLUMNS, rows));
  await inSlicesOf(plan.updates, ({ row, existing }) => {
    const v = row.values;
    return [existing.id, v.model, v.price, v.currency, (v.description as string | undefined) ?? null, importId];
  }, (rows) => dialect.updateRowsById(manager, PriceEntry, PRICE_UPDATE_COLUMNS, rows, ['description']));
  await inSlicesOf(plan.updates, ({ existing }) => {
    const { id, ...before } = existing;
    return [importId, 'price_entries', id, JSON.stringify(before), existing.importId];
  }, (rows) => dialect.insertRows(manager, ImportChange, CHANGE_COLUMNS, rows));
}

/**
 * Writes items a slice at a time as parameter rows, letting other requests in between slices. A slice
 * is built while the one before it is still being written (PostgreSQL works on its own process then;
 * SQLite's writes are done by the time write returns), and at most one write is in flight.
 */
async function inSlicesOf<T>(items: T[], toRow: (item: T) => unknown[], write: (rows: unknown[][]) => Promise<void>): Promise<void> {
  const inFlight: Promise<void>[] = [];
  try {
    for (let i = 0; i < items.length; i += ROWS_PER_SLICE) {
      if (i > 0) await nextTurn();
      const end = Math.min(items.length, i + ROWS_PER_SLICE);
      const rows: unknown[][] = new Array(end - i);
      for (let j = i; j < end; j++) rows[j - i] = toRow(items[j]);
      const written = write(rows);
      // Observed at once so a failure is not reported as unhandled while the write before it is awaited.
      written.catch(() => undefined);
      inFlight.push(written);
      if (inFlight.length > 1) await inFlight.shift();
    }
    if (inFlight.length > 0) await inFlight.shift();
  } catch (err) {
    // The transaction fails as a whole: let the write still queued settle before the caller rolls back.
    await Promise.allSettled(inFlight);
    throw err;
  }
}
