import type { EntityManager } from 'typeorm';
import type { CatalogKind } from '../../shared/schemas/equipment';
import { normalizeModel } from '../../shared/schemas/fields';
import { KINDS } from '../catalog/catalog-kinds';
import { PriceEntry } from '../catalog/price-entry.entity';
import { ImportChange } from './import-change.entity';
import type { ImportPlan } from './import-plan';
import { sqliteHandle } from '../db/sqlite-handle';

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

/**
 * Writes a price plan for one distributor; on SQLite through prepared statements (100k rows in well
 * under a second), yielding to the event loop every ROWS_PER_SLICE rows. The caller holds the write
 * lock and the transaction throughout, so other writers wait and a crash still leaves all or nothing.
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
  const raw = sqliteHandle(manager);
  if (raw) {
    const insert = raw.prepare(
      'INSERT INTO price_entries (distributorId, model, normalizedModel, priceCents, currency, effectiveFrom, description, importId) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
    );
    let written = 0;
    for (const r of plan.inserts) {
      const e = entry(r.values);
      insert.run(e.distributorId, e.model, e.normalizedModel, e.priceCents, e.currency, e.effectiveFrom, e.description, e.importId);
      if (++written % ROWS_PER_SLICE === 0) await nextTurn();
    }
    const update = raw.prepare('UPDATE price_entries SET model = ?, priceCents = ?, currency = ?, description = COALESCE(?, description), importId = ? WHERE id = ?');
    for (const { row, existing } of plan.updates) {
      const e = entry(row.values);
      update.run(e.model, e.priceCents, e.currency, e.description, importId, existing.id);
      if (++written % ROWS_PER_SLICE === 0) await nextTurn();
    }
    const change = raw.prepare('INSERT INTO import_changes (importId, entity, rowId, before, beforeImportId) VALUES (?, ?, ?, ?, ?)');
    for (const c of changes) {
      change.run(c.importId, c.entity, c.rowId, c.before, c.beforeImportId);
      if (++written % ROWS_PER_SLICE === 0) await nextTurn();
    }
    return;
  }
  for (const batch of chunks(plan.inserts)) await manager.insert(PriceEntry, batch.map((r) => entry(r.values)));
  for (const { row, existing } of plan.updates) {
    const e = entry(row.values);
    await manager.update(PriceEntry, existing.id, { model: e.model, priceCents: e.priceCents, currency: e.currency, importId, ...(e.description !== null ? { description: e.description } : {}) });
  }
  for (const batch of chunks(changes)) await manager.insert(ImportChange, batch);
}
