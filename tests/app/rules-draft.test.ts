import { describe, expect, it } from 'vitest';
import { bodyOf, defaultHint, draftOf, rebateTiersText } from '@/components/settings/rules-draft';
import { DEFAULT_RULE_SETTINGS } from '@/shared/rules/settings';

const response = (over: Partial<typeof DEFAULT_RULE_SETTINGS> = {}) => ({
  settings: { ...DEFAULT_RULE_SETTINGS, ...over },
  transitionRules: [],
  defaults: DEFAULT_RULE_SETTINGS,
  updatedAt: null,
});

describe('Admin → Rules draft', () => {
  it('when the admin types a standard line length, then the body carries it as a number', () => {
    const draft = draftOf(response());
    draft.settings.defaultStandardLineLengthFt = '25';
    const result = bodyOf(draft);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.body.settings.defaultStandardLineLengthFt).toBe(25);
  });

  it('when the field is left blank, then the body leaves it unset and the long-line rule waits for the unit', () => {
    const result = bodyOf(draftOf(response()));
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.body.settings.defaultStandardLineLengthFt).toBeUndefined();
  });

  it('when a stored value exists, then the draft shows it and a value out of range is refused on its path', () => {
    const draft = draftOf(response({ defaultStandardLineLengthFt: 30 }));
    expect(draft.settings.defaultStandardLineLengthFt).toBe('30');
    draft.settings.defaultStandardLineLengthFt = '2';
    const result = bodyOf(draft);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors)).toContain('settings.defaultStandardLineLengthFt');
  });

  it('when a setting has no default, then its hint says so instead of printing "undefined"', () => {
    expect(defaultHint(undefined)).not.toMatch(/undefined/);
    expect(defaultHint(50)).toBe('Default 50');
  });
});

describe('Admin → Rules: rebate tiers', () => {
  it('when the rule settings carry the shop tiers, then the form sends none back (the shop list is the one source) and says where they live', () => {
    const data = { ...response(), settings: { ...DEFAULT_RULE_SETTINGS, rebateTiers: [{ name: 'Shop tier', seer2: 16 }] } };
    const built = bodyOf(draftOf(data));
    expect(built.ok && 'rebateTiers' in built.body.settings).toBe(false);
    expect(rebateTiersText(1)).toContain('1 is set up');
    expect(rebateTiersText(0)).toContain('none is set up yet');
  });
});
