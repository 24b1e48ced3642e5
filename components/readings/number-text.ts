import type { z } from 'zod';

/** A typed number: blank is "not given"; "1,250" and a trailing "." are fine; anything else says so. */
export function readNumber(text: string | undefined): { value?: number; error?: string } {
  const t = (text ?? '').trim().replace(/,/g, '');
  if (t === '' || t === '-' || t === '.') return {};
  const value = Number(t);
  return Number.isFinite(value) ? { value } : { error: 'Type a number.' };
}

/** A schema failure in plain words (no codes, no "expected number"). */
export function plainIssue(issue: z.core.$ZodIssue): string {
  if (issue.code === 'too_small') return `Must be at least ${String(issue.minimum)}.`;
  if (issue.code === 'too_big') return `Must be at most ${String(issue.maximum)}.`;
  return issue.message;
}

/** A temperature or pressure for the screen: one decimal, a real minus sign. */
export function formatNumber(value: number | undefined, digits = 1): string {
  if (value === undefined || !Number.isFinite(value)) return '—';
  const text = value.toFixed(digits);
  return text.startsWith('-') && Number(text) !== 0 ? '−' + text.slice(1) : text.replace(/^-/, '');
}

/** "118 psig is above …" → "118 psig is above ….": the shared messages read as a sentence on screen. */
export function asSentence(message: string): string {
  const t = message.trim();
  if (!t) return t;
  return t[0].toUpperCase() + t.slice(1) + (/[.!?]$/.test(t) ? '' : '.');
}
