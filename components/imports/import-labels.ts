import type { ImportKind } from '@/shared/schemas/equipment';
import type { DecimalConvention, ImportStatus } from '@/hooks/use-imports';
import type { DecimalSource } from '@/shared/schemas/imports';
import { KIND_LABELS } from '@/components/catalog/catalog-kind-labels';

/** What each import kind is called on screen: the catalog kinds, then distributor prices. */
export const IMPORT_KIND_LABELS: Record<ImportKind, string> = { ...KIND_LABELS, prices: 'Prices' };

export const STATUS_LABELS: Record<ImportStatus, string> = {
  preview: 'Preview, not committed',
  committed: 'Committed',
  reverted: 'Reverted',
};

export const STATUS_ICONS: Record<ImportStatus, string> = {
  preview: 'eye-outline',
  committed: 'check-circle-outline',
  reverted: 'undo-variant',
};

const FIELD_WORDS: Record<string, string> = {
  model: 'Model',
  price: 'Price',
  effective_from: 'Effective date',
  description: 'Description',
  currency: 'Currency',
};

/** A CSV field name in words: "effective_from" → "Effective date", "nominal_tons" → "Nominal tons". */
export function fieldLabel(field: string): string {
  if (FIELD_WORDS[field]) return FIELD_WORDS[field];
  const spaced = field.replace(/_/g, ' ');
  return spaced.charAt(0).toUpperCase() + spaced.slice(1);
}

/** "Mar 4, 2025, 2:05 PM" in the viewer's time zone. */
export function dateTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' });
}

/** The decimal-mark choices of a price upload, in plain words with an example amount. */
export const DECIMAL_CHOICES: ['auto' | DecimalConvention, string][] = [
  ['auto', 'Read it from the file'],
  ['point', '1,234.50 (decimal point)'],
  ['comma', '1.234,50 (decimal comma)'],
];

/** One line saying how a price file's amounts were read. */
export function decimalNote(convention: DecimalConvention | null | undefined, source: DecimalSource | null | undefined): string {
  if (!convention) return 'Amounts were whole numbers or read the same either way: no decimal mark was needed.';
  const how = convention === 'point' ? 'a decimal point (1,234.50)' : 'a decimal comma (1.234,50)';
  const why = source === 'chosen' ? 'as you chose' : source === 'saved' ? "as in this distributor's last file" : 'detected from the whole price column';
  return `Amounts read with ${how}, ${why}. A price that could be read either way is rejected, never guessed.`;
}
