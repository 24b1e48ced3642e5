import type { CheckResult, Finding, Severity } from '@/shared/rules/types';

/** The banner's plain words and icon (DESIGN.md §7): a regulation blocker reads "Not allowed". */
export function verdictWords(result: Pick<CheckResult, 'verdict' | 'findings'>): { word: string; icon: string; tone: Severity | 'ok' } {
  if (result.verdict === 'incompatible') {
    const regulation = result.findings.some((f) => f.severity === 'blocker' && f.ruleId.startsWith('regulation.'));
    return regulation ? { word: 'Not allowed', icon: 'cancel', tone: 'blocker' } : { word: 'Not compatible', icon: 'close-octagon', tone: 'blocker' };
  }
  if (result.verdict === 'compatible-with-cautions') return { word: 'Compatible with cautions', icon: 'alert', tone: 'caution' };
  return { word: 'Compatible', icon: 'check-circle', tone: 'ok' };
}

export const SEVERITY_GROUPS: { severity: Severity; heading: string; word: string; icon: string }[] = [
  { severity: 'blocker', heading: 'Blockers', word: 'Blocker', icon: 'close-octagon' },
  { severity: 'caution', heading: 'Cautions', word: 'Caution', icon: 'alert' },
  { severity: 'info', heading: 'Notes', word: 'Note', icon: 'information-outline' },
];

export const BASIS_WORDS: Record<Finding['basis']['kind'], string> = {
  standard: 'Standard',
  regulation: 'Regulation',
  'common-practice': 'Common practice',
};

/**
 * A finding's title as shown: "Not allowed" belongs to regulation blockers only (the verdict says
 * "Not allowed" for those); any other finding reads as an ordinary problem under "Not compatible".
 */
export function findingTitle(finding: Pick<Finding, 'ruleId' | 'title'>): string {
  if (finding.ruleId.startsWith('regulation.')) return finding.title;
  const rest = finding.title.replace(/^Not allowed:\s*/i, '');
  return rest === finding.title ? rest : rest.charAt(0).toUpperCase() + rest.slice(1);
}
