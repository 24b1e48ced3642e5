import { describe, expect, it } from 'vitest';
import { NAMEPLATE_DEFAULTS, nameplateFields } from '../../components/check/nameplate-fields';
import { PART_SLOTS } from '../../components/check/part-slots';

describe('nameplate entry', () => {
  it.each(PART_SLOTS)('when the %s is typed from its nameplate, then the form starts empty with the model first and shown', (slot) => {
    expect(NAMEPLATE_DEFAULTS[slot]).toEqual({});
    const fields = nameplateFields(slot);
    expect(fields[0].key).toBe('model');
    expect(fields[0].essential).toBe(true);
    expect(fields[0].required).toBe(false);
  });

  it('when the outdoor unit is typed, then the facts the schema cannot do without are marked required and shown', () => {
    // shared/schemas/equipment.ts: systemType, refrigerant and nominalTons are not optional.
    const required = nameplateFields('outdoor').filter((f) => f.required);
    expect(required.map((f) => f.key).sort()).toEqual(['nominalTons', 'refrigerant', 'systemType']);
    expect(required.every((f) => f.essential)).toBe(true);
  });
});
