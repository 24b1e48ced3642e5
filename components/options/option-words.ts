/** Money for the screen: cents → "$1,234.50" (or whole dollars with `decimals` 0). */
export function moneyText(cents: number, decimals = 2): string {
  const dollars = cents / 100;
  return `${dollars < 0 ? '−' : ''}$${Math.abs(dollars).toLocaleString('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals })}`;
}

/** A number with at most `digits` decimals, or a dash when missing. */
export function numberText(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return value.toLocaleString('en-US', { maximumFractionDigits: digits });
}

/** Dollars typed by a person ("1,234.5", "$99") → cents; undefined when it is not a sum of money. */
export function centsFromText(text: string): number | undefined {
  const cleaned = text.replace(/[$,\s]/g, '');
  if (!/^\d+(\.\d{0,2})?$/.test(cleaned)) return undefined;
  return Math.round(Number(cleaned) * 100);
}

/** A figure shown on every option card; `values[i]` is option i's text. */
export interface FigureRow {
  key: string;
  label: string;
  values: string[];
}

/** The rows whose text is not the same on every card: the differences the screen marks. */
export function differingKeys(rows: FigureRow[]): Set<string> {
  return new Set(rows.filter((r) => r.values.length > 1 && new Set(r.values).size > 1).map((r) => r.key));
}
