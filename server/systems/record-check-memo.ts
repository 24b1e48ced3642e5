import type { DataSource } from 'typeorm';
import { runChecks } from '../../shared/rules/engine';
import type { CheckResult, RuleContext } from '../../shared/rules/types';
import { CATALOG_KINDS } from '../../shared/schemas/equipment';
import { kindIndex } from '../catalog/catalog-index';
import { resolvePairing } from '../checks/checks.service';
import type { AppContext } from '../context';
import { loadRuleContext } from '../settings/settings.service';
import type { RecordContent, ResolvedParts } from './system-types';

/** A record content's check as a save stores it, with the JSON text of the stored columns. */
export interface CheckedContent {
  check: CheckResult;
  parts: ResolvedParts;
  ratedCombination: Record<string, unknown> | null;
  json: { check: string; parts: string; ratedCombination: string | null };
}

/*
 * Every save re-checks its content against today's catalog, settings and rules. Most edits change only
 * serials, checklist states or the label, none of which the check reads, so the same input comes back
 * again and again. The engine is pure (shared/rules: no I/O, no clock), so its answer is kept per catalog
 * index OBJECT of every kind and per settings object (as the coil search keeps its rule results,
 * DEVELOPERS.md): an import, a revert, a rolled-back write or a settings save makes new objects, and the
 * next save checks afresh. The kept answers are shared between saves and never changed by them.
 */
interface Memo {
  sources: readonly object[];
  byInput: Map<string, Promise<CheckedContent>>;
}
const memos = new WeakMap<DataSource, Memo>();
const MAX_MEMO_ENTRIES = 500;

/** The check of `content` (its install date `installDate` when it gives none) under the current catalog and settings. */
export async function checkContent(ctx: AppContext, content: RecordContent, installDate: string): Promise<CheckedContent> {
  const [indexes, ruleContext] = await Promise.all([
    Promise.all(CATALOG_KINDS.map((kind) => kindIndex(ctx.dataSource, kind))),
    loadRuleContext(ctx),
  ]);
  const sources = [...indexes, ruleContext.settings, ruleContext.transitionRules];
  let memo = memos.get(ctx.dataSource);
  if (!memo || memo.byInput.size >= MAX_MEMO_ENTRIES || sources.some((source, i) => source !== memo!.sources[i])) {
    memos.set(ctx.dataSource, (memo = { sources, byInput: new Map() }));
  }
  const { serials: _serials, checklist: _checklist, label: _label, ...checked } = content;
  const key = `${installDate}|${JSON.stringify(checked)}`;
  let found = memo.byInput.get(key);
  if (!found) {
    found = runCheck(ctx, content, installDate, ruleContext);
    memo.byInput.set(key, found);
    const byInput = memo.byInput;
    found.catch(() => byInput.delete(key));
  }
  return found;
}

async function runCheck(ctx: AppContext, content: RecordContent, installDate: string, ruleContext: RuleContext): Promise<CheckedContent> {
  const pairing = await resolvePairing(ctx, content, installDate);
  const check = runChecks(pairing, ruleContext);
  const { ratedCombinations: _list, ...parts } = pairing;
  const combo = check.computed.ratedCombination;
  const ratedCombination = combo && typeof combo === 'object' ? (combo as Record<string, unknown>) : null;
  return {
    check,
    parts,
    ratedCombination,
    json: {
      check: JSON.stringify(check),
      parts: JSON.stringify(parts),
      ratedCombination: ratedCombination === null ? null : JSON.stringify(ratedCombination),
    },
  };
}
