import { codeWords } from './value-words';

/** How the check form draws one field: descriptors, not hand-written inputs per field. */
export type FieldType = 'number' | 'text' | 'date' | 'choice' | 'multi' | 'bool';

export interface Option {
  value: string;
  label: string;
}

export interface FieldDesc {
  key: string;
  /** With the unit in it: "MCA (A)", "Liquid line OD (in)". */
  label: string;
  type: FieldType;
  options?: readonly Option[];
  /** Shown before "More nameplate fields" is opened. */
  essential?: boolean;
  /** The check cannot run without it: marked "required" beside the label. */
  required?: boolean;
  hint?: string;
}

/** Options from a schema's codes, shown in words (never the raw code: "above-ceiling" reads "Above a ceiling"). */
const opts = (values: readonly (string | number)[], labels?: Record<string, string>): Option[] =>
  values.map((v) => ({ value: String(v), label: labels?.[String(v)] ?? codeWords(String(v)) }));
export { opts };

/** Standard copper tube ODs on residential line sets (in). Sizes: ASTM B280 ACR tube (common trade sizes). */
export const TUBE_OPTIONS: Option[] = [
  ['0.25', '1/4'],
  ['0.3125', '5/16'],
  ['0.375', '3/8'],
  ['0.5', '1/2'],
  ['0.625', '5/8'],
  ['0.75', '3/4'],
  ['0.875', '7/8'],
  ['1.125', '1-1/8'],
  ['1.375', '1-3/8'],
].map(([value, label]) => ({ value, label: `${label}"` }));

/** Text values of a form: '' means not given; booleans are 'yes' / 'no'. */
export type FieldValues = Record<string, string>;
