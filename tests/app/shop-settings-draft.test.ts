import { describe, expect, it } from 'vitest';
import { bodyOf, centsOf, defaultHint, draftOf, dollarsText, emptyTier, LABOR_FIELD, TAX_FIELD } from '@/components/settings/shop-settings-draft';
import { DEFAULT_SHOP_SETTINGS } from '@/shared/estimates/shop-defaults';
import type { ShopSettings } from '@/shared/schemas/options';

const draftFrom = (over: Partial<ShopSettings> = {}) => draftOf({ settings: { ...DEFAULT_SHOP_SETTINGS, ...over } });

describe('Admin → Pricing draft: dollars typed, cents sent', () => {
  it('when the stored labor rate is 9500 cents, then the admin sees 95.00 dollars and an unchanged draft sends 9500 back', () => {
    const draft = draftFrom({ laborRateCents: 9500 });
    expect(draft.values.laborRateCents).toBe('95.00');
    const result = bodyOf(draft);
    expect(result.ok).toBe(true);
    // Every setting round-trips unchanged, tiers included.
    if (result.ok) expect(result.body).toEqual({ ...DEFAULT_SHOP_SETTINGS, laborRateCents: 9500 });
  });

  it('when the admin types "$1,250.5", then the body carries 125050 cents', () => {
    const draft = draftFrom();
    draft.values.laborRateCents = '$1,250.5';
    const result = bodyOf(draft);
    expect(result.ok && result.body.laborRateCents).toBe(125050);
  });

  it('when a dollar amount is not exact in binary (95.1, 0.29), then it is rounded to the cent, not truncated', () => {
    // 95.1 × 100 is 9509.999… in IEEE 754 doubles (general floating-point arithmetic, from memory).
    expect(centsOf('95.1')).toBe(9510);
    expect(centsOf('0.29')).toBe(29);
    expect(centsOf('  ')).toBeUndefined();
    expect(centsOf('ninety')).toBeNaN();
    expect(dollarsText(12345)).toBe('123.45');
  });

  it('when the admin changes tax and chooses target margin, then the body says so and keeps the markup figure too', () => {
    const draft = draftFrom();
    draft.values.taxRatePct = '8.25';
    draft.pricing = 'margin';
    draft.values.targetMarginPct = '32';
    const result = bodyOf(draft);
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.body).toMatchObject({ pricing: 'margin', targetMarginPct: 32, taxRatePct: 8.25, markupPct: DEFAULT_SHOP_SETTINGS.markupPct });
    }
  });
});

describe('Admin → Pricing draft: errors in plain words', () => {
  it('when the labor rate is above the schema maximum, then the error names the limit in dollars, not cents', () => {
    // shared/schemas/options.ts: laborRateCents max 10,000,000 cents = $100,000.00.
    const draft = draftFrom();
    draft.values.laborRateCents = '250000';
    const result = bodyOf(draft);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.laborRateCents).toBe('Too big: enter $100,000.00 or less.');
  });

  it('when a field is blank or not a number, then it asks for the field by name or for a number', () => {
    const draft = draftFrom();
    draft.values.taxRatePct = '';
    draft.values.centsPerKwh = 'fifteen';
    draft.values.laborRateCents = 'lots';
    const result = bodyOf(draft);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.taxRatePct).toBe('Required: enter the sales tax rate.');
      expect(result.errors.centsPerKwh).toBe('Enter a number, such as 15 or 12.5.');
      expect(result.errors.laborRateCents).toBe('Enter an amount in dollars, such as 95 or 87.50.');
    }
  });

  it('when the tax rate is over 30 %, then it is refused on its own field with the schema limit', () => {
    // shared/schemas/options.ts: taxRatePct percent(30).
    const draft = draftFrom();
    draft.values.taxRatePct = '31';
    const result = bodyOf(draft);
    expect(!result.ok && result.errors.taxRatePct).toBe('Too big: enter 30 or less.');
  });
});

describe('Admin → Pricing draft: rebate tiers', () => {
  it('when a tier is added with a name and a SEER2 minimum only, then the body carries just those (blank boxes left out)', () => {
    const draft = draftFrom({ rebateTiers: [] });
    draft.tiers.push({ ...emptyTier(), name: 'Shop tier A', seer2: '16' });
    const result = bodyOf(draft);
    expect(result.ok && result.body.rebateTiers).toEqual([{ name: 'Shop tier A', seer2: 16 }]);
  });

  it('when a tier has no name or no minimum rating, then each error sits on that row, in words', () => {
    const draft = draftFrom({ rebateTiers: [] });
    draft.tiers.push({ ...emptyTier(), seer2: '16' }, { ...emptyTier(), name: 'No figures' });
    const result = bodyOf(draft);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors['rebateTiers.0.name']).toBe('Required: enter the tier name.');
      expect(result.errors['rebateTiers.1.seer2']).toBe('A rebate tier needs at least one of SEER2, EER2, HSPF2.');
    }
  });

  it('when a tier row is removed, then the body no longer carries it', () => {
    // Two invented tiers (no source; not any real program).
    const draft = draftFrom({ rebateTiers: [{ name: 'Tier one', seer2: 15.2 }, { name: 'Tier two', seer2: 17, hspf2: 8.5 }] });
    expect(draft.tiers).toHaveLength(2);
    draft.tiers = draft.tiers.slice(1);
    const result = bodyOf(draft);
    expect(result.ok && result.body.rebateTiers.map((t) => t.name)).toEqual(['Tier two']);
  });
});

describe('Admin → Pricing hints', () => {
  it('when defaults are known, then money hints read in dollars and others in their unit', () => {
    expect(defaultHint(LABOR_FIELD, { ...DEFAULT_SHOP_SETTINGS, laborRateCents: 9500 })).toBe('Default $95.00');
    expect(defaultHint(TAX_FIELD, { ...DEFAULT_SHOP_SETTINGS, taxRatePct: 0 })).toBe('Default 0');
    expect(defaultHint(TAX_FIELD, undefined)).toBeUndefined();
  });
});
