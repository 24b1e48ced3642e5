import type { EntityManager } from 'typeorm';
import type { CatalogKind } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import { KINDS } from '../catalog/catalog-kinds';
import { PriceEntry } from '../catalog/price-entry.entity';
import { ImportChange } from './import-change.entity';
import type { ImportPlan } from './import-plan';
import { dialectOf } from '../db/dialect';

const BATCH = 500;
/** Rows written between two yields to the event loop (a few ms), so checks are answered during a large commit. */
const ROWS_PER_SLICE = 2000;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Writes rows a slice at a time, letting other requests in between slices. */
async function inSlices(rows: unknown[][], write: (slice: unknown[][]) => Promise<void>): Promise<void> {
  for (let i = 0; i < rows.length; i += ROWS_PER_SLICE) {
    if (i > 0) await nextTurn();
    await write(rows.slice(i, i + ROWS_PER_SLICE));
  }
}

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

/**
 * Writes a price plan for one distributor through the database's bulk path (prepared statements on
 * SQLite, multi-row statements on PostgreSQL), yielding to the event loop every ROWS_PER_SLICE rows.
 * The caller holds the write lock and the transaction throughout, so other writers wait and a crash
 * still leaves all or nothing.
 */
export async function applyPricePlan(manager: EntityManager, distributorId: number, plan: ImportPlan, importId: number): Promise<void> {
  const entry = (v: Record<string, unknown>) => ({
    distributorId,
    model: String(v.model),
    normalizedModel: normalizeModel(String(v.model)),
    priceCents: v.price as number,
    currency: String(v.currency),
    effectiveFrom: String(v.effectiveFrom),
    description: (v.description as string | undefined) ?? null,
    importId,
  });
  const changes = plan.updates.map(({ existing }) => {
    const { id, ...before } = existing;
    return { importId, entity: 'price_entries', rowId: id, before: JSON.stringify(before), beforeImportId: existing.importId };
  });
  const dialect = dialectOf(manager);
  const insertColumns = ['distributorId', 'model', 'normalizedModel', 'priceCents', 'currency', 'effectiveFrom', 'description', 'importId'] as const;
  await inSlices(plan.inserts.map((r) => {
    const e = entry(r.values);
    return insertColumns.map((c) => e[c]);
  }), (rows) => dialect.insertRows(manager, PriceEntry, [...insertColumns], rows));
  await inSlices(
    plan.updates.map(({ row, existing }) => {
      const e = entry(row.values);
      return [existing.id, e.model, e.priceCents, e.currency, e.description, importId];
    }),
    (rows) => dialect.updateRowsById(manager, PriceEntry, ['model', 'priceCents', 'currency', 'description', 'importId'], rows, ['description']),
  );
  await inSlices(
    changes.map((c) => [c.importId, c.entity, c.rowId, c.before, c.beforeImportId]),
    (rows) => dialect.insertRows(manager, ImportChange, ['importId', 'entity', 'rowId', 'before', 'beforeImportId'], rows),
  );
}
