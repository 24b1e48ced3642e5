import { efficiencyFigures } from '../../efficiency/pairing-figures';
import { defineRule } from '../define-rule';
import type { Finding } from '../types';

/** The combination against the rebate tier the shop has configured (settings.rebateTier). */
export const rebateTier = defineRule({
  id: 'efficiency.rebate-tier',
  title: 'Rebate efficiency tier',
  basis: { kind: 'common-practice', citation: "The shop's configured rebate tier (program terms decide; confirm with the program)" },
  evaluate(pairing, context, tools) {
    const tier = context.settings.rebateTier;
    if (!tier) return [];
    const figures = efficiencyFigures(pairing);
    const isHeatPump = pairing.outdoor.spec.systemType === 'heat-pump';
    const checks: { metric: 'SEER2' | 'EER2' | 'HSPF2'; need?: number; have?: number }[] = [
      { metric: 'SEER2', need: tier.seer2, have: figures.seer2 },
      { metric: 'EER2', need: tier.eer2, have: figures.eer2 },
      { metric: 'HSPF2', need: isHeatPump ? tier.hspf2 : undefined, have: figures.hspf2 },
    ];
    const findings: Finding[] = [];
    const short: string[] = [];
    const values: Finding['values'] = { tier: tier.name, figuresFrom: figures.source };
    for (const c of checks) {
      if (c.need === undefined) continue;
      values[`min${c.metric}`] = c.need;
      values[c.metric.toLowerCase()] = c.have ?? null;
      if (c.have === undefined) findings.push(tools.missing(`rated ${c.metric}`, `the ${tier.name} ${c.metric} threshold not checked`));
      else if (c.have < c.need) short.push(`${c.metric} ${c.have} is below ${c.need}`);
    }
    if (short.length > 0) {
      findings.unshift(
        tools.finding({
          severity: 'caution',
          title: `Short of the ${tier.name} rebate tier: ${short.join(' and ')}`,
          detail: `Short of the ${tier.name} rebate tier: by ${figures.sourceText}, ${short.join(' and ')}.`,
          fix: `Pick a certified combination that reaches the ${tier.name} thresholds, or tell the customer the rebate does not apply.`,
          values,
        }),
      );
    }
    return findings;
  },
});
