import Papa from 'papaparse';
import type { ImportRowError } from './import.entity';

/**
 * A cell a spreadsheet would run as a formula (starts with =, +, -, @, tab or CR) gets a leading
 * apostrophe, so opening a downloaded CSV never executes what a distributor's file held (OWASP
 * "CSV injection" guidance).
 */
export function neutralizeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Rows to CSV text with every cell neutralised; CRLF line ends as spreadsheets expect. */
export function toSafeCsv(header: string[], rows: (string | number)[][]): string {
  const cells = [header, ...rows].map((row) => row.map((c) => neutralizeCell(String(c))));
  return `${Papa.unparse(cells, { newline: '\r\n', quotes: true })}\r\n`;
}

/** An import's kept row errors as a CSV download. */
export function errorsCsv(errors: ImportRowError[]): string {
  return toSafeCsv(
    ['line', 'column', 'value', 'reason'],
    errors.map((e) => [e.row, e.column, e.value, e.message]),
  );
}
