import type { ImportKind } from './equipment';

/** Import shapes shared by the server's responses and the app (DESIGN.md §5, contract). */

export type ImportStatus = 'preview' | 'committed' | 'reverted';

export interface ImportRowError {
  /** 1-based line in the file (the header is line 1). */
  row: number;
  column: string;
  value: string;
  message: string;
}

export interface ImportCounts {
  rows: number;
  inserted: number;
  updated: number;
  unchanged: number;
  rejected: number;
  unmatched: number;
}

/** An import as /api/imports returns it. */
export interface ImportView {
  id: number;
  kind: ImportKind;
  status: ImportStatus;
  fileName: string;
  distributor?: string;
  /** Name of the admin who uploaded it (history only). */
  uploadedBy?: string;
  createdAt: string;
  counts: ImportCounts;
  errors: ImportRowError[];
}
