import { describe, expect, it } from 'vitest';
import { citationWords, familyWords } from '../../components/check/rule-words';
import { figuresWords, isInternalKey, valueWords } from '../../components/check/value-words';

// Codes come from the shared schemas (shared/schemas/check.ts, equipment.ts) and the engine's values;
// the words are ours (plain trade words, no source needed beyond the schema's own meaning).
describe('valueWords', () => {
  it.each([
    ['indoorLocation', 'above-ceiling', 'Above a ceiling'],
    ['airflowDirection', 'horizontal-left', 'Horizontal, air moving left'],
    ['systemType', 'heat-pump', 'Heat pump'],
    ['meteringType', 'txv', 'TXV'],
    ['filterDrier', 'bi-flow', 'Bi-flow'],
    ['scope', 'component-replacement', 'Replacing a part'],
    ['productClass', 'split-heat-pump', 'Split heat pump'],
    ['limitSource', 'default', 'The shop’s default'],
    ['meteringSource', 'kit', 'Field-installed kit'],
    ['keptParts', 'indoor coil;air handler', 'indoor coil, air handler'],
    ['listedRefrigerants', 'R-22;R-410A', 'R-22, R-410A'],
    ['systemRefrigerant', 'R-454B', 'R-454B'],
  ])('when %s is "%s", then it reads "%s"', (key, value, words) => {
    expect(valueWords(key, value)).toBe(words);
  });

  it('when a value is a boolean, a number or empty, then it reads Yes/No, the number, or nothing', () => {
    expect(valueWords('kept', true)).toBe('Yes');
    expect(valueWords('hasFloatSwitch', false)).toBe('No');
    expect(valueWords('lengthFt', 35)).toBe('35');
    expect(valueWords('meteringRefrigerant', null)).toBeNull();
    expect(valueWords('model', '')).toBeNull();
  });

  it('when a key holds a rule id, then it is internal (kept for the support line only)', () => {
    expect(isInternalKey('ruleId')).toBe(true);
    expect(isInternalKey('alsoRuleIds')).toBe(true);
    expect(isInternalKey('systemRefrigerant')).toBe(false);
  });
});

describe('familyWords', () => {
  it.each([
    ['lineset', 'Line set'],
    ['metering', 'Metering device'],
    ['rating', 'Certified rating'],
    ['regulation', 'Refrigerant regulations'],
    ['somethingnew', 'Somethingnew'],
  ])('when the family is %s, then the heading is "%s"', (family, words) => {
    expect(familyWords(family)).toBe(words);
  });
});

describe('citationWords', () => {
  it('when a citation carries a provenance note, then the screen shows it without "(from memory)"', () => {
    // Citation text as written in shared/rules/lineset/reuse-condition.ts.
    const citation = 'UL 60335-2-40 (3rd ed.) field joints for A2L refrigerants (from memory); burnout clean-up: common practice';
    expect(citationWords(citation)).toBe('UL 60335-2-40 (3rd ed.) field joints for A2L refrigerants; burnout clean-up: common practice');
    expect(citationWords('NEC 240.6(A)')).toBe('NEC 240.6(A)');
  });
});

describe('figuresWords', () => {
  it('when a record holds codes and keys, then it reads as labelled words with no code or key left', () => {
    // 10 CFR 430.32(c): Southeast split heat pump, SEER2 14.3 and HSPF2 7.5 (values.json EFF-06).
    const text = figuresWords({ region: 'southeast', regionName: 'Southeast', productClass: 'split-heat-pump', seer2: 14.3, hspf2: 7.5 }, ['region']);
    expect(text).toBe('Region name: Southeast · Product class: Split heat pump · SEER2: 14.3 · HSPF2: 7.5');
    expect(text).not.toMatch(/regionName|productClass|split-heat-pump/);
  });
});

describe('form options', () => {
  it('when the site section offers where the indoor unit sits and the airflow direction, then no chip shows a raw code', async () => {
    const { SECTIONS } = await import('../../components/check/check-sections');
    const labels = SECTIONS.site.fields.flatMap((f) => (f.options ?? []).map((o) => o.label));
    // Codes from shared/schemas/check.ts INDOOR_LOCATIONS and AIRFLOW_DIRECTIONS.
    expect(labels).toContain('Above a ceiling');
    expect(labels).toContain('Horizontal, air moving left');
    expect(labels.filter((l) => /^[a-z]+(-[a-z]+)+$/.test(l))).toEqual([]);
  });
});
