/** Small helpers that keep findings in plain, grammatical English (a/an, plurals, lists). */

/** Letters whose spoken name starts with a vowel sound, for acronyms read letter by letter (an MCA, an HACR). */
const VOWEL_SOUND_LETTERS = new Set(['A', 'E', 'F', 'H', 'I', 'L', 'M', 'N', 'O', 'R', 'S', 'X']);
/** Word starts that are written with a vowel but spoken with a consonant (a unit, a one-way). */
const CONSONANT_SOUND_STARTS = ['uni', 'use', 'usu', 'one', 'eu', 'ura'];

/** "a" or "an" for the phrase that follows, by its spoken first sound (an R-454B system, an 8-ton, a TXV). */
export function articleFor(phrase: string): 'a' | 'an' {
  const p = phrase.trim();
  if (p === '') return 'a';
  // Numbers: eight, eleven, eighteen and 80–89 start with a vowel sound.
  const number = /^(\d[\d,]*)(\.\d+)?/.exec(p);
  if (number) {
    const digits = number[1].replace(/,/g, '');
    if (digits.startsWith('8')) return 'an';
    if (digits === '11' || digits === '18' || (/^1[18]\d*$/.test(digits) && (digits.length - 2) % 3 === 0)) return 'an';
    return 'a';
  }
  // Refrigerant names and other letter-number codes are read letter by letter (an R-22, an A2L).
  const word = /^[A-Za-z]+/.exec(p)?.[0] ?? '';
  const letterByLetter = /^[A-Z][A-Z0-9]*(-|\d|\b)/.test(p) && word.length <= 4 && word === word.toUpperCase();
  if (letterByLetter) return VOWEL_SOUND_LETTERS.has(word.charAt(0)) ? 'an' : 'a';
  const lower = p.toLowerCase();
  if (CONSONANT_SOUND_STARTS.some((s) => lower.startsWith(s))) return 'a';
  if (lower.startsWith('hour') || lower.startsWith('honest')) return 'an';
  return /^[aeiou]/.test(lower) ? 'an' : 'a';
}

/** The phrase with its indefinite article: withArticle("indoor coil") → "an indoor coil". */
export function withArticle(phrase: string): string {
  return `${articleFor(phrase)} ${phrase}`;
}

/** Items joined for a sentence: "a", "a and b", "a, b and c". */
export function listOf(items: readonly string[], conjunction: 'and' | 'or' = 'and'): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} ${conjunction} ${items[items.length - 1]}`;
}

/** The singular or plural word for a count n (no number): plural(2, "size", "sizes") → "sizes". */
export function plural(n: number, one: string, many: string): string {
  return n === 1 ? one : many;
}

/** A count with its word: count(1, "elbow", "elbows") → "1 elbow". */
export function count(n: number, one: string, many: string): string {
  return `${n} ${plural(n, one, many)}`;
}

/** The first letter upper-cased. */
export function capitalize(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
