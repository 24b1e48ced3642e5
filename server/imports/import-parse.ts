import type { z } from 'zod';
import type { ImportKind } from '../../shared/schemas/equipment';
import { hasModelCharacters, normalizeModel } from '../../shared/schemas/fields';
import { MAX_ERROR_VALUE_CHARS, MAX_STORED_ERRORS, type DecimalConvention, type DecimalSource } from '../../shared/schemas/imports';
import { KINDS } from '../catalog/catalog-kinds';
import { AppError } from '../lib/errors';
import { decodeCsv, readCsv } from './csv-file';
import { fieldsOf, matchHeaders, toSnake, type HeaderMatch } from './header-map';
import type { ImportRowError } from './import.entity';
import { KeyIndex } from './key-index';
import { PriceColumn } from './price-number';
import { priceRowSchema, quickPriceFields, quickPriceRow, type PriceRow } from './price-row';
import { todayIso } from '../catalog/dates';

/** A valid row: its line in the file, its key and the values of the fields the file has columns for. */
export interface ParsedRow {
  line: number;
  key: string;
  values: Record<string, unknown>;
}

export interface ParsedFile {
  kind: ImportKind;
  rows: ParsedRow[];
  /** The first MAX_STORED_ERRORS row errors, values cut to MAX_ERROR_VALUE_CHARS. */
  errors: ImportRowError[];
  /** Every row error found (errors holds the first of them). */
  errorsTotal: number;
  /** Price files: the decimal mark amounts were read with, and where it came from. */
  decimalConvention: DecimalConvention | null;
  decimalSource: DecimalSource | null;
  /** Data rows in the file (blank lines not counted). */
  rowCount: number;
  rejected: number;
  /** Fields that have a column: an update writes these and keeps the others. */
  presentFields: string[];
  header: HeaderMatch;
}

function keyOf(kind: ImportKind, values: Record<string, unknown>): string {
  if (kind === 'prices') return `${normalizeModel(String(values.model))}|${values.effectiveFrom}`;
  return Object.values(KINDS[kind].keyColumns(values)).join('|');
}

/** The normalised model of a price row, from its key (`${normalizedModel}|${YYYY-MM-DD}`). */
export const normalizedModelOfPriceKey = (key: string) => key.slice(0, -11);

/**
 * The quick path for price rows, straight from the cells (no input object): a row whose every field
 * is plainly valid and whose key is new goes to `accept` (which says whether it took it); anything
 * else (a blank or odd cell, extra cells, a nameless model) returns false for the general path,
 * which gives the same values or the row's errors.
 */
function quickPriceRowAt(
  header: HeaderMatch,
  column: PriceColumn,
  convention: DecimalConvention | null,
  today: string,
  accept: (i: number, key: string, values: Record<string, unknown>) => boolean,
): (i: number, cells: string[]) => boolean {
  const at = (field: string) => header.columns.indexOf(field);
  const [model, effectiveFrom, description, currency] = [at('model'), at('effectiveFrom'), at('description'), at('currency')];
  const width = header.columns.length;
  const cell = (cells: string[], index: number) => (index < 0 ? undefined : cells[index]);
  return (i, cells) => {
    if (cells.length > width) return false;
    const cents = column.centsAt(i, convention);
    if (cents === undefined) return false;
    const values = quickPriceFields(cell(cells, model), cents, cell(cells, effectiveFrom), cell(cells, description), cell(cells, currency), today);
    if (!values || !hasModelCharacters(values.model)) return false;
    return accept(i, `${normalizeModel(values.model)}|${values.effectiveFrom}`, values);
  };
}

/** The admin's choice of decimal mark for a price file, and the one remembered for its distributor. */
export interface DecimalChoice {
  chosen?: DecimalConvention | null;
  saved?: DecimalConvention | null;
}

/** Fields that name a model: each must have a letter or digit, or it normalises to nothing and matches nothing. */
const MODEL_FIELDS = ['model', 'outdoorModel', 'indoorModel', 'airHandlerModel'];

/** At most the first MAX_ERROR_VALUE_CHARS characters of a cell (never half a surrogate pair). */
export function clipValue(value: string): string {
  if (value.length <= MAX_ERROR_VALUE_CHARS) return value;
  const cut = value.slice(0, MAX_ERROR_VALUE_CHARS);
  return /[\ud800-\udbff]$/.test(cut) ? cut.slice(0, -1) : cut;
}

/** The field whose column identifies a row in messages about duplicates. */
const keyField = (kind: ImportKind) => (kind === 'rated-combinations' ? 'outdoorModel' : 'model');

/**
 * Reads and validates a whole upload: header matched to fields (with the mapping), each row through
 * the kind's zod schema, duplicates inside the file reported against the row they repeat. A price
 * file's whole price column decides its decimal mark before any row is read.
 */
export function parseImportFile(
  buffer: Buffer,
  kind: ImportKind,
  mapping: Record<string, string> = {},
  today?: string,
  decimal: DecimalChoice = {},
): ParsedFile {
  const steps = parseSteps(buffer, kind, mapping, today, decimal);
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/** Rows validated between two yields to the event loop: a few milliseconds of work, so checks are not held up. */
const ROWS_PER_SLICE = 250;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** parseImportFile in slices of ROWS_PER_SLICE rows that yield to the event loop in between (the request path). */
export async function parseImportFileInSlices(
  buffer: Buffer,
  kind: ImportKind,
  mapping: Record<string, string> = {},
  today?: string,
  decimal: DecimalChoice = {},
): Promise<ParsedFile> {
  const steps = parseSteps(buffer, kind, mapping, today, decimal);
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
    await nextTurn();
  }
}

/** Where a parse in steps has got to: the valid rows so far (the list keeps growing) and the rows rejected so far. */
export interface ParseProgress {
  rows: ParsedRow[];
  rejected: number;
}

/**
 * parseImportFile as a generator: one step reads the whole file (and settles a price file's decimal mark),
 * then each step validates ROWS_PER_SLICE rows. Valid rows never leave the list once in it: a row that
 * repeats an earlier key is the one rejected.
 */
export function* parseSteps(
  buffer: Buffer,
  kind: ImportKind,
  mapping: Record<string, string>,
  today: string | undefined,
  decimal: DecimalChoice,
): Generator<ParseProgress, ParsedFile> {
  const text = decodeCsv(buffer);
  const rows: ParsedRow[] = [];
  const errors: ImportRowError[] = [];
  let errorsTotal = 0;
  let header: HeaderMatch | undefined;
  let headers: string[] = [];
  let presentFields: string[] = [];
  let rejected = 0;
  const columnOf = (field: string) => {
    const i = header!.columns.indexOf(field);
    return clipValue(i >= 0 ? headers[i] : toSnake(field));
  };
  const report = (rowErrors: ImportRowError[]) => {
    rejected++;
    errorsTotal += rowErrors.length;
    for (const e of rowErrors) if (errors.length < MAX_STORED_ERRORS) errors.push({ ...e, value: clipValue(e.value) });
  };

  let schema: z.ZodType<Record<string, unknown>> = kind === 'prices' ? asRowSchema(priceRowSchema(today)) : KINDS[kind].schema;
  let quickRow: ((input: Record<string, string>) => PriceRow | null) | null = null;
  const validate = (cells: string[], line: number, problem?: string) => {
    if (problem) {
      report([{ row: line, column: '', value: '', message: problem }]);
      return;
    }
    // Blank cells are left out: the shared schemas' optional fields accept a missing key, not ''.
    const input: Record<string, string> = {};
    const columns = header!.columns;
    for (let i = 0; i < columns.length; i++) {
      const field = columns[i];
      const cell = cells[i];
      if (field !== null && cell !== undefined && cell.trim() !== '') input[field] = cell;
    }
    const rowErrors: ImportRowError[] = [];
    for (let i = columns.length; i < cells.length; i++) {
      if (cells[i].trim() !== '') {
        rowErrors.push({ row: line, column: '', value: cells[i], message: 'this row has more cells than the header has columns' });
        break;
      }
    }
    const quick = quickRow ? quickRow(input) : null;
    const result = quick ? { success: true as const, data: quick as Record<string, unknown> } : schema.safeParse(input);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = String(issue.path[0] ?? '');
        rowErrors.push({ row: line, column: field ? columnOf(field) : '', value: field ? (input[field] ?? '') : '', message: issue.message });
      }
    } else if (rowErrors.length === 0) {
      const values = result.data;
      const nameless = MODEL_FIELDS.find((f) => typeof values[f] === 'string' && !hasModelCharacters(values[f] as string));
      const key = nameless ? '' : keyOf(kind, values);
      // Records the key as this row's when it is new: the row is then taken (below).
      const first = nameless ? undefined : firstLineOfKey.firstLineOr(key, line);
      if (nameless) {
        rowErrors.push({ row: line, column: columnOf(nameless), value: input[nameless] ?? '', message: 'a model needs at least one letter or digit' });
      } else if (first !== undefined) {
        const field = keyField(kind);
        const what = kind === 'prices' ? 'the same model and effective date as' : 'a duplicate of';
        rowErrors.push({ row: line, column: columnOf(field), value: input[field] ?? '', message: `${what} row ${first}` });
      } else {
        rows.push({ line, key, values: kind === 'prices' ? values : pick(values, presentFields) });
      }
    }
    if (rowErrors.length > 0) report(rowErrors);
  };

  // Rows as read, in parallel arrays (no object per row: a 100k-row file is mostly garbage-collector work).
  const pendingCells: string[][] = [];
  const pendingLines: number[] = [];
  const problems = new Map<number, string>();
  let priceColumn = -1;
  // Rows are read whole first (a price file's decimal mark comes from its whole column), then validated in slices.
  const { rows: rowCount } = readCsv(text, {
    header(cells) {
      headers = cells.map((c) => c.trim());
      header = matchHeaders(kind, headers, mapping);
      if (header.missingFields.length > 0) throw noUsableHeader(kind, header);
      presentFields = header.columns.filter((c): c is string => c !== null);
      priceColumn = kind === 'prices' ? header.columns.indexOf('price') : -1;
    },
    row(cells, line, problem) {
      if (problem) problems.set(pendingCells.length, problem);
      pendingCells.push(cells);
      pendingLines.push(line);
    },
  });
  yield { rows, rejected };
  if (!header) throw new AppError('empty-file', 'The file holds no header row.', 422);
  if (rowCount === 0) throw new AppError('empty-file', 'The file has a header but no rows.', 422, { foundColumns: header.foundColumns });
  // The first line of each valid row's key (validate and the quick path below), sized for the file.
  const firstLineOfKey = new KeyIndex(pendingCells.length);

  let decimalConvention: DecimalConvention | null = null;
  let decimalSource: DecimalSource | null = null;
  // Price files: the common row taken straight from its cells (true), else the general path below.
  let quickPriceCells: ((i: number, cells: string[]) => boolean) | null = null;
  if (kind === 'prices') {
    const column = new PriceColumn(pendingCells.length, (i) => pendingCells[i][priceColumn] ?? '');
    const detected = column.detected;
    if (decimal.chosen) [decimalConvention, decimalSource] = [decimal.chosen, 'chosen'];
    else if (detected.convention) [decimalConvention, decimalSource] = [detected.convention, 'file'];
    else if (decimal.saved) [decimalConvention, decimalSource] = [decimal.saved, 'saved'];
    schema = asRowSchema(priceRowSchema(today, decimalConvention));
    const day = today ?? todayIso();
    quickRow = (input) => quickPriceRow(input, day, decimalConvention);
    quickPriceCells = quickPriceRowAt(header, column, decimalConvention, day, (i, key, values) => {
      if (firstLineOfKey.firstLineOr(key, pendingLines[i]) !== undefined) return false;
      rows.push({ line: pendingLines[i], key, values });
      return true;
    });
  }
  for (let i = 0; i < pendingCells.length; i++) {
    const problem = problems.size > 0 ? problems.get(i) : undefined;
    if (problem !== undefined || quickPriceCells === null || !quickPriceCells(i, pendingCells[i])) validate(pendingCells[i], pendingLines[i], problem);
    if (i % ROWS_PER_SLICE === ROWS_PER_SLICE - 1) yield { rows, rejected };
  }
  return { kind, rows, errors, errorsTotal, decimalConvention, decimalSource, rowCount, rejected, presentFields, header };
}

const asRowSchema = (schema: z.ZodType) => schema as unknown as z.ZodType<Record<string, unknown>>;

/** The present fields of a parsed row; a blank cell becomes null so an update clears it. */
function pick(values: Record<string, unknown>, fields: string[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of fields) out[f] = values[f] ?? null;
  return out;
}

function noUsableHeader(kind: ImportKind, header: HeaderMatch): AppError {
  const { fields, required } = fieldsOf(kind);
  const missing = header.missingFields.map(toSnake).join(', ');
  return new AppError(
    'no-usable-header',
    `The header row has no column for ${missing}. Expected a header row naming the columns (see the ${kind} template), or send a mapping from your column names to these fields.`,
    422,
    {
      foundColumns: header.foundColumns,
      missingFields: header.missingFields.map(toSnake),
      requiredFields: required.map(toSnake),
      knownFields: fields.map(toSnake),
    },
  );
}
