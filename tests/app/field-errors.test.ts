import { describe, expect, it } from 'vitest';
import { plainError } from '../../components/check/field-errors';
import type { FieldDesc } from '../../components/check/field-types';

const tons: FieldDesc = { key: 'nominalTons', label: 'Nominal tons', type: 'number' };
const wire: FieldDesc = { key: 'wireMaterial', label: 'Wire', type: 'choice', options: [] };
const made: FieldDesc = { key: 'manufactureDate', label: 'Manufacture date (YYYY-MM-DD)', type: 'date' };

describe('plainError', () => {
  it('when a required field is left empty, then it asks for it by name (enter or choose)', () => {
    expect(plainError({ code: 'invalid_type', message: 'expected a number', expected: 'number' }, tons, '')).toBe('Required: enter the nominal tons.');
    expect(plainError({ code: 'invalid_value', message: 'must be one of copper, aluminum' }, wire, undefined)).toBe('Required: choose the wire.');
  });

  it('when a number is out of range or not a number, then it says what to enter', () => {
    // Range 0.5–25 tons: shared/schemas/fields.ts `tons`.
    expect(plainError({ code: 'too_small', message: 'must be at least 0.5', minimum: 0.5 }, tons, '0.2')).toBe('Too small: enter 0.5 or more.');
    expect(plainError({ code: 'too_big', message: 'must be at most 25', maximum: 25 }, tons, '30')).toBe('Too big: enter 25 or less.');
    expect(plainError({ code: 'invalid_type', message: 'expected a number', expected: 'number' }, tons, 'three')).toBe('Enter a number, such as 3 or 2.5.');
  });

  it('when a parser message would reach the screen, then the tech reads words instead', () => {
    const parser = { code: 'invalid_value', message: 'Invalid option: expected one of "copper"|"aluminum"' };
    expect(plainError(parser, wire, 'tin')).toBe('Choose one of the options shown.');
    expect(plainError({ code: 'invalid_format', message: 'expected a date as YYYY-MM-DD' }, made, '6/2019')).toBe('Enter the date as year-month-day, such as 2019-06-30.');
    expect(plainError({ code: 'custom', message: 'give both tube sizes' }, undefined, 'given')).toBe('Give both tube sizes.');
  });
});
