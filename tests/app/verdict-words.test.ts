import { describe, expect, it } from 'vitest';
import type { Finding } from '../../shared/rules/types';
import { findingTitle, verdictWords } from '../../components/check/verdict-words';

const finding = (ruleId: string, title: string, severity: Finding['severity'] = 'blocker'): Finding => ({
  ruleId,
  severity,
  title,
  detail: '',
  fix: '',
  basis: { kind: 'regulation', citation: '10 CFR 430.32(c)' },
  values: {},
});

describe('verdict and titles', () => {
  it('when the only blocker is an efficiency minimum, then the verdict is "Not compatible" and its title does not say "Not allowed"', () => {
    // DESIGN.md §7: "Not allowed" is the word for a regulation blocker only.
    const efficiency = finding('efficiency.regional-minimum', 'Not allowed: below the Southeast efficiency minimum');
    expect(verdictWords({ verdict: 'incompatible', findings: [efficiency] }).word).toBe('Not compatible');
    expect(findingTitle(efficiency)).toBe('Below the Southeast efficiency minimum');
  });

  it('when a refrigerant regulation blocks the job, then the verdict and the title both say "Not allowed"', () => {
    const regulation = finding('regulation.refrigerant-transition', 'Not allowed: R-410A new system');
    expect(verdictWords({ verdict: 'incompatible', findings: [regulation] }).word).toBe('Not allowed');
    expect(findingTitle(regulation)).toBe('Not allowed: R-410A new system');
  });

  it('when a title has no "Not allowed", then it is shown as the engine wrote it', () => {
    expect(findingTitle(finding('refrigerant.metering-device', 'Valve is for R-22; the unit runs R-454B'))).toBe('Valve is for R-22; the unit runs R-454B');
  });
});
