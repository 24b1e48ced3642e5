import { efficiencyFigures } from '../../efficiency/pairing-figures';
import { defineRule } from '../define-rule';
import type { Finding, RebateTierThresholds } from '../types';

type Metric = 'SEER2' | 'EER2' | 'HSPF2';
const METRICS: Metric[] = ['SEER2', 'EER2', 'HSPF2'];
const need = (tier: RebateTierThresholds, metric: Metric) => tier[metric.toLowerCase() as 'seer2' | 'eer2' | 'hspf2'];

/**
 * The combination against the shop's rebate tiers (settings.rebateTiers, the list on Admin → Pricing).
 * A tier it falls short of is a caution when it meets none of them; when it meets another tier the shortfall
 * is told as info (the shop sells to the tier it meets). A threshold whose figure is not rated is a missing fact.
 */
export const rebateTier = defineRule({
  id: 'efficiency.rebate-tier',
  title: 'Rebate efficiency tier',
  basis: { kind: 'common-practice', citation: "The shop's configured rebate tiers (program terms decide; confirm with the program)" },
  evaluate(pairing, context, tools) {
    const tiers = context.settings.rebateTiers ?? [];
    if (tiers.length === 0) return [];
    const figures = efficiencyFigures(pairing);
    const isHeatPump = pairing.outdoor.spec.systemType === 'heat-pump';
    const have: Record<Metric, number | undefined> = { SEER2: figures.seer2, EER2: figures.eer2, HSPF2: figures.hspf2 };
    const judged = tiers.map((tier) => {
      const values: Finding['values'] = { tier: tier.name, figuresFrom: figures.source };
      const short: string[] = [];
      const unknown: Metric[] = [];
      for (const metric of METRICS) {
        const min = metric === 'HSPF2' && !isHeatPump ? undefined : need(tier, metric);
        if (min === undefined) continue;
        values[`min${metric}`] = min;
        values[metric.toLowerCase()] = have[metric] ?? null;
        const value = have[metric];
        if (value === undefined) unknown.push(metric);
        else if (value < min) short.push(`${metric} ${value} is below ${min}`);
      }
      return { tier, values, short, unknown };
    });
    const met = judged.filter((j) => j.short.length === 0 && j.unknown.length === 0).map((j) => j.tier.name);
    const findings: Finding[] = [];
    for (const { tier, values, short } of judged) {
      if (short.length === 0) continue;
      const meets = met.length ? ` (meets ${met.join(', ')})` : '';
      findings.push(
        tools.finding({
          severity: met.length ? 'info' : 'caution',
          title: `Short of the ${tier.name} rebate tier${meets}: ${short.join(' and ')}`,
          detail: `Short of the ${tier.name} rebate tier: by ${figures.sourceText}, ${short.join(' and ')}.${met.length ? ` It meets ${met.join(', ')}.` : ''}`,
          fix: `Pick a certified combination that reaches the ${tier.name} thresholds, or tell the customer the rebate does not apply.`,
          values,
        }),
      );
    }
    for (const metric of METRICS) {
      const names = judged.filter((j) => j.unknown.includes(metric)).map((j) => j.tier.name);
      if (names.length) findings.push(tools.missing(`rated ${metric}`, `the ${names.join(' and ')} ${metric} threshold not checked`));
    }
    return findings;
  },
});
