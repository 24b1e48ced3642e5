import type { FieldDesc } from './field-types';

/** The parts of a zod issue the words need (kept structural so this file stays free of zod's types). */
export interface IssueLike {
  code: string;
  message: string;
  expected?: unknown;
  minimum?: unknown;
  maximum?: unknown;
  format?: string;
}

const sentence = (text: string) => {
  const t = text.trim().replace(/\.$/, '');
  return `${t.charAt(0).toUpperCase()}${t.slice(1)}.`;
};

/** A validation issue in the words a tech reads beside the field: what to enter, never a parser's message. */
export function plainError(issue: IssueLike, field: FieldDesc | undefined, raw: string | undefined): string {
  const label = field?.label.replace(/\s*\([^)]*\)\s*$/, '').toLowerCase();
  const choose = field && (field.type === 'choice' || field.type === 'multi' || field.type === 'bool');
  if (raw === undefined || raw.trim() === '') {
    if (!label) return 'Required.';
    return choose ? `Required: choose the ${label}.` : `Required: enter the ${label}.`;
  }
  if (issue.code === 'too_small' && issue.minimum !== undefined) return `Too small: enter ${issue.minimum} or more.`;
  if (issue.code === 'too_big' && issue.maximum !== undefined) return `Too big: enter ${issue.maximum} or less.`;
  if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number, such as 3 or 2.5.';
  if (field?.type === 'number' && /number/i.test(issue.message)) return 'Enter a number, such as 3 or 2.5.';
  if (field?.type === 'date') return 'Enter the date as year-month-day, such as 2019-06-30.';
  if (issue.code === 'invalid_value' || /must be one of|expected one of/i.test(issue.message)) {
    return choose ? 'Choose one of the options shown.' : `“${raw.trim()}” is not one we know: check the nameplate.`;
  }
  return sentence(issue.message.replace(/^Invalid (input|option):\s*/i, ''));
}
