/** Plain-words formatting of catalog values with their units (app-only display helpers). */

const EIGHTHS = ['', '1/8', '1/4', '3/8', '1/2', '5/8', '3/4', '7/8'];

/** Tube OD in inches as the trade says it: 0.375 → "3/8 in", 1.125 → "1 1/8 in". */
export function tubeIn(value: number | undefined): string | undefined {
  if (value == null) return undefined;
  const whole = Math.floor(value + 1e-9);
  const eighths = Math.round((value - whole) * 8);
  if (Math.abs(value - whole - eighths / 8) > 0.001) return `${value} in`;
  if (eighths === 8) return `${whole + 1} in`;
  const parts = [whole > 0 ? String(whole) : '', EIGHTHS[eighths]].filter(Boolean);
  return `${parts.join(' ') || '0'} in`;
}

/** A list of tube sizes: "3/8 in, 1/2 in". */
export function tubeListIn(values: number[] | undefined): string | undefined {
  return values?.length ? values.map((v) => tubeIn(v)).join(', ') : undefined;
}

export function tons(value: number | undefined): string | undefined {
  return value == null ? undefined : `${trim(value)} ${value === 1 ? 'ton' : 'tons'}`;
}

/** "1.5–3 tons", or one end when only one is known. */
export function tonRange(min: number | undefined, max: number | undefined): string | undefined {
  if (min == null && max == null) return undefined;
  if (min == null) return `up to ${tons(max)}`;
  if (max == null) return `from ${tons(min)}`;
  return min === max ? tons(min) : `${trim(min)}–${trim(max)} tons`;
}

export function btuh(value: number | undefined): string | undefined {
  return value == null ? undefined : `${value.toLocaleString('en-US')} Btu/h`;
}

export function withUnit(value: number | string | undefined, unit: string): string | undefined {
  return value == null || value === '' ? undefined : `${typeof value === 'number' ? trim(value) : value} ${unit}`;
}

export function yesNo(value: boolean | undefined): string | undefined {
  return value == null ? undefined : value ? 'Yes' : 'No';
}

/** "MCA 18 A / MOCP 30 A" from whichever of the two is known. */
export function circuit(mca: number | undefined, mocp: number | undefined): string | undefined {
  const parts = [mca != null ? `MCA ${trim(mca)} A` : '', mocp != null ? `MOCP ${trim(mocp)} A` : ''].filter(Boolean);
  return parts.length ? parts.join(' / ') : undefined;
}

/** Ratings line: "SEER2 15.2 · EER2 12 · HSPF2 7.8" from what is known. */
export function ratings(r: { seer2?: number; eer2?: number; hspf2?: number }): string | undefined {
  const parts = [
    r.seer2 != null ? `SEER2 ${trim(r.seer2)}` : '',
    r.eer2 != null ? `EER2 ${trim(r.eer2)}` : '',
    r.hspf2 != null ? `HSPF2 ${trim(r.hspf2)}` : '',
  ].filter(Boolean);
  return parts.length ? parts.join(' · ') : undefined;
}

/** Cents to "$1,234.50" (USD) or "1,234.50 CAD". */
export function money(cents: number, currency = 'USD'): string {
  const amount = (cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
  return currency === 'USD' ? `$${amount}` : `${amount} ${currency}`;
}

/** ISO date (yyyy-mm-dd) to "Mar 4, 2025"; read as a calendar date, not shifted by time zone. */
export function calendarDate(iso: string | undefined): string | undefined {
  if (!iso) return undefined;
  const d = new Date(`${iso.slice(0, 10)}T12:00:00Z`);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString('en-US', { year: 'numeric', month: 'short', day: 'numeric', timeZone: 'UTC' });
}

const trim = (n: number) => String(Number(n.toFixed(3)));
