import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { hasModelCharacters, isoDate, isRealIsoDate, numberIn, parseDecimalText } from '../../../shared/schemas/fields';

describe('parseDecimalText', () => {
  // Plain decimal syntax (ECMAScript StrDecimalLiteral without exponent or Infinity) plus en-US grouping.
  it.each([
    ['3', 3],
    ['-2.5', -2.5],
    ['.5', 0.5],
    ['+4', 4],
    [' 1,234.5 ', 1234.5],
    ['1,234,567', 1234567],
  ])('when %j is written, then it is %d', (text, value) => {
    expect(parseDecimalText(text)).toBe(value);
  });
  it.each(['0x3', '1e1', 'Infinity', '-Infinity', 'NaN', ' 3 4', '2,5', '1,23', '3.', '0b11', '', '1_000', '٣'])('when %j is written, then it is no number', (text) => {
    expect(parseDecimalText(text)).toBeUndefined();
  });
});

describe('numberIn', () => {
  const tons = numberIn(0.5, 25);
  it('when a JSON number arrives, then it passes as before', () => {
    expect(tons.parse(3)).toBe(3);
    expect(tons.parse(2.5)).toBe(2.5);
  });
  it.each(['0x3', '1e1', 'Infinity', ' 3 4'])('when the CSV text %j arrives, then it is refused', (text) => {
    expect(tons.safeParse(text).success).toBe(false);
  });
  it('when a JSON Infinity or NaN arrives, then it is refused', () => {
    expect(tons.safeParse(Infinity).success).toBe(false);
    expect(tons.safeParse(NaN).success).toBe(false);
  });
});

describe('isoDate', () => {
  // Gregorian calendar: February has 28 days, 29 in leap years (divisible by 4, not by 100 unless by 400).
  it.each(['2024-02-29', '2000-02-29', '2025-12-31'])('when %s is given, then it is a real date', (d) => {
    expect(isRealIsoDate(d)).toBe(true);
    expect(isoDate.parse(d)).toBe(d);
  });
  it.each(['2025-02-30', '2025-13-45', '1900-02-29', '2025-00-10', '2025-04-31', '2025-1-5', '20250101'])('when %s is given, then it is refused', (d) => {
    expect(z.object({ d: isoDate }).safeParse({ d }).success).toBe(false);
  });
});

describe('hasModelCharacters', () => {
  it.each([['-./', false], ['  ', false], ['_*#', false], ['AB-1', true], ['Ü7', true]])('when the model is %j, then %s', (model, ok) => {
    expect(hasModelCharacters(model)).toBe(ok);
  });
});

describe('isoDate problems', () => {
  it('when a date is malformed, then it reports one problem, not a second calendar one', () => {
    const result = z.object({ d: isoDate }).safeParse({ d: '1/1/2010' });
    expect(result.success).toBe(false);
    expect(result.error?.issues).toHaveLength(1);
  });
});
