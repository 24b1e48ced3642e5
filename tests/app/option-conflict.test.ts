import { describe, expect, it } from 'vitest';
import type { OptionView } from '@/shared/schemas/options';
import { optionConflictIntro, optionConflictRows } from '@/components/options/option-conflict';
import { draftFromOption } from '@/components/options/option-draft';

/** Only the fields the editor's draft reads; models and prices are invented for the test (nothing computed). */
const theirs = {
  id: 4,
  name: 'Heat pump, new coil',
  revision: 3,
  updatedAt: '2026-12-02T10:15:00.000Z',
  input: { name: 'Heat pump, new coil', outdoor: { id: 1 }, indoorCoil: { id: 2 }, markupPct: 35, taxRatePct: 7 },
  parts: {
    outdoor: { model: 'QX-HP36-B', kept: false, description: '' },
    indoorCoil: { model: 'QX-CL36-B', kept: false, description: '' },
  },
  lines: [
    { kind: 'fee', description: 'Permit', quantity: 1, unitPriceCents: 7500, priceSource: 'typed', taxable: false, extendedCents: 7500 },
  ],
  laborHours: 7,
  laborRateCents: 9500,
} as unknown as OptionView;

describe('the option conflict dialog rows', () => {
  it('when the form equals their version, then there is no row to choose between', () => {
    expect(optionConflictRows(draftFromOption(theirs), theirs)).toEqual([]);
  });

  it('when the estimator changed the name and the labor hours, then exactly those two rows show yours beside theirs', () => {
    const mine = { ...draftFromOption(theirs), name: 'Heat pump, mine', laborHours: '5' };
    expect(optionConflictRows(mine, theirs)).toEqual([
      { key: 'name', label: 'Name', mine: 'Heat pump, mine', theirs: 'Heat pump, new coil' },
      { key: 'laborHours', label: 'Labor hours', mine: '5', theirs: '7' },
    ]);
  });

  it('when the form drops the coil, switches to the shop pricing and adds no extras, then the rows say so in words', () => {
    const mine = { ...draftFromOption(theirs), indoorCoil: undefined, pricing: 'shop' as const, lines: [] };
    const rows = optionConflictRows(mine, theirs);
    expect(rows.map((r) => [r.key, r.mine, r.theirs])).toEqual([
      ['indoorCoil', '(none)', 'QX-CL36-B'],
      ['lines', '(none)', 'Permit × 1 at $75.00'],
      ['pricing', 'Shop default', 'Markup 35%'],
    ]);
  });

  it('when their version is described, then its name and revision are named', () => {
    expect(optionConflictIntro(theirs)).toMatch(/^“Heat pump, new coil” was saved again .* \(revision 3\)/);
  });
});
