import { describe, expect, it } from 'vitest';
import { articleFor, capitalize, count, listOf, plural, withArticle } from '../../../shared/rules/text';

// Article choice follows the spoken first sound: standard English usage (common practice, no source).
describe('withArticle', () => {
  it.each([
    ['indoor coil', 'an indoor coil'],
    ['air handler', 'an air handler'],
    ['R-454B system', 'an R-454B system'],
    ['R-22 valve', 'an R-22 valve'],
    ['A2L refrigerant', 'an A2L refrigerant'],
    ['MCA of 18 A', 'an MCA of 18 A'],
    ['HACR breaker', 'an HACR breaker'],
    ['TXV', 'a TXV'],
    ['UL listing', 'a UL listing'],
    ['furnace', 'a furnace'],
    ['unit', 'a unit'],
    ['one-way valve', 'a one-way valve'],
    ['upflow coil', 'an upflow coil'],
    ['8-ton unit', 'an 8-ton unit'],
    ['11 A breaker', 'an 11 A breaker'],
    ['18 ft run', 'an 18 ft run'],
    ['80 ft run', 'an 80 ft run'],
    ['3-ton unit', 'a 3-ton unit'],
    ['1800 sq ft house', 'a 1800 sq ft house'],
    ['split heat pump', 'a split heat pump'],
    ['hour', 'an hour'],
  ])('when the phrase is "%s", then it reads "%s"', (phrase, expected) => {
    expect(withArticle(phrase)).toBe(expected);
  });

  it('when the phrase is empty, then the article is "a"', () => {
    expect(articleFor('')).toBe('a');
  });
});

describe('listOf', () => {
  it.each([
    [[], ''],
    [['line set'], 'line set'],
    [['line set', 'air handler'], 'line set and air handler'],
    [['line set', 'indoor coil', 'air handler'], 'line set, indoor coil and air handler'],
  ])('when the items are %j, then the list reads "%s"', (items, expected) => {
    expect(listOf(items)).toBe(expected);
  });

  it('when "or" is asked for, then the last item joins with "or"', () => {
    expect(listOf(['R-22', 'R-407C'], 'or')).toBe('R-22 or R-407C');
  });
});

describe('plural and count', () => {
  it.each([
    [0, 'elbows'],
    [1, 'elbow'],
    [2, 'elbows'],
    [1.5, 'elbows'],
  ])('when n is %d, then the word is "%s"', (n, word) => {
    expect(plural(n, 'elbow', 'elbows')).toBe(word);
    expect(count(n, 'elbow', 'elbows')).toBe(`${n} ${word}`);
  });

  it('when a sentence starts with a phrase, then its first letter is upper case', () => {
    expect(capitalize('the kept line set')).toBe('The kept line set');
  });
});
