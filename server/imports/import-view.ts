import type { ImportKind } from '../../shared/schemas/equipment';
import type { ImportView } from '../../shared/schemas/imports';
import type { ImportRecord } from './import.entity';

export type { ImportView };


export function toImportView(record: ImportRecord, distributorName?: string | null, uploadedBy?: string): ImportView {
  return {
    id: record.id,
    kind: record.kind as ImportKind,
    status: record.status,
    fileName: record.fileName,
    ...(distributorName ? { distributor: distributorName } : {}),
    ...(uploadedBy ? { uploadedBy } : {}),
    createdAt: new Date(record.createdAt).toISOString(),
    counts: {
      rows: record.rows,
      inserted: record.inserted,
      updated: record.updated,
      unchanged: record.unchanged,
      rejected: record.rejected,
      unmatched: record.unmatched,
    },
    errors: record.errors,
  };
}
