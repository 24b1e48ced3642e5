import type { CheckResult } from '../../shared/rules/types';

/** The verdict in the plain words the app's banner uses (DESIGN.md §7): a regulation blocker reads "Not allowed". */
export function verdictWord(result: Pick<CheckResult, 'verdict' | 'findings'>): string {
  if (result.verdict === 'incompatible') {
    return result.findings.some((f) => f.severity === 'blocker' && f.ruleId.startsWith('regulation.')) ? 'Not allowed' : 'Not compatible';
  }
  return result.verdict === 'compatible-with-cautions' ? 'Compatible with cautions' : 'Compatible';
}
