import { describe, expect, it } from 'vitest';
import { detectConvention, priceCents, readPriceCell } from '../../../server/imports/price-number';

// Number formats: the decimal point / grouping comma (en-US) and decimal comma / grouping point or
// space (de-DE, fr-FR) conventions are those of the Unicode CLDR number symbols; the apostrophe
// grouping is de-CH (CLDR). Expected cents are arithmetic on the written amounts.

describe('readPriceCell', () => {
  it.each([
    ['1234', 123400],
    ['1 234', 123400],
    ["1'234", 123400],
    ['$1234', 123400],
    ['  42  ', 4200],
  ])('when %j reads the same under either decimal mark, then it is %i cents', (cell, cents) => {
    expect(readPriceCell(cell)).toEqual({ kind: 'same', cents });
  });

  it.each([
    ['12,50', 'comma', 1250],
    ['1.234,50', 'comma', 123450],
    [' 1 234,00 ', 'comma', 123400],
    ['1.234.567', 'comma', 123456700],
    ["1'234.50", 'point', 123450],
    ['$1,234.50', 'point', 123450],
    ['1234.5', 'point', 123450],
    ['1,234,567', 'point', 123456700],
    ['USD 99.95', 'point', 9995],
    ['0.5', 'point', 50],
  ])('when %j is read, then it tells the %s convention and is %i cents', (cell, convention, cents) => {
    expect(readPriceCell(cell)).toEqual({ kind: 'decides', convention, cents });
  });

  it.each(['1,234', '1.234', '$9,999'])('when %j has one separator before three digits, then it is ambiguous', (cell) => {
    expect(readPriceCell(cell).kind).toBe('ambiguous');
  });

  it.each(['abc', '0x10', '1e3', 'Infinity', '12.', '1,23,4', '1.234.5', '12,345.678', '1 23', '=1+2', '€12', '1,234 567', '--5', '$'])(
    'when %j is not a price in either convention, then it is unreadable',
    (cell) => {
      expect(readPriceCell(cell).kind).toBe('unreadable');
    },
  );
});

describe('detectConvention', () => {
  it('when the column holds decimal commas and ambiguous cells, then the commas decide', () => {
    // Arithmetic on the written amounts: 12,50 and 7,00 decide; 1.234 and 99 do not.
    expect(detectConvention(['12,50', '1.234', '99', '7,00'])).toEqual({ convention: 'comma', votes: { point: 0, comma: 2 } });
  });
  it('when no cell decides, then the convention is unknown', () => {
    expect(detectConvention(['1,234', '99', '']).convention).toBeNull();
  });
  it('when the votes tie, then the convention is unknown', () => {
    expect(detectConvention(['1.50', '1,50']).convention).toBeNull();
  });
});

describe('priceCents', () => {
  it('when "1,234" is read in a decimal-point file, then it is 1,234.00; in a decimal-comma file it is refused', () => {
    expect(priceCents('1,234', 'point')).toEqual({ cents: 123400 });
    expect(priceCents('1,234', 'comma')).toEqual({ error: expect.stringContaining('three digits') });
  });
  it('when "1.234" is read in a decimal-comma file, then it is 1,234.00', () => {
    expect(priceCents('1.234', 'comma')).toEqual({ cents: 123400 });
  });
  it('when an ambiguous cell meets no convention, then it is refused with the reason', () => {
    expect(priceCents('1,234', null)).toEqual({ error: expect.stringContaining('ambiguous') });
  });
  it('when a cell contradicts the file convention, then it is refused rather than read 100 times off', () => {
    expect(priceCents('12,50', 'point')).toEqual({ error: expect.stringContaining('1.234,50') });
    expect(priceCents('1,234.50', 'comma')).toEqual({ error: expect.stringContaining('1,234.50') });
  });
  it('when a cell decides and the convention is unknown, then its own reading holds', () => {
    expect(priceCents('12,50', null)).toEqual({ cents: 1250 });
  });
});
