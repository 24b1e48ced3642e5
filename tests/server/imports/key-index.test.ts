import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KeyIndex } from '../../../server/imports/key-index';

// The reference is JavaScript's own Map (ECMAScript keyed collections): "first line of each key"
// written with it is the behaviour the index must keep.
function firstLinesByMap(keys: string[]): (number | undefined)[] {
  const map = new Map<string, number>();
  return keys.map((key, line) => {
    const first = map.get(key);
    if (first === undefined) map.set(key, line);
    return first;
  });
}

function firstLinesByIndex(keys: string[], expected: number): (number | undefined)[] {
  const index = new KeyIndex(expected);
  return keys.map((key, line) => index.firstLineOr(key, line));
}

describe('KeyIndex', () => {
  it('when a key comes again, then the line it first came on is returned and the new line is not recorded', () => {
    const index = new KeyIndex(4);
    expect(index.firstLineOr('AB12|2025-01-01', 2)).toBeUndefined();
    expect(index.firstLineOr('AB12|2025-02-01', 3)).toBeUndefined();
    expect(index.firstLineOr('AB12|2025-01-01', 4)).toBe(2);
    expect(index.firstLineOr('AB12|2025-01-01', 5)).toBe(2);
  });

  it('when any sequence of keys is indexed, then each answer is the one a Map gives (fast-check, 300 runs)', () => {
    // A small alphabet so keys repeat often; unicode keys too (hashes read UTF-16 code units).
    const key = fc.oneof(fc.string({ unit: fc.constantFrom('A', 'B', '1', '|', '-'), maxLength: 4 }), fc.string({ unit: 'grapheme', maxLength: 3 }));
    fc.assert(
      fc.property(fc.array(key, { maxLength: 300 }), (keys) => {
        expect(firstLinesByIndex(keys, keys.length)).toEqual(firstLinesByMap(keys));
      }),
      { numRuns: 300 },
    );
  });

  it('when more keys come than it was sized for, then it hands them to a Map and still answers each as a Map does', () => {
    // Sized for one key (16 slots): the 17th new key finds every slot taken and the probe limit is reached.
    const keys = Array.from({ length: 500 }, (_, i) => `M${i % 200}|2025-01-01`);
    expect(firstLinesByIndex(keys, 1)).toEqual(firstLinesByMap(keys));
  });

  it('when 100,000 distinct model keys are indexed, then none is taken for another', () => {
    const keys = Array.from({ length: 100_000 }, (_, i) => `BX${String(i).padStart(6, '0')}K|2025-0${1 + (i % 9)}-01`);
    const answers = firstLinesByIndex(keys, keys.length);
    expect(answers.every((a) => a === undefined)).toBe(true);
    expect(firstLinesByIndex([...keys, ...keys.slice(0, 10)], keys.length + 10).slice(-10)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
  });
});
