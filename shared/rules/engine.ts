import { cfmPerTon } from '../airflow/airflow';
import { regionalMinimum } from '../efficiency/index';
import { efficiencyFigures } from '../efficiency/pairing-figures';
import { standardBreakersBetween } from '../electrical/standard-ratings';
import { chargeAdjustment } from '../lineset/charge-adjustment';
import { DEFAULT_TRANSITION_RULES } from '../regulation/transition-rules';
import { isMissingFacts } from './define-rule';
import { RULES } from './index';
import { findRatedCombination } from './rated-match';
import { DEFAULT_RULE_SETTINGS } from './settings';
import type { CheckResult, Coverage, Finding, Pairing, Rule, RuleContext, Severity, Verdict } from './types';
import { RULES_VERSION } from './version';

/** The context a check runs with when the shop has changed nothing (transition rules: shared/regulation). */
export const DEFAULT_CONTEXT: RuleContext = {
  settings: DEFAULT_RULE_SETTINGS,
  transitionRules: DEFAULT_TRANSITION_RULES,
};

const SEVERITY_RANK: Record<Severity, number> = { blocker: 0, caution: 1, info: 2 };

/**
 * Findings of some rules already worked out for this pairing's fixed parts (by rule index, from
 * `fixedFindings`); an undefined entry is a rule that runs.
 */
export type KnownFindings = readonly (readonly Finding[] | undefined)[];

/** Runs every registered rule on a resolved pairing; pure (no clock, no I/O). */
export function runChecks(pairing: Pairing, context: RuleContext = DEFAULT_CONTEXT, rules: readonly Rule[] = RULES, known?: KnownFindings): CheckResult {
  const plan = planFor(rules);
  const findings: Finding[] = [];
  const notChecked: Coverage['notChecked'] = [];
  // bit i set: family i had a rule that ran with its facts (at most 31 families per plan)
  let ranMask = 0;
  for (let r = 0; r < rules.length; r++) {
    const rule = rules[r];
    const out = known?.[r] ?? rule.evaluate(pairing, context);
    let lacked = false;
    for (let i = 0; i < out.length; i++) {
      const f = out[i];
      findings.push(f);
      if (isMissingFacts(f)) {
        lacked = true;
        addNotChecked(notChecked, rule.family, String(f.values.missing));
      }
    }
    if (!lacked) ranMask |= 1 << plan.familyIndex[r];
  }
  const ran: string[] = [];
  for (let i = 0; i < plan.families.length; i++) if (ranMask & (1 << i)) ran.push(plan.families[i]);
  // Array.prototype.sort is stable: rules keep registry order within a severity.
  if (findings.length > 1) findings.sort(bySeverity);
  return {
    verdict: verdictOf(findings),
    rulesVersion: RULES_VERSION,
    findings,
    coverage: { ran, notChecked },
    computed: computedOf(pairing),
  };
}

/**
 * For checking many candidates for one part against the same other parts (the coil search): the
 * findings of every rule that does not read `part`, from one run on `pairing` (any candidate).
 * Each rule runs on a proxy of the pairing that notes any read of `part` (get, `in`, keys); a rule
 * that made none followed the same path it would with any other candidate, as rules are pure, so
 * its findings hold for all of them. A fresh proxy per rule keeps a memo keyed on the pairing
 * object from hiding one rule's read behind another's. Pass the result to `runChecks` as `known`.
 */
export function fixedFindings(pairing: Pairing, context: RuleContext, part: keyof Pairing, rules: readonly Rule[] = RULES): KnownFindings {
  return rules.map((rule) => {
    let read = false;
    const watched = new Proxy(pairing, {
      get: (target, key, receiver) => {
        if (key === part) read = true;
        return Reflect.get(target, key, receiver);
      },
      has: (target, key) => {
        if (key === part) read = true;
        return Reflect.has(target, key);
      },
      ownKeys: (target) => {
        read = true;
        return Reflect.ownKeys(target);
      },
      getOwnPropertyDescriptor: (target, key) => {
        if (key === part) read = true;
        return Reflect.getOwnPropertyDescriptor(target, key);
      },
    });
    const out = rule.evaluate(watched, context);
    return read ? undefined : out;
  });
}

interface Plan {
  families: string[];
  familyIndex: Int32Array;
}
const plans = new WeakMap<readonly Rule[], Plan>();

/** Families of a rule list in first-seen order and each rule's family index, worked out once per list. */
function planFor(rules: readonly Rule[]): Plan {
  let plan = plans.get(rules);
  if (!plan) {
    const families: string[] = [];
    const familyIndex = new Int32Array(rules.length);
    rules.forEach((rule, i) => {
      let k = families.indexOf(rule.family);
      if (k < 0) k = families.push(rule.family) - 1;
      familyIndex[i] = k;
    });
    if (families.length > 31) throw new Error('runChecks: more than 31 rule families');
    plan = { families, familyIndex };
    plans.set(rules, plan);
  }
  return plan;
}

const bySeverity = (a: Finding, b: Finding) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity];

function addNotChecked(list: Coverage['notChecked'], family: string, missing: string): void {
  for (const e of list) if (e.family === family && e.missing === missing) return;
  list.push({ family, missing });
}

/** Verdict per DESIGN §3: incompatible if any blocker, compatible-with-cautions if any caution, else compatible. */
export function verdictOf(findings: readonly Finding[]): Verdict {
  let caution = false;
  for (const f of findings) {
    if (f.severity === 'blocker') return 'incompatible';
    if (f.severity === 'caution') caution = true;
  }
  return caution ? 'compatible-with-cautions' : 'compatible';
}

/**
 * Families that ran (at least one of their rules had the facts it needed) and the facts each family
 * lacked. A family may appear in both lists when only some of its rules could run.
 */
export function coverageOf(findings: readonly Finding[], rules: readonly Rule[] = RULES): Coverage {
  const missingRules = new Set<string>();
  const notChecked: Coverage['notChecked'] = [];
  for (const f of findings) {
    if (!isMissingFacts(f)) continue;
    missingRules.add(f.ruleId);
    const family = rules.find((r) => r.id === f.ruleId)?.family ?? f.ruleId.split('.')[0];
    addNotChecked(notChecked, family, String(f.values.missing));
  }
  const ran: string[] = [];
  for (const r of rules) {
    if (!missingRules.has(r.id) && !ran.includes(r.family)) ran.push(r.family);
  }
  return { ran, notChecked };
}

/** Figures worked out for the screen and the record alongside the findings. */
export function computedOf(pairing: Pairing): CheckResult['computed'] {
  const computed: CheckResult['computed'] = {};
  const outdoor = pairing.outdoor.spec;
  const cfm = pairing.airHandler?.spec.airflowCfm;
  if (cfm !== undefined) computed.cfmPerTon = Math.round(cfmPerTon(cfm, outdoor.nominalTons));
  const line = pairing.lineSet;
  if (line?.lengthFt !== undefined) {
    const adj = chargeAdjustment({
      refrigerant: outdoor.refrigerant,
      liquidOdIn: line.liquidOdIn,
      lengthFt: line.lengthFt,
      chargedLineLengthFt: outdoor.chargedLineLengthFt,
      unitChargePerFtOz: outdoor.chargePerFtOz,
      unitLiquidOdIn: outdoor.liquidLineOdIn,
    });
    if (adj) computed.chargeAdjustmentOz = Math.round(adj.ounces * 10) / 10;
  }
  if (outdoor.mcaAmps !== undefined && outdoor.mocpAmps !== undefined) {
    computed.breakerRange = { mcaAmps: outdoor.mcaAmps, mocpAmps: outdoor.mocpAmps, standardSizes: standardBreakersBetween(outdoor.mcaAmps, outdoor.mocpAmps) };
  }
  const state = pairing.site?.state;
  if (state) {
    const figures = efficiencyFigures(pairing);
    const minimum = regionalMinimum({ state, systemType: outdoor.systemType, coolingBtuh: figures.coolingBtuh, seer2: figures.seer2 });
    if (minimum) computed.regionalMinimum = minimum;
  }
  const combo = findRatedCombination(pairing);
  if (combo) computed.ratedCombination = combo;
  return computed;
}
