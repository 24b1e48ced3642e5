import type { ImportKind } from '../../shared/schemas/equipment';
import type { ImportDetail, ImportView } from '../../shared/schemas/imports';
import type { ImportRecord } from './import.entity';

export type { ImportDetail, ImportView };

/** An import without its row errors, as the history lists it. */
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
    errorsTotal: record.errorsTotal ?? 0,
    ...(record.kind === 'prices' ? { decimalConvention: record.decimalConvention ?? null, decimalSource: record.decimalSource ?? null } : {}),
  };
}

/** One import with its kept row errors (at most MAX_STORED_ERRORS, values already cut short). */
export function toImportDetail(record: ImportRecord, distributorName?: string | null): ImportDetail {
  return { ...toImportView(record, distributorName), errors: record.errors ?? [] };
}
