import { describe, expect, it } from 'vitest';
import { defineRule } from '../../../shared/rules/define-rule';
import { DEFAULT_CONTEXT, fixedFindings, runChecks } from '../../../shared/rules/engine';
import type { Pairing } from '../../../shared/rules/types';
import { makePairing, testContext } from './pairing-builder';
import { REGRESSION_PAIRINGS } from './regression-pairings';

const basis = { kind: 'common-practice', citation: 'test' } as const;
const note = (id: string, evaluate: (p: Pairing) => boolean) =>
  defineRule({ id, title: id, basis, evaluate: (p, _c, tools) => (evaluate(p) ? [tools.finding({ severity: 'caution', detail: id, fix: '', values: {} })] : []) });

describe('fixedFindings (the coil search works out the rules that never read the coil once)', () => {
  it('when a rule reads only other parts, then its findings are fixed; when it reads the coil in any way, then it runs per coil', () => {
    const pairing = makePairing();
    const rules = [
      note('a.outdoor-only', (p) => p.outdoor.spec.nominalTons > 2),
      note('b.reads-coil', (p) => (p.indoorCoil?.spec.maxTons ?? 0) > 1),
      note('c.asks-for-coil', (p) => 'indoorCoil' in p),
      note('d.spreads-pairing', (p) => Object.keys({ ...p }).length > 0),
    ];
    const known = fixedFindings(pairing, testContext(), 'indoorCoil', rules);
    expect(known.map((k) => k !== undefined)).toEqual([true, false, false, false]);
    expect(known[0]).toEqual(rules[0].evaluate(pairing, testContext()));
  });

  it('when two rules share a memo keyed on the pairing object, then the second rule is not taken as blind to the coil', () => {
    let memo: { pairing: Pairing; tons: number } | undefined;
    const coilTons = (p: Pairing) => {
      if (memo?.pairing !== p) memo = { pairing: p, tons: p.indoorCoil?.spec.maxTons ?? 0 };
      return memo.tons;
    };
    const rules = [note('a.first', (p) => coilTons(p) > 1), note('b.second', (p) => coilTons(p) > 1)];
    const known = fixedFindings(makePairing(), testContext(), 'indoorCoil', rules);
    expect(known).toEqual([undefined, undefined]);
  });

  it('when every coil of the regression pairings is checked against every other pairing, then using the fixed findings gives exactly the full run', () => {
    // The reference is the engine's own full run of the same pairing (no outside source needed: equivalence).
    const cases = REGRESSION_PAIRINGS.map((c) => c.pairing());
    const coils = cases.map((p) => p.indoorCoil).filter((c) => c !== undefined);
    let compared = 0;
    for (const base of cases) {
      const known = fixedFindings({ ...base, indoorCoil: coils[0] }, DEFAULT_CONTEXT, 'indoorCoil');
      expect(known.some((k) => k !== undefined)).toBe(true);
      expect(known.some((k) => k === undefined)).toBe(true);
      for (const coil of coils) {
        const pairing = { ...base, indoorCoil: coil };
        expect(runChecks(pairing, DEFAULT_CONTEXT, undefined, known)).toEqual(runChecks(pairing, DEFAULT_CONTEXT));
        compared++;
      }
    }
    expect(compared).toBe(cases.length * coils.length);
  });
});
