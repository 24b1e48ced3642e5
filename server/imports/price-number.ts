import type { DecimalConvention } from '../../shared/schemas/imports';

export type { DecimalConvention };

/**
 * Reads a price cell written in either decimal convention without ever guessing a scale:
 * "point" writes 1,234.50 (also 1'234.50, 1 234.50), "comma" writes 1.234,50 (also 1 234,50).
 * A cell either reads the same in both ("1234", "1 234"), tells the convention ("12,50",
 * "1,234.50"), is ambiguous ("1,234" is 1234 with a grouping comma or 1.234 with a decimal one) or
 * is not a price at all.
 */

/** What one cell says about the file's convention. */
export type PriceReading =
  | { kind: 'same'; cents: number }
  | { kind: 'decides'; convention: DecimalConvention; cents: number }
  | { kind: 'ambiguous'; cents: Partial<Record<DecimalConvention, number>> }
  | { kind: 'unreadable'; reason: string };

const SPACES = /^[\s\u00a0\u202f]+|[\s\u00a0\u202f]+$/g;
/** Currency marks a distributor may leave in the cell; the currency itself is a column of its own. */
const CURRENCY = /^(?:US\$|USD|\$)\s*|\s*(?:USD|\$)$/i;
const MAX_INTEGER_DIGITS = 12;

type Interpretation = { cents: number } | { threeDecimals: true } | null;

/** The cell read with `decimal` as the decimal mark and `group` (or a space or apostrophe) grouping thousands. */
function interpret(body: string, decimal: string, group: string): Interpretation {
  const parts = body.split(decimal);
  if (parts.length > 2) return null;
  const [intText, fraction = ''] = parts;
  if (parts.length === 2 && !/^\d{1,3}$/.test(fraction)) return null;
  let digits: string;
  if (/^\d+$/.test(intText)) digits = intText;
  else if (intText === '' && fraction !== '') digits = '0';
  else {
    // Grouped: 1-3 digits, then groups of exactly three, all with one and the same separator.
    const match = /^\d{1,3}(\D)\d{3}(?:\1\d{3})*$/.exec(intText);
    if (!match || (match[1] !== group && !` \u00a0\u202f'`.includes(match[1]))) return null;
    digits = intText.replace(/\D/g, '');
  }
  if (digits.length > MAX_INTEGER_DIGITS) return null;
  if (fraction.length === 3) return { threeDecimals: true };
  return { cents: Number(digits) * 100 + Number(fraction.padEnd(2, '0') || '0') };
}

/** The shapes most files use, read with one regex each before the general path (100k-row files). */
const PLAIN_POINT = /^\$?(\d{1,3}(?:,\d{3})+|\d+)\.(\d{1,2})$/;
const PLAIN_COMMA = /^(\d{1,3}(?:\.\d{3})+|\d+),(\d{1,2})$/;
const PLAIN_WHOLE = /^\$?\d{1,12}$/;

function quickReading(raw: string): PriceReading | undefined {
  if (PLAIN_WHOLE.test(raw)) return { kind: 'same', cents: Number(raw.replace('$', '')) * 100 };
  let m = PLAIN_POINT.exec(raw);
  if (m && m[1].length <= 16) return { kind: 'decides', convention: 'point', cents: Number(m[1].replace(/,/g, '')) * 100 + Number(m[2].padEnd(2, '0')) };
  m = PLAIN_COMMA.exec(raw);
  if (m && m[1].length <= 16) return { kind: 'decides', convention: 'comma', cents: Number(m[1].replace(/\./g, '')) * 100 + Number(m[2].padEnd(2, '0')) };
  return undefined;
}

/** Classifies one price cell (already known to be non-blank). */
export function readPriceCell(raw: string): PriceReading {
  const quick = quickReading(raw);
  if (quick) return quick;
  let body = raw.replace(SPACES, '').replace(CURRENCY, '').replace(SPACES, '');
  let negative = false;
  if (body.startsWith('-')) {
    negative = true;
    body = body.slice(1);
  }
  if (!/^[\d.,' \u00a0\u202f]+$/.test(body) || !/\d/.test(body)) {
    return { kind: 'unreadable', reason: 'expected a price such as 1234.50, $1,234.50 or 1.234,50' };
  }
  const point = interpret(body, '.', ',');
  const comma = interpret(body, ',', '.');
  const sign = negative ? -1 : 1;
  const centsOf = (i: Interpretation) => (i && 'cents' in i ? i.cents * sign : undefined);
  const p = centsOf(point);
  const c = centsOf(comma);
  if (p !== undefined && c !== undefined) return p === c ? { kind: 'same', cents: p } : { kind: 'ambiguous', cents: { point: p, comma: c } };
  if (p !== undefined) return comma ? { kind: 'ambiguous', cents: { point: p } } : { kind: 'decides', convention: 'point', cents: p };
  if (c !== undefined) return point ? { kind: 'ambiguous', cents: { comma: c } } : { kind: 'decides', convention: 'comma', cents: c };
  if (point || comma) return { kind: 'unreadable', reason: 'has three digits after the decimal mark; prices are in dollars and cents' };
  return { kind: 'unreadable', reason: 'expected a price such as 1234.50, $1,234.50 or 1.234,50 (groups of three digits between separators)' };
}

/** How a whole price column reads: the convention it shows (null: none or a tie) and the votes for each. */
export interface ColumnConvention {
  convention: DecimalConvention | null;
  votes: Record<DecimalConvention, number>;
}

/** Detects the file's convention from every cell of the price column: the cells that decide vote. */
export function detectConvention(cells: Iterable<string>): ColumnConvention {
  const votes: Record<DecimalConvention, number> = { point: 0, comma: 0 };
  for (const cell of cells) {
    if (cell.trim() === '') continue;
    const reading = readPriceCell(cell);
    if (reading.kind === 'decides') votes[reading.convention]++;
  }
  return { convention: winner(votes), votes };
}

const winner = (votes: Record<DecimalConvention, number>): DecimalConvention | null =>
  votes.point > votes.comma ? 'point' : votes.comma > votes.point ? 'comma' : null;

// How a PriceColumn keeps each cell's reading: one byte a cell, no object per cell (100k-row files).
const PLAIN = 1; // reads the same in both conventions
const POINT = 2; // decides the point convention
const COMMA = 3; // decides the comma convention
// 0: blank, ambiguous or unreadable; read again through priceCents for its reason.

/**
 * A whole price column read once: the convention it shows (as detectConvention) and each cell's
 * cents kept for the rows, so a cell is not parsed a second time when its row is validated.
 */
export class PriceColumn {
  readonly detected: ColumnConvention;
  private readonly kinds: Uint8Array;
  private readonly cents: Float64Array;

  /** `cellAt(i)` is row i's price cell ('' when the row has none). */
  constructor(count: number, cellAt: (i: number) => string) {
    this.kinds = new Uint8Array(count);
    this.cents = new Float64Array(count);
    const votes: Record<DecimalConvention, number> = { point: 0, comma: 0 };
    for (let i = 0; i < count; i++) {
      const cell = cellAt(i);
      if (cell.trim() === '') continue;
      const reading = readPriceCell(cell);
      if (reading.kind === 'same') {
        this.kinds[i] = PLAIN;
        this.cents[i] = reading.cents;
      } else if (reading.kind === 'decides') {
        votes[reading.convention]++;
        this.kinds[i] = reading.convention === 'point' ? POINT : COMMA;
        this.cents[i] = reading.cents;
      }
    }
    this.detected = { convention: winner(votes), votes };
  }

  /**
   * Row i's cents when its cell plainly reads so under `convention` (what priceCents gives then);
   * undefined when the cell needs priceCents itself: blank, ambiguous, unreadable, or the other convention.
   */
  centsAt(i: number, convention: DecimalConvention | null): number | undefined {
    const kind = this.kinds[i];
    if (kind === PLAIN) return this.cents[i];
    if (kind === POINT && convention !== 'comma') return this.cents[i];
    if (kind === COMMA && convention !== 'point') return this.cents[i];
    return undefined;
  }
}

const EXAMPLE: Record<DecimalConvention, string> = { point: '1,234.50', comma: '1.234,50' };

/** One cell as integer cents under the file's convention, or the reason it can not be read unambiguously. */
export function priceCents(raw: string, convention: DecimalConvention | null): { cents: number } | { error: string } {
  const reading = readPriceCell(raw);
  switch (reading.kind) {
    case 'same':
      return { cents: reading.cents };
    case 'unreadable':
      return { error: reading.reason };
    case 'decides':
      if (convention === null || reading.convention === convention) return { cents: reading.cents };
      return { error: `written as ${EXAMPLE[reading.convention]} but this file writes prices as ${EXAMPLE[convention]}; fix the cell so the amount is not read 100 times off` };
    case 'ambiguous': {
      if (convention === null) {
        return { error: 'ambiguous: could be read with a decimal point or a decimal comma and nothing else in the file tells which; write it as 1234.00 or choose the file\'s decimal mark' };
      }
      const cents = reading.cents[convention];
      if (cents === undefined) return { error: `has three digits after the decimal mark for a file that writes prices as ${EXAMPLE[convention]}` };
      return { cents };
    }
  }
}
