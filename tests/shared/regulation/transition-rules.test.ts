import { describe, expect, it } from 'vitest';
import { AIM_GWP_LIMIT, applicableTransitions, DEFAULT_TRANSITION_RULES, latestManufactureDate, refrigerantsOverGwpLimit } from '../../../shared/regulation';

const byId = (id: string) => DEFAULT_TRANSITION_RULES.find((r) => r.id === id)!;

describe('refrigerant transition rules as data', () => {
  it('when the R-22 rule is read, then new R-22 systems are barred from 2010-01-01', () => {
    // EPA 74 FR 66450 (Dec 15, 2009), 40 CFR 82 Subpart I (values.json REG-01)
    const r = byId('r22-new-system');
    expect(r).toMatchObject({ refrigerants: ['R-22'], scope: 'new-system', installFrom: '2010-01-01', severity: 'blocker' });
    expect(r.manufacturedBefore).toBeUndefined();
  });

  it('when the AIM Act limit is applied, then R-410A and R-407C are over it and the A2Ls are not', () => {
    // 40 CFR 84.54(a)(1) "700 or greater", 88 FR 73098; AR4 GWPs R-410A 2088, R-32 675, R-454B 466 (values.json REG-03)
    expect(AIM_GWP_LIMIT).toBe(700);
    expect(refrigerantsOverGwpLimit().sort()).toEqual(['R-407C', 'R-410A']);
    // 700 itself fails ("700 or greater"): R-32 at 675 passes a 700 limit but fails a 675 one
    expect(refrigerantsOverGwpLimit(675)).toContain('R-32');
  });

  it('when the AIM new-split rule is read, then it starts 2025-01-01 with a pre-2025 component exemption', () => {
    // 40 CFR 84.54, 88 FR 73098 (REG-03) and 88 FR 88825 (REG-04)
    expect(byId('aim-gwp700-new-split')).toMatchObject({ installFrom: '2025-01-01', manufacturedBefore: '2025-01-01', scope: 'new-system' });
    const end = byId('aim-gwp700-split-sell-through-end');
    expect(end).toMatchObject({ installFrom: '2026-01-01', scope: 'new-system' });
    expect(end.note).toMatch(/Uncertain/);
  });

  it('when every rule is read, then each has a citation and a note', () => {
    for (const r of DEFAULT_TRANSITION_RULES) {
      expect(r.citation).toMatch(/CFR|FR/);
      expect(r.note.length).toBeGreaterThan(20);
    }
  });
});

describe('applicableTransitions', () => {
  const rules = DEFAULT_TRANSITION_RULES;
  it.each([
    // REG-03/REG-04: 2025 install with components made 2024 → exempt from the first, before the second
    ['R-410A', 'new-system', '2025-06-01', '2024-10-01', ['exempt:aim-gwp700-new-split']],
    // made 2025 → applies
    ['R-410A', 'new-system', '2025-06-01', '2025-02-01', ['applies:aim-gwp700-new-split']],
    // 2026 install, made 2024 → the sell-through end applies
    ['R-410A', 'new-system', '2026-01-01', '2024-10-01', ['exempt:aim-gwp700-new-split', 'applies:aim-gwp700-split-sell-through-end']],
    // 2024-12-31 install: nothing yet
    ['R-410A', 'new-system', '2024-12-31', '2024-10-01', []],
    // repair: allowed
    ['410a', 'component-replacement', '2026-06-01', '2025-06-01', ['repair-allowed:aim-gwp700-new-split', 'repair-allowed:aim-gwp700-split-sell-through-end']],
    // A2L: no rule
    ['R-454B', 'new-system', '2026-06-01', '2026-01-01', []],
    // REG-01/REG-02: R-22 repair
    ['R-22', 'component-replacement', '2026-06-01', undefined, ['repair-allowed:r22-new-system', 'applies:r22-service-only']],
  ] as const)('when %s %s on %s made %s, then %j', (refrigerant, scope, installDate, manufactureDate, expected) => {
    const out = applicableTransitions(rules, { refrigerant, scope, installDate, manufactureDate });
    expect(out.map((o) => `${o.kind}:${o.rule.id}`)).toEqual(expected);
  });

  it('when the manufacture date is not given, then the exemption is unknown', () => {
    const out = applicableTransitions(rules, { refrigerant: 'R-410A', scope: 'new-system', installDate: '2025-03-01' });
    expect(out.map((o) => o.kind)).toEqual(['unknown-manufacture']);
  });

  it('when dates are given, then the latest one is taken', () => {
    expect(latestManufactureDate(['2024-01-02', undefined, '2024-11-30', '2023-05-01'])).toBe('2024-11-30');
    expect(latestManufactureDate([undefined])).toBeUndefined();
  });
});
