import { describe, expect, it } from 'vitest';
import { DEFAULT_CONTEXT } from '../../../shared/rules/engine';
import { findRatedCombination, modelMatches } from '../../../shared/rules/rated-match';
import { noRatedCombination } from '../../../shared/rules/rating/no-rated-combination';
import { ratedCombination } from '../../../shared/rules/rating/rated-combination';
import { normalizeModel } from '../../../shared/schemas/fields';
import type { Pairing } from '../../../shared/rules/types';
import { edit } from './worked-case-builder';

/**
 * Issue 12 item 9: rated-combination rows may name model families with `*` (any run) and `?` (one
 * character), matched on the normalised model; the most specific row wins; a coil-only row covers the
 * coil on any furnace. Item 10: an uncertified split AC in the Southeast or Southwest is a blocker.
 * Models and figures are invented; the pairing is the clean R-454B install (HW-C36-B4 + HW-K36-MP on HW-F80-17).
 */
describe('model family patterns', () => {
  it.each([
    ['HW-C36*', 'HW-C36-B4', true],
    ['HW-C36*', 'HW-C48-B4', false],
    ['HW-C??-B4', 'HW-C36-B4', true],
    ['HW-C??-B4', 'HW-C360-B4', false],
    ['hw c36 b4', 'HW-C36-B4', true],
    ['HW-C36-B4', 'HW-C36-B5', false],
  ] as const)('when the row reads %s and the unit is %s, then it matches: %s', (pattern, model, expected) => {
    expect(modelMatches(pattern, normalizeModel(model))).toBe(expected);
  });
});

describe('the most specific row wins', () => {
  const rows = (list: NonNullable<Pairing['ratedCombinations']>) => edit((p) => (p.ratedCombinations = list));

  it('when an exact row and a family row both match, then the exact row wins', () => {
    const p = rows([
      { outdoorModel: 'HW-C36*', indoorModel: 'HW-K36*', seer2: 14.5, reference: 'FAMILY' },
      { outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', seer2: 15.2, reference: 'EXACT' },
    ]);
    expect(findRatedCombination(p)?.reference).toBe('EXACT');
  });

  it('when two family rows match, then the one with more literal characters wins', () => {
    const p = rows([
      { outdoorModel: 'HW-C*', indoorModel: 'HW-K*', seer2: 14, reference: 'BROAD' },
      { outdoorModel: 'HW-C36-?4', indoorModel: 'HW-K36*', seer2: 15, reference: 'NARROW' },
    ]);
    expect(findRatedCombination(p)?.reference).toBe('NARROW');
  });

  it('when a row names the furnace and another is coil-only, then the furnace row wins; with another furnace, the coil-only row covers it', () => {
    const list = [
      { outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', seer2: 15.2, reference: 'COIL-ONLY' },
      { outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', airHandlerModel: 'HW-F80*', seer2: 16, reference: 'WITH-FURNACE' },
    ];
    expect(findRatedCombination(rows(list))?.reference).toBe('WITH-FURNACE');
    const otherFurnace = edit((p) => {
      p.ratedCombinations = list;
      p.airHandler!.spec.model = 'QX-F100';
    });
    expect(findRatedCombination(otherFurnace)?.reference).toBe('COIL-ONLY');
  });

  it('when a family row matches, then the finding names the row', () => {
    const [f] = ratedCombination.evaluate(
      rows([{ outdoorModel: 'HW-C36*', indoorModel: 'HW-K36-??', seer2: 15, reference: 'FAM-1' }]),
      DEFAULT_CONTEXT,
    );
    expect(f.detail).toContain('(row HW-C36* with HW-K36-??)');
    expect(f.values.matchedOutdoorModel).toBe('HW-C36*');
  });
});

describe('uncertified split air conditioners by region (item 10)', () => {
  // 10 CFR 430.32(c): Southeast/Southwest split-AC standards apply to the installed combination (values.json EFF-02)
  const uncertified = (state: string, systemType: 'ac' | 'heat-pump' = 'ac') =>
    noRatedCombination.evaluate(
      edit((p) => {
        p.ratedCombinations = [];
        p.site!.state = state;
        p.outdoor.spec.systemType = systemType;
      }),
      DEFAULT_CONTEXT,
    );

  it.each([
    ['FL', 'ac', 'blocker'],
    ['AZ', 'ac', 'blocker'],
    ['OH', 'ac', 'caution'],
    ['FL', 'heat-pump', 'caution'],
  ] as const)('when an uncertified split %2$s is installed in %1$s, then it is a %3$s', (state, type, severity) => {
    expect(uncertified(state, type).map((f) => f.severity)).toEqual([severity]);
  });

  it('when the blocker is shown, then it says the combination cannot be shown to meet the regional standard and how to fix it', () => {
    const [f] = uncertified('TX');
    expect(f.title).toContain('cannot be shown to meet the Southeast regional standard');
    expect(f.fix).toMatch(/certified combination/);
    expect(f.basis.kind).toBe('regulation');
  });

  it('worked: a split AC in Georgia matched only by a family row is certified, so no blocker', () => {
    // A senior tech: "The directory lists the whole HW-C36 family with the K36 coils; our units are in it,
    // so the combination is certified and the Southeast check runs on its figures."
    const p = edit((q) => {
      q.site!.state = 'GA';
      q.ratedCombinations = [{ outdoorModel: 'HW-C36*', indoorModel: 'HW-K36*', seer2: 15, eer2: 12.2 }];
    });
    expect(noRatedCombination.evaluate(p, DEFAULT_CONTEXT)).toEqual([]);
  });
});
