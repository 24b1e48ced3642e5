import { describe, expect, it } from 'vitest';
import { regulationRules } from '../../../../shared/rules/regulation';
import { refrigerantTransition } from '../../../../shared/rules/regulation/refrigerant-transition';
import type { TransitionRule } from '../../../../shared/rules/types';
import { context, expectWellFormed, pairing, run, severities } from '../reference-fixtures';

describe('regulation.refrigerant-transition', () => {
  it.each([
    // 40 CFR 84.54, 88 FR 73098 (values.json REG-03) and 88 FR 88825 (REG-04)
    ['new R-410A, installed 2024-12-31', { installDate: '2024-12-31', outdoor: { manufactureDate: '2024-06-01' }, coil: { manufactureDate: '2024-06-01' } }, []],
    ['new R-410A made 2024, installed 2025-06-01', { installDate: '2025-06-01', outdoor: { manufactureDate: '2024-06-01' }, coil: { manufactureDate: '2024-03-01' } }, ['info']],
    ['new R-410A, coil made 2025, installed 2025-06-01', { installDate: '2025-06-01', outdoor: { manufactureDate: '2024-06-01' }, coil: { manufactureDate: '2025-01-01' } }, ['blocker']],
    ['new R-410A, no dates, installed 2025-06-01', { installDate: '2025-06-01' }, ['caution']],
    ['new R-410A made 2024, installed 2026-01-01', { installDate: '2026-01-01', outdoor: { manufactureDate: '2024-06-01' }, coil: { manufactureDate: '2024-06-01' } }, ['blocker']],
    ['new R-410A made 2024 with a kept coil, installed 2025-06-01', { installDate: '2025-06-01', outdoor: { manufactureDate: '2024-06-01' }, coilKept: true }, ['info']],
    ['R-410A repair, installed 2026-06-01', { scope: 'component-replacement' as const, installDate: '2026-06-01' }, ['info']],
    ['new R-454B, installed 2026-06-01', { installDate: '2026-06-01', outdoor: { refrigerant: 'R-454B' as const } }, []],
    // EPA 74 FR 66450, 40 CFR 82 Subpart I (REG-01): new R-22 systems barred from 2010
    ['new R-22 system, 2026', { installDate: '2026-06-01', outdoor: { refrigerant: 'R-22' as const } }, ['blocker']],
    ['new R-22 system, 2009-12-31', { installDate: '2009-12-31', outdoor: { refrigerant: 'R-22' as const } }, []],
    // 85 FR 15258 (REG-02): R-22 repair with reclaimed refrigerant only
    ['R-22 repair, 2026', { scope: 'component-replacement' as const, installDate: '2026-06-01', outdoor: { refrigerant: 'R-22' as const } }, ['caution']],
  ])('when %s, then %j', (_name, input, expected) => {
    expect(severities(refrigerantTransition, pairing(input))).toEqual(expected);
  });

  it('when a new R-410A system is blocked, then title and detail read "not allowed" and cite the rule', () => {
    const findings = run(refrigerantTransition, pairing({ installDate: '2026-03-01', outdoor: { manufactureDate: '2024-06-01' }, coil: { manufactureDate: '2024-06-01' } }));
    expect(findings).toHaveLength(1);
    const [f] = findings;
    expect(f.title).toMatch(/^Not allowed/);
    expect(f.detail).toMatch(/^Not allowed/);
    expect(f.basis).toEqual({ kind: 'regulation', citation: '40 CFR 84.54 as amended by EPA 88 FR 88825 (Dec 26, 2023)' });
    expect(f.values).toMatchObject({ ruleId: 'aim-gwp700-split-sell-through-end', installFrom: '2026-01-01' });
    expectWellFormed(refrigerantTransition, findings);
  });

  it('when two transition rules both forbid a new system, then one blocker cites both and no caution is left beside it', () => {
    // Parts made 2025 (after 40 CFR 84.54's 2025-01-01 limit, 88 FR 73098) installed 2026 (after 88 FR 88825's cutoff)
    const findings = run(refrigerantTransition, pairing({ installDate: '2026-03-01', outdoor: { manufactureDate: '2025-03-01' }, coil: { manufactureDate: '2025-03-01' } }));
    expect(findings.map((f) => f.severity)).toEqual(['blocker']);
    expect(findings[0].basis.citation).toMatch(/88 FR 73098.*; .*88 FR 88825|88 FR 88825.*; .*88 FR 73098/);
    expect(findings[0].detail).toMatch(/Also: /);
    expectWellFormed(refrigerantTransition, findings);
  });

  it('when a repair is checked, then the note says which rule allows it', () => {
    const [f] = run(refrigerantTransition, pairing({ scope: 'component-replacement', installDate: '2026-06-01' }));
    expect(f.detail).toMatch(/Allowed as a repair.*40 CFR 84\.54/);
  });

  it('when the office edits the sell-through end to a caution, then the rule follows the data', () => {
    const edited: TransitionRule[] = [
      { id: 'edited', refrigerants: ['R-410A'], scope: 'new-system', installFrom: '2026-01-01', severity: 'caution', citation: 'test citation', note: 'Enforcement deprioritized; confirm locally.' },
    ];
    const p = pairing({ installDate: '2026-06-01' });
    expect(severities(refrigerantTransition, p, context({}, edited))).toEqual(['caution']);
    expect(severities(refrigerantTransition, p, context({}, []))).toEqual([]);
  });
});

describe('regulationRules', () => {
  it('when the family is listed, then it has the contract id', () => {
    expect(regulationRules.map((r) => r.id)).toEqual(['regulation.refrigerant-transition']);
  });
});
