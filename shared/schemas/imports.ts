import type { ImportKind } from './equipment';

/** Import shapes shared by the server's responses and the app (DESIGN.md §5, contract). */

export type ImportStatus = 'preview' | 'committed' | 'reverted';

/** How a price file writes amounts: "point" is 1,234.50, "comma" is 1.234,50. */
export type DecimalConvention = 'point' | 'comma';
export const DECIMAL_CONVENTIONS = ['point', 'comma'] as const;

/** Where the convention of a price import came from: its own cells, the admin's choice, or the distributor's last file. */
export type DecimalSource = 'file' | 'chosen' | 'saved';

/** Row errors an import keeps and returns (the total is counted exactly); each value echoes at most this many characters. */
export const MAX_STORED_ERRORS = 500;
export const MAX_ERROR_VALUE_CHARS = 80;

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
  /** Row problems found in the file (a row may have several); at most MAX_STORED_ERRORS are kept. */
  errorsTotal: number;
  /** Price files: the decimal mark the amounts were read with (null: nothing in the file needed one). */
  decimalConvention?: DecimalConvention | null;
  decimalSource?: DecimalSource | null;
}

/** One import with the first of its kept row errors (the rest through GET /api/imports/:id/errors). */
export interface ImportDetail extends ImportView {
  errors: ImportRowError[];
}

/** A page of one import's kept row errors. */
export interface ImportErrorPage {
  errors: ImportRowError[];
  page: number;
  pageSize: number;
  /** Errors kept on the import (at most MAX_STORED_ERRORS). */
  stored: number;
  /** Errors found in the file. */
  errorsTotal: number;
}
