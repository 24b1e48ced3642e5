import { applicableTransitions, latestManufactureDate } from '../../regulation';
import { defineRule } from '../define-rule';
import { capitalize, withArticle } from '../text';
import type { Finding, Pairing } from '../types';

/** The refrigerant transition rules in force (context.transitionRules, data with effective dates). */
export const refrigerantTransition = defineRule({
  id: 'regulation.refrigerant-transition',
  title: 'Refrigerant rules in force',
  basis: { kind: 'regulation', citation: '40 CFR Part 82 (R-22) and 40 CFR 84.54 (AIM Act technology transitions)' },
  evaluate(pairing, context, tools) {
    if (!pairing.installDate) return [tools.missing('install date', 'refrigerant rules not checked')];
    const refrigerant = pairing.outdoor.spec.refrigerant;
    const manufactureDate = componentsMadeBy(pairing);
    const outcomes = applicableTransitions(context.transitionRules, { refrigerant, scope: pairing.scope, installDate: pairing.installDate, manufactureDate });
    const job = pairing.scope === 'new-system' ? `a new ${refrigerant} system` : `${withArticle(refrigerant)} component replacement`;
    const jobShort = pairing.scope === 'new-system' ? `new ${refrigerant} system` : `${refrigerant} component replacement`;
    const findings: Finding[] = [];
    for (const o of outcomes) {
      const basis = { kind: 'regulation' as const, citation: o.rule.citation };
      const values = { ruleId: o.rule.id, refrigerant, scope: pairing.scope, installDate: pairing.installDate, installFrom: o.rule.installFrom, manufacturedBefore: o.rule.manufacturedBefore ?? null, manufactureDate: manufactureDate ?? null };
      if (o.kind === 'applies' && o.rule.severity === 'blocker') {
        findings.push(
          tools.finding({
            severity: 'blocker',
            title: `Not allowed: ${withArticle(jobShort)} installed ${pairing.installDate}`,
            detail: `Not allowed: ${job} installed ${pairing.installDate}${manufactureDate ? ` with components made ${manufactureDate}` : ''}, under ${o.rule.citation} (in force from ${o.rule.installFrom}). ${o.rule.note}`,
            fix: pairing.scope === 'new-system'
              ? 'Choose a system with an allowed refrigerant (for example an A2L system listed for it), or, if the job is really a repair of an existing system, check it as a component replacement.'
              : 'Choose a part allowed for servicing this system.',
            basis,
            values,
          }),
        );
      } else if (o.kind === 'applies') {
        findings.push(tools.finding({ severity: 'caution', title: `${capitalize(jobShort)}: a condition applies`, detail: `${capitalize(job)} installed ${pairing.installDate}: ${o.rule.note}`, fix: 'Follow the condition above; keep records of the refrigerant used.', basis, values }));
      } else if (o.kind === 'unknown-manufacture') {
        findings.push(
          tools.finding({
            severity: 'caution',
            title: `${capitalize(jobShort)}: allowed only if made before ${o.rule.manufacturedBefore}`,
            detail: `${capitalize(job)} installed ${pairing.installDate} is allowed under ${o.rule.citation} only if its refrigerant components were made before ${o.rule.manufacturedBefore}; the manufacture date is not given.`,
            fix: `Read the manufacture dates on the outdoor unit and coil nameplates; made on or after ${o.rule.manufacturedBefore}, they may not be used for a new system.`,
            basis,
            values,
          }),
        );
      } else if (o.kind === 'exempt') {
        findings.push(tools.finding({ severity: 'info', title: `Exempt: parts made before ${o.rule.manufacturedBefore}`, detail: `Components made ${o.manufactureDate}, before ${o.rule.manufacturedBefore}: exempt from ${o.rule.citation}.`, fix: '', basis, values }));
      } else if (o.kind === 'repair-allowed') {
        findings.push(
          tools.finding({
            severity: 'info',
            title: 'Allowed as a repair of an existing system',
            detail: `Allowed as a repair of an existing system: ${o.rule.citation} restricts new systems only; parts sold for servicing existing equipment must not be used to build a new system.`,
            fix: '',
            basis,
            values,
          }),
        );
      }
    }
    return tidy(findings);
  },
});

/** Latest manufacture date of the refrigerant parts; undefined if a new part's date is unknown. A kept part is old by definition. */
function componentsMadeBy(pairing: Pairing): string | undefined {
  const dates: (string | undefined)[] = [pairing.outdoor.kept ? undefined : pairing.outdoor.spec.manufactureDate];
  if (!pairing.outdoor.kept && !pairing.outdoor.spec.manufactureDate) return undefined;
  const coil = pairing.indoorCoil;
  if (coil && !coil.kept) {
    if (!coil.spec.manufactureDate) return undefined;
    dates.push(coil.spec.manufactureDate);
  }
  return latestManufactureDate(dates);
}

/**
 * One verdict per refrigerant: several rules that forbid the install become one blocker citing each
 * (and the conditions of the others are moot); a blocker or caution makes the exemption and repair
 * notes beside it noise; one repair note is enough.
 */
function tidy(findings: Finding[]): Finding[] {
  const blockers = findings.filter((f) => f.severity === 'blocker');
  if (blockers.length > 1) {
    const [first, ...rest] = blockers;
    return [
      {
        ...first,
        detail: [first.detail, ...rest.map((f) => `Also: ${f.detail}`)].join(' '),
        basis: { kind: 'regulation', citation: blockers.map((f) => f.basis.citation).join('; ') },
        values: { ...first.values, alsoRuleIds: rest.map((f) => String(f.values.ruleId)).join(', ') },
      },
    ];
  }
  if (blockers.length === 1) return blockers;
  const serious = findings.some((f) => f.severity !== 'info');
  const infos = findings.filter((f) => f.severity === 'info');
  if (serious) return findings.filter((f) => f.severity !== 'info');
  const repair = infos.filter((f) => f.detail.startsWith('Allowed as a repair'));
  return [...infos.filter((f) => !f.detail.startsWith('Allowed as a repair')), ...repair.slice(0, 1)];
}
