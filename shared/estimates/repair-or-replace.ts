// The trade's age × repair-cost rule of thumb: replace when the system's age in years times the repair
// cost in dollars is above a threshold (often 5,000) — common practice (no source). The threshold is a shop setting.
import { formatDollars, roundCents } from './money';

export interface RepairOrReplaceFacts {
  ageYears: number;
  repairQuoteCents: number;
  refrigerant?: string;
  refrigerantLbs: number;
  refrigerantCentsPerLb: number;
  threshold: number;
}

export interface OptionSaving {
  optionId: number;
  name: string;
  totalCents: number;
  /** null when the option's saving is not worked out (no rated SEER2). */
  annualSavingCents: number | null;
  paybackYears: number | null;
  compatible: boolean;
}

export interface RepairOrReplaceAdvice {
  refrigerantCostCents: number;
  repairTotalCents: number;
  product: number;
  exceeds: boolean;
  ruleText: string;
  recommendation: 'replace' | 'repair' | 'either';
  recommendationText: string;
  arithmetic: string[];
  notes: string[];
}

/** Share of the threshold from which the call is "either" rather than "repair". */
const CLOSE_SHARE = 0.8;

/** Repair or replace from the facts (cents, years, pounds) and each option's saving, with the arithmetic in words. */
export function adviseRepairOrReplace(facts: RepairOrReplaceFacts, options: OptionSaving[]): RepairOrReplaceAdvice {
  const refrigerantCostCents = roundCents(facts.refrigerantLbs * facts.refrigerantCentsPerLb);
  const repairTotalCents = facts.repairQuoteCents + refrigerantCostCents;
  const product = Math.round(facts.ageYears * (repairTotalCents / 100));
  const exceeds = product > facts.threshold;
  const arithmetic = [
    `Refrigerant: ${facts.refrigerantLbs} lb × ${formatDollars(facts.refrigerantCentsPerLb)}/lb = ${formatDollars(refrigerantCostCents)}.`,
    `Repair total: ${formatDollars(facts.repairQuoteCents)} quote + ${formatDollars(refrigerantCostCents)} refrigerant = ${formatDollars(repairTotalCents)}.`,
    `Rule of thumb: ${facts.ageYears} years × ${(repairTotalCents / 100).toLocaleString('en-US')} dollars = ${product.toLocaleString('en-US')}, ${exceeds ? 'above' : 'not above'} the shop's threshold of ${facts.threshold.toLocaleString('en-US')}.`,
  ];
  const best = options
    .filter((o) => o.compatible && o.paybackYears !== null)
    .sort((a, b) => (a.paybackYears ?? Infinity) - (b.paybackYears ?? Infinity))[0];
  for (const o of options) {
    arithmetic.push(
      o.annualSavingCents === null
        ? `${o.name}: ${formatDollars(o.totalCents)}, saving not worked out (no rated SEER2 for this combination).`
        : o.paybackYears === null
          ? `${o.name}: ${formatDollars(o.totalCents)}, no energy saving over the existing system.`
          : `${o.name}: ${formatDollars(o.totalCents)} ÷ ${formatDollars(o.annualSavingCents)} a year saved = ${o.paybackYears} years payback.`,
    );
  }
  let recommendation: RepairOrReplaceAdvice['recommendation'];
  let recommendationText: string;
  if (exceeds) {
    recommendation = 'replace';
    recommendationText = `Replace: ${product.toLocaleString('en-US')} (age × repair dollars) is above ${facts.threshold.toLocaleString('en-US')}.`;
  } else if (product >= facts.threshold * CLOSE_SHARE) {
    recommendation = 'either';
    recommendationText = `Either: ${product.toLocaleString('en-US')} (age × repair dollars) is close to ${facts.threshold.toLocaleString('en-US')}; weigh the energy saving.`;
  } else {
    recommendation = 'repair';
    recommendationText = `Repair: ${product.toLocaleString('en-US')} (age × repair dollars) is well below ${facts.threshold.toLocaleString('en-US')}.`;
  }
  if (best) recommendationText += ` If replacing, "${best.name}" pays back fastest: ${best.paybackYears} years.`;
  const notes = ['The age × repair-cost rule is a trade rule of thumb (common practice, no source), not a guarantee.'];
  if (facts.refrigerant === 'R-22') {
    notes.push(
      'R-22 is no longer produced or imported in the US (phase-out completed 2020): recharges rely on reclaimed stock, so price and supply can change.',
    );
  }
  notes.push(
    "Refrigerant work, brazing, pressure tests and electrical work are for licensed technicians following the manufacturer's instructions and local codes.",
  );
  return {
    refrigerantCostCents,
    repairTotalCents,
    product,
    exceeds,
    ruleText: arithmetic[2],
    recommendation,
    recommendationText,
    arithmetic,
    notes,
  };
}
