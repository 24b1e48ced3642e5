import type { EntityManager } from 'typeorm';
import type { ImportKind } from '../../shared/schemas/equipment';
import { KINDS } from '../catalog/catalog-kinds';
import { PriceEntry } from '../catalog/price-entry.entity';
import { conflict } from '../lib/errors';
import { ImportChange } from './import-change.entity';
import { ImportRecord } from './import.entity';

const entityOf = (kind: ImportKind) => (kind === 'prices' ? PriceEntry : KINDS[kind].entity);

/**
 * Undoes a committed import inside the caller's transaction: restores the rows it updated, then
 * deletes the rows it inserted (those still carrying its id). Refused while a later committed import
 * changed rows this one wrote, since restoring would lose that import's work.
 */
export async function revertImportRows(manager: EntityManager, record: ImportRecord): Promise<void> {
  const later = await manager
    .getRepository(ImportChange)
    .createQueryBuilder('c')
    .innerJoin(ImportRecord, 'i', 'i.id = c.importId')
    .select('DISTINCT c.importId', 'importId')
    .where('c.beforeImportId = :id', { id: record.id })
    .andWhere('i.status = :status', { status: 'committed' })
    .getRawMany<{ importId: number }>();
  if (later.length > 0) {
    const ids = later.map((l) => `#${l.importId}`).join(', ');
    throw conflict(`Import ${ids} changed rows this import wrote: revert ${later.length > 1 ? 'those' : 'that one'} first.`, {
      laterImports: later.map((l) => l.importId),
    });
  }
  const entity = entityOf(record.kind as ImportKind);
  const changes = await manager.getRepository(ImportChange).find({ where: { importId: record.id }, order: { id: 'DESC' } });
  for (const change of changes) {
    await manager.update(entity, change.rowId, JSON.parse(change.before) as Record<string, unknown>);
  }
  // A price file's rows are found through price_entries' (distributorId, importId) index.
  await manager.delete(entity, record.kind === 'prices' ? { distributorId: record.distributorId!, importId: record.id } : { importId: record.id });
  // Those changes are spent; a later revert check must not see them as live.
  await manager.delete(ImportChange, { importId: record.id });
}
