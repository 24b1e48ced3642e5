import type { OptionView } from '@/shared/schemas/options';
import type { ConflictRow } from '@/components/ui/conflict-row';
import { whenText } from '@/components/jobs/job-words';
import { draftFromOption, EXTRA_KIND_WORDS, type DraftPart, type OptionDraft } from './option-draft';

const blank = (v: string) => (v.trim() ? v.trim() : '(empty)');
const partText = (p?: DraftPart) => (p ? `${p.label}${p.kept ? ' (kept)' : ''}` : '(none)');
const pricingText = (d: OptionDraft) =>
  d.pricing === 'shop' ? 'Shop default' : `${d.pricing === 'markup' ? 'Markup' : 'Target margin'} ${blank(d.pct)}%`;
const linesText = (d: OptionDraft) =>
  d.lines.length
    ? d.lines
        .map((l) => `${l.description.trim() || EXTRA_KIND_WORDS[l.kind]} × ${l.quantity}${l.price ? ` at $${l.price}` : ''}`)
        .join('; ')
    : '(none)';

/** The fields an estimator can edit, each in words, in the editor's order. */
const FIELDS: { key: string; label: string; text(d: OptionDraft): string }[] = [
  { key: 'name', label: 'Name', text: (d) => blank(d.name) },
  { key: 'outdoor', label: 'New outdoor unit', text: (d) => partText(d.outdoor) },
  { key: 'indoorCoil', label: 'Indoor coil', text: (d) => partText(d.indoorCoil) },
  { key: 'airHandler', label: 'Air handler or furnace', text: (d) => partText(d.airHandler) },
  { key: 'lines', label: 'Extras', text: linesText },
  { key: 'laborHours', label: 'Labor hours', text: (d) => blank(d.laborHours) },
  { key: 'laborRate', label: 'Rate, $ an hour', text: (d) => blank(d.laborRate) },
  { key: 'pricing', label: 'Pricing', text: pricingText },
  { key: 'taxRate', label: 'Tax rate, %', text: (d) => blank(d.taxRate) },
];

/** Where the estimator's form differs from the option someone else saved meanwhile: yours beside theirs. */
export function optionConflictRows(mine: OptionDraft, theirs: OptionView): ConflictRow[] {
  const other = draftFromOption(theirs);
  return FIELDS.map((f) => ({ key: f.key, label: f.label, mine: f.text(mine), theirs: f.text(other) })).filter((r) => r.mine !== r.theirs);
}

/** Who saved the option again and when, for the conflict dialog. */
export function optionConflictIntro(theirs: Pick<OptionView, 'name' | 'updatedAt' | 'revision'>): string {
  return `“${theirs.name}” was saved again ${whenText(theirs.updatedAt)} (revision ${theirs.revision}) while you edited. Nothing is lost yet: choose which to keep; keeping yours saves it over theirs.`;
}
