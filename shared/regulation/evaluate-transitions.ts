// Source: the TransitionRule data model (shared/rules/types.ts) — installs on or after installFrom are
// affected; equipment made before manufacturedBefore is exempt.
import { normalizeRefrigerantName } from '../schemas/fields';
import type { TransitionRule } from '../rules/types';

export type TransitionOutcome =
  | { kind: 'applies'; rule: TransitionRule }
  /** Exempt only if made before the rule's date, and the manufacture date is not given. */
  | { kind: 'unknown-manufacture'; rule: TransitionRule }
  | { kind: 'exempt'; rule: TransitionRule; manufactureDate: string }
  /** A new-system rule that would apply, on a component replacement (repair) instead. */
  | { kind: 'repair-allowed'; rule: TransitionRule };

/** Latest of the given ISO manufacture dates; undefined when none is given. */
export function latestManufactureDate(dates: (string | undefined)[]): string | undefined {
  const known = dates.filter((d): d is string => !!d).sort();
  return known[known.length - 1];
}

/** How each transition rule bears on a refrigerant, scope, install date and manufacture date (ISO dates). */
export function applicableTransitions(
  rules: TransitionRule[],
  input: { refrigerant: string; scope: 'new-system' | 'component-replacement'; installDate: string; manufactureDate?: string },
): TransitionOutcome[] {
  const refrigerant = String(normalizeRefrigerantName(input.refrigerant));
  const out: TransitionOutcome[] = [];
  for (const rule of rules) {
    if (!rule.refrigerants.some((r) => normalizeRefrigerantName(r) === refrigerant)) continue;
    if (input.installDate < rule.installFrom) continue;
    if (rule.scope !== 'any' && rule.scope !== input.scope) {
      if (rule.scope === 'new-system') out.push({ kind: 'repair-allowed', rule });
      continue;
    }
    if (rule.manufacturedBefore) {
      if (!input.manufactureDate) out.push({ kind: 'unknown-manufacture', rule });
      else if (input.manufactureDate < rule.manufacturedBefore) out.push({ kind: 'exempt', rule, manufactureDate: input.manufactureDate });
      else out.push({ kind: 'applies', rule });
      continue;
    }
    out.push({ kind: 'applies', rule });
  }
  return out;
}
