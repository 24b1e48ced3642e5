import { capitalize } from './text';
import type { Basis, Finding, Pairing, Rule, RuleContext, Severity } from './types';

type FindingDraft = Omit<Finding, 'ruleId' | 'basis' | 'title'> & { title?: string; basis?: Basis };

/** Helpers a rule's evaluate function gets: findings carry the rule's id, title and basis by default. */
export interface RuleTools {
  finding(draft: FindingDraft): Finding;
  /** An info finding saying which facts were missing, so a missing fact never reads as a pass. */
  missing(facts: string, consequence: string): Finding;
}

export interface RuleDefinition {
  id: string;
  title: string;
  basis: Basis;
  evaluate(pairing: Pairing, context: RuleContext, tools: RuleTools): Finding[];
}

/** Defines a rule (one per file, named by its id); the family is the id's first segment. */
export function defineRule(def: RuleDefinition): Rule {
  const family = def.id.split('.')[0];
  const tools: RuleTools = {
    // Explicit fields, not a spread: this runs for every finding of every check (hot path).
    finding: (d) => ({
      ruleId: def.id,
      severity: d.severity,
      title: d.title ?? def.title,
      detail: d.detail,
      fix: d.fix,
      basis: d.basis ?? def.basis,
      values: d.values,
    }),
    missing: (facts, consequence) => ({
      ruleId: def.id,
      severity: 'info' as Severity,
      title: `${def.title}: not checked`,
      detail: `${capitalize(facts)} not given: ${consequence}.`,
      fix: `Enter ${facts} to run this check.`,
      basis: def.basis,
      values: { missing: facts },
    }),
  };
  return {
    id: def.id,
    title: def.title,
    family,
    basis: def.basis,
    evaluate: (pairing, context) => def.evaluate(pairing, context, tools),
  };
}

/** True when a finding is the "facts missing" note made by `tools.missing`. */
export function isMissingFacts(finding: Finding): boolean {
  return finding.severity === 'info' && typeof finding.values.missing === 'string';
}
