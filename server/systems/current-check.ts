import type { CheckResult, Finding } from '../../shared/rules/types';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import { verdictWord } from '../reports/verdict-words';
import { takeSnapshot } from './system-snapshot';
import type { RecordContent } from './system-types';

type FindingKey = Pick<Finding, 'ruleId' | 'severity' | 'title'>;

/** Today's answer for a saved record next to the one it stored, and whether they differ. */
export interface CurrentCheck {
  available: boolean;
  differs: boolean;
  verdict?: CheckResult['verdict'];
  rulesVersion?: string;
  added: FindingKey[];
  removed: FindingKey[];
  message: string;
}

const keyOf = (f: Finding) => `${f.ruleId}|${f.severity}|${f.title}`;
const brief = (f: Finding): FindingKey => ({ ruleId: f.ruleId, severity: f.severity, title: f.title });

/**
 * Re-runs the stored record's check with today's catalog, settings and rules (nothing is saved) and
 * compares verdicts and findings, so a record can say when today's rules would answer differently.
 */
export async function compareWithToday(
  ctx: AppContext,
  content: RecordContent,
  installDate: string,
  stored: CheckResult,
): Promise<CurrentCheck> {
  let today: CheckResult;
  try {
    today = (await takeSnapshot(ctx, content, installDate)).check;
  } catch (err) {
    if (!(err instanceof AppError)) throw err;
    return {
      available: false,
      differs: false,
      added: [],
      removed: [],
      message: 'Today’s check could not be run: a catalog part of this record is no longer listed.',
    };
  }
  const before = new Set(stored.findings.map(keyOf));
  const now = new Set(today.findings.map(keyOf));
  const added = today.findings.filter((f) => !before.has(keyOf(f))).map(brief);
  const removed = stored.findings.filter((f) => !now.has(keyOf(f))).map(brief);
  const differs = today.verdict !== stored.verdict || added.length > 0 || removed.length > 0;
  const message = !differs
    ? 'Today’s rules give the same answer.'
    : today.verdict !== stored.verdict
      ? `Today’s rules would answer differently: ${verdictWord(today)} instead of ${verdictWord(stored)}.`
      : 'Today’s rules give the same verdict with different findings.';
  return { available: true, differs, verdict: today.verdict, rulesVersion: today.rulesVersion, added, removed, message };
}
