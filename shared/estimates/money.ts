/** Cents rounded half up to a whole cent; the tiny nudge absorbs binary fractions (1.15 × 100 = 114.999…). */
export function roundCents(cents: number): number {
  return Math.round(cents + Math.sign(cents) * 1e-7);
}

/** "$1,234.56" from whole cents. */
export function formatDollars(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const abs = Math.abs(Math.round(cents));
  const dollars = Math.floor(abs / 100).toLocaleString('en-US');
  return `${sign}$${dollars}.${String(abs % 100).padStart(2, '0')}`;
}
