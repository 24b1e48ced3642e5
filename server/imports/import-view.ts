import type { ImportRecord, ImportRowError, ImportStatus } from './import.entity';

/** An import as the API returns it (DESIGN.md §5, contract). */
export interface ImportView {
  id: number;
  kind: string;
  status: ImportStatus;
  fileName: string;
  distributor?: string;
  /** Name of the admin who uploaded it (history only). */
  uploadedBy?: string;
  createdAt: string;
  counts: { rows: number; inserted: number; updated: number; unchanged: number; rejected: number; unmatched: number };
  errors: ImportRowError[];
}

export function toImportView(record: ImportRecord, distributorName?: string | null, uploadedBy?: string): ImportView {
  return {
    id: record.id,
    kind: record.kind,
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
