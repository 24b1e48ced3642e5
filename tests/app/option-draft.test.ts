import { describe, expect, it } from 'vitest';
import type { OptionLine, OptionView } from '@/shared/schemas/options';
import { buildOptionInput, draftFromOption, emptyDraft, lineInput, type OptionDraft } from '@/components/options/option-draft';
import { energyQueryOf, emptyRepairTexts, repairInputOf } from '@/components/options/repair-draft';
import { recentlySent, rememberSent, RESEND_ASK_MS } from '@/components/options/proposal-sends';

const savedLine = (over: Partial<OptionLine>): OptionLine => ({
  kind: 'filter-drier',
  description: 'Filter-drier',
  model: 'FD-083',
  quantity: 1,
  unitPriceCents: 2_950,
  priceSource: 'price-list',
  distributor: 'Harbor Line Supply',
  effectiveFrom: '2025-01-02',
  taxable: true,
  extendedCents: 2_950,
  currentPriceDiffers: false,
  ...over,
});

const withParts = (over: Partial<OptionDraft> = {}): OptionDraft => ({ ...emptyDraft(), name: 'Heat pump, keep the air handler', outdoor: { id: 7, label: 'HP-36', kept: false }, ...over });

describe('the option editor draft', () => {
  it('when a new option names its parts and no extras, then the input carries ids, the kept air handler and no pricing overrides', () => {
    const built = buildOptionInput(withParts({ indoorCoil: { id: 9, label: 'C-1', kept: false }, airHandler: { id: 4, label: 'AH', kept: true } }));
    expect(built).toEqual({ input: { name: 'Heat pump, keep the air handler', outdoor: { id: 7 }, indoorCoil: { id: 9, kept: false }, airHandler: { id: 4, kept: true }, lines: [] } });
  });

  it('when no outdoor unit is picked or the name is blank, then it says so in words', () => {
    const none = buildOptionInput({ ...emptyDraft(), name: 'x' });
    expect('problems' in none && none.problems).toContain('Pick the new outdoor unit.');
    const blank = buildOptionInput(withParts({ name: '  ' }));
    expect('problems' in blank && blank.problems.join(' ')).toContain('name the option');
  });

  it('when a line has a typed price, then it is a typed line in cents; with only a model, the server prices it', () => {
    // $4.50 → 450 cents (arithmetic).
    expect(lineInput({ kind: 'line-set', description: 'Line set', model: '', quantity: '25', price: '4.50' })).toEqual({
      kind: 'line-set',
      description: 'Line set',
      quantity: 25,
      unitPriceCents: 450,
      priceSource: 'typed',
    });
    expect(lineInput({ kind: 'pad', description: '', model: 'PAD-3', quantity: '1', price: '' })).toEqual({ kind: 'pad', description: 'Pad', model: 'PAD-3', quantity: 1 });
    expect(lineInput({ kind: 'pad', description: '', model: '', quantity: '1', price: '' })).toMatch(/type a price/);
    expect(lineInput({ kind: 'pad', description: '', model: '', quantity: '0', price: '5' })).toMatch(/quantity above 0/);
  });

  it('when a saved line comes back untouched, then its snapshot (distributor, date, price) is sent as it was', () => {
    const line = savedLine({});
    const out = lineInput({ kind: 'filter-drier', description: 'Filter-drier', model: 'FD-083', quantity: '2', price: '29.50', snapshot: line });
    expect(out).toMatchObject({ unitPriceCents: 2_950, priceSource: 'price-list', distributor: 'Harbor Line Supply', effectiveFrom: '2025-01-02', quantity: 2 });
    // Retyped: a typed price from now on.
    const retyped = lineInput({ kind: 'filter-drier', description: 'Filter-drier', model: 'FD-083', quantity: '1', price: '27', snapshot: line });
    expect(retyped).toMatchObject({ unitPriceCents: 2_700, priceSource: 'typed' });
  });

  it('when a saved option is edited and its coil swapped, then the outdoor unit keeps its saved line and the old coil line is dropped', () => {
    const option = {
      id: 3,
      revision: 2,
      name: 'A',
      input: { name: 'A', outdoor: { id: 7 }, indoorCoil: { id: 9, kept: false }, markupPct: 30 },
      parts: { outdoor: { id: 7, model: 'HP-36', kept: false, description: '' }, indoorCoil: { id: 9, model: 'C-1', kept: false, description: '' } },
      lines: [savedLine({ kind: 'outdoor-unit', model: 'HP-36', unitPriceCents: 245_000 }), savedLine({ kind: 'indoor-coil', model: 'C-1', unitPriceCents: 61_240 }), savedLine({})],
      laborHours: 6,
      laborRateCents: 9_500,
    } as unknown as OptionView;
    const draft = draftFromOption(option);
    expect(draft.pricing).toBe('markup');
    expect(draft.pct).toBe('30');
    expect(draft.lines).toHaveLength(1);
    const built = buildOptionInput({ ...draft, indoorCoil: { id: 10, label: 'C-2', kept: false } });
    if (!('input' in built)) throw new Error(built.problems.join(' '));
    expect(built.input.lines?.map((l) => l.kind)).toEqual(['outdoor-unit', 'filter-drier']);
    expect(built.input.lines?.[0]).toMatchObject({ unitPriceCents: 245_000, priceSource: 'price-list' });
    expect(built.input).toMatchObject({ indoorCoil: { id: 10, kept: false }, laborHours: 6, laborRateCents: 9_500, markupPct: 30 });
  });

  it('when a markup is chosen but not given, then it asks for it', () => {
    const built = buildOptionInput(withParts({ pricing: 'markup', pct: '' }));
    expect('problems' in built && built.problems.join(' ')).toContain('markup');
  });
});

describe('repair or replace inputs', () => {
  it('when the existing figures are typed, then only those in range reach the energy comparison', () => {
    expect(energyQueryOf({ ...emptyRepairTexts(), ageYears: '15', existingSeer2: '10', existingHspf2: '99' })).toEqual({ existingAgeYears: 15, existingSeer2: 10 });
  });
  it('when the repair is complete, then the body carries cents; when the quote is missing, then it asks', () => {
    // $1,800 → 180000 cents; $85 a pound → 8500 (arithmetic).
    const built = repairInputOf({ ...emptyRepairTexts(), ageYears: '15', repairQuote: '1,800', refrigerant: 'R-22', refrigerantLbs: '6', refrigerantPerLb: '85' });
    expect(built).toEqual({ input: { existingAgeYears: 15, ageYears: 15, repairQuoteCents: 180_000, refrigerant: 'R-22', refrigerantLbs: 6, refrigerantCentsPerLb: 8_500 } });
    const missing = repairInputOf({ ...emptyRepairTexts(), ageYears: '15' });
    expect('problems' in missing && missing.problems).toEqual(['Enter the repair quote in dollars.']);
  });
});

describe('sending the proposal twice', () => {
  it('when a proposal went out under a minute ago, then a second send asks first; after the minute, it does not', () => {
    rememberSent(41, 'a@example.test', 1_000);
    expect(recentlySent(41, 1_000 + RESEND_ASK_MS - 1)?.to).toBe('a@example.test');
    expect(recentlySent(41, 1_000 + RESEND_ASK_MS)).toBeUndefined();
    expect(recentlySent(42, 1_001)).toBeUndefined();
  });
});
