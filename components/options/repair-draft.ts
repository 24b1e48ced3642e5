import { RepairOrReplaceInputSchema, type EnergyQuery, type RepairOrReplaceInput } from '@/shared/schemas/options';
import { centsFromText } from './option-words';

/** The existing system and the repair as typed on the screen (all text, so a half-typed number stays). */
export interface RepairTexts {
  ageYears: string;
  existingSeer2: string;
  existingHspf2: string;
  repairQuote: string;
  refrigerant: string;
  refrigerantLbs: string;
  refrigerantPerLb: string;
}

export const emptyRepairTexts = (): RepairTexts => ({ ageYears: '', existingSeer2: '', existingHspf2: '', repairQuote: '', refrigerant: '', refrigerantLbs: '', refrigerantPerLb: '' });

const num = (t: string): number | undefined => {
  const s = t.trim().replace(',', '.');
  if (s === '') return undefined;
  const n = Number(s);
  return Number.isFinite(n) ? n : undefined;
};

/**
 * The existing-system facts the options' energy comparison takes: only the ones typed and in range
 * (what is missing the server estimates from the age, and says so).
 */
export function energyQueryOf(t: RepairTexts): EnergyQuery {
  const q: EnergyQuery = {};
  const age = num(t.ageYears);
  const seer2 = num(t.existingSeer2);
  const hspf2 = num(t.existingHspf2);
  if (age !== undefined && age >= 0 && age <= 60) q.existingAgeYears = age;
  if (seer2 !== undefined && seer2 >= 5 && seer2 <= 40) q.existingSeer2 = seer2;
  if (hspf2 !== undefined && hspf2 >= 3 && hspf2 <= 15) q.existingHspf2 = hspf2;
  return q;
}

/** The body of POST /api/jobs/:id/repair-or-replace, validated by the shared schema; or what to fix, in words. */
export function repairInputOf(t: RepairTexts): { input: RepairOrReplaceInput } | { problems: string[] } {
  const problems: string[] = [];
  const age = num(t.ageYears);
  if (age === undefined) problems.push('Enter the system’s age in years.');
  const quote = centsFromText(t.repairQuote);
  if (quote === undefined) problems.push('Enter the repair quote in dollars.');
  const lbs = num(t.refrigerantLbs);
  const perLb = t.refrigerantPerLb.trim() ? centsFromText(t.refrigerantPerLb) : undefined;
  if (t.refrigerantLbs.trim() && lbs === undefined) problems.push('Refrigerant pounds must be a number.');
  if (t.refrigerantPerLb.trim() && perLb === undefined) problems.push('The refrigerant price per pound must be a sum of money.');
  if (problems.length) return { problems };
  const raw = {
    ...energyQueryOf(t),
    ageYears: age,
    repairQuoteCents: quote,
    ...(t.refrigerant ? { refrigerant: t.refrigerant } : {}),
    ...(lbs !== undefined ? { refrigerantLbs: lbs } : {}),
    ...(perLb !== undefined ? { refrigerantCentsPerLb: perLb } : {}),
  };
  const parsed = RepairOrReplaceInputSchema.safeParse(raw);
  if (!parsed.success) return { problems: parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`) };
  return { input: parsed.data };
}
