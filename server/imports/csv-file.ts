import Papa from 'papaparse';
import { AppError } from '../lib/errors';
import { sniffText } from './content-sniff';

export const MAX_FILE_BYTES = 20 * 1024 * 1024;
export const MAX_ROWS = 200_000;
const EXPECTED = 'Expected a CSV text file: a header row, then one row per item, separated by commas.';

/** Turns an upload into text, refusing what is not a CSV: empty (422), too large (413), binary or undecodable (415). */
export function decodeCsv(buffer: Buffer): string {
  if (buffer.length > MAX_FILE_BYTES) {
    throw new AppError('too-large', `The file is larger than 20 MB. Split it into smaller files. ${EXPECTED}`, 413);
  }
  if (buffer.length === 0) throw new AppError('empty-file', `The file is empty. ${EXPECTED}`, 422);
  let text = sniffText(buffer);
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  if (text.trim() === '') throw new AppError('empty-file', `The file holds no rows. ${EXPECTED}`, 422);
  return text;
}

/** Comma unless the header line has none and uses tabs or semicolons. */
function delimiterOf(text: string): string {
  const firstLine = text.slice(0, text.search(/\r?\n|$/));
  if (firstLine.includes(',')) return ',';
  if (firstLine.includes('\t')) return '\t';
  if (firstLine.includes(';')) return ';';
  return ',';
}

/** Plain words for papaparse's row errors (its codes are not for users). */
function quoteProblem(code: string): string {
  if (code === 'MissingQuotes') return 'a quoted cell is never closed, so the rest of the file was read into it; close the quote (write "" for a quote inside a cell)';
  if (code === 'InvalidQuotes') return 'text follows a closing quote in this row; quote the whole cell and write "" for a quote inside it';
  return 'this row could not be read as CSV';
}

export interface CsvVisitor {
  header(cells: string[]): void;
  /**
   * One data row; `line` is its 1-based line in the file (the header is line 1 when it is the first line).
   * `problem` says why the row can not be trusted as read (a quote never closed swallows the rows after it).
   */
  row(cells: string[], line: number, problem?: string): void;
}

/** Streams the rows of a CSV text through the visitor, skipping blank lines; over MAX_ROWS rows is a 413. */
export function readCsv(text: string, visitor: CsvVisitor): { rows: number } {
  let rowStart = 0;
  let counted = 0;
  let line = 1;
  let sawHeader = false;
  let rows = 0;
  let tooMany = false;
  Papa.parse<string[]>(text, {
    delimiter: delimiterOf(text),
    skipEmptyLines: false,
    step: (result, parser) => {
      // The row's line is 1 + the newlines before where it starts (quoted fields may span lines).
      // A line ends at LF, CRLF or a lone CR (old spreadsheet exports): papaparse accepts all three.
      for (let i = counted; i < rowStart; i++) {
        const c = text.charCodeAt(i);
        if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) line++;
      }
      counted = rowStart;
      const rowLine = line;
      rowStart = result.meta.cursor;
      const cells = result.data;
      if (cells.every((c) => c.trim() === '')) return;
      if (!sawHeader) {
        sawHeader = true;
        visitor.header(cells);
        return;
      }
      if (++rows > MAX_ROWS) {
        tooMany = true;
        parser.abort();
        return;
      }
      visitor.row(cells, rowLine, result.errors.length > 0 ? quoteProblem(result.errors[0].code) : undefined);
    },
  });
  if (tooMany) throw new AppError('too-many-rows', `The file has more than ${MAX_ROWS.toLocaleString('en-US')} rows. Split it into smaller files.`, 413);
  return { rows };
}
