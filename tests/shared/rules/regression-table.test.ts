import { describe, expect, it } from 'vitest';
import { isMissingFacts } from '../../../shared/rules/define-rule';
import { DEFAULT_CONTEXT, runChecks } from '../../../shared/rules/engine';
import type { Verdict } from '../../../shared/rules/types';
import { REGRESSION_PAIRINGS } from './regression-pairings';

/**
 * Regression table (Issue 12): the verdict and every finding other than a missing-facts note,
 * "severity:rule-id", as the engine gave them before its second pass. Source of each expectation:
 * the engine's own output recorded before the change, each reviewed as right against the basis its
 * rule cites (the rule files name them; common practice (no source) where the rule says so).
 * A check with none of the new facts must read exactly as before.
 */
const EXPECTED: Record<string, { verdict: Verdict; findings: string[] }> = {
  'clean certified R-454B AC': {
    verdict: 'compatible',
    findings: ['info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'clean R-410A replacement': {
    verdict: 'compatible',
    findings: [
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
      'info:regulation.refrigerant-transition',
    ],
  },
  'clean R-454B heat pump': {
    verdict: 'compatible',
    findings: ['info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'R-22 TXV on an R-454B system': {
    verdict: 'incompatible',
    findings: [
      'blocker:refrigerant.metering-device',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'coil listed for R-410A only on R-454B': {
    verdict: 'incompatible',
    findings: [
      'blocker:refrigerant.a2l-listing',
      'blocker:refrigerant.coil-listing',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'furnace marked not A2L-listed': {
    verdict: 'incompatible',
    findings: ['blocker:refrigerant.a2l-listing', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  '4-ton unit on a 2.5–3.5-ton coil': {
    verdict: 'incompatible',
    findings: [
      'blocker:capacity.air-handler-range',
      'blocker:capacity.coil-range',
      'caution:airflow.per-ton',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'furnace range below the outdoor tons': {
    verdict: 'incompatible',
    findings: [
      'blocker:capacity.air-handler-range',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'upflow coil installed horizontal-left': {
    verdict: 'incompatible',
    findings: ['blocker:fit.coil-orientation', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'coil 3.5 in wider than the furnace': {
    verdict: 'incompatible',
    findings: ['blocker:fit.coil-cabinet', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'coil 3.5 in narrower than the furnace': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:fit.coil-cabinet', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'piston coil on a TXV-required unit': {
    verdict: 'incompatible',
    findings: ['blocker:metering.type-required', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'non-bleed TXV on a single-phase unit': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:metering.start-assist', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'heat pump with a one-way TXV': {
    verdict: 'incompatible',
    findings: [
      'blocker:metering.heat-pump-bidirectional',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'heat pump on a cooling-only thermostat': {
    verdict: 'incompatible',
    findings: [
      'blocker:controls.heat-pump-thermostat',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'heat pump with a one-way drier': {
    verdict: 'incompatible',
    findings: ['blocker:lineset.filter-drier', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'no filter-drier on a new system': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:lineset.filter-drier', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'liquid line one size small': {
    verdict: 'incompatible',
    findings: ['blocker:lineset.liquid-size', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'suction line two sizes small': {
    verdict: 'incompatible',
    findings: ['blocker:lineset.suction-size', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'line 90 ft on an 80 ft unit': {
    verdict: 'incompatible',
    findings: [
      'blocker:lineset.length',
      'caution:refrigerant.a2l-charge-area',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'lift 35 ft on a 30 ft unit': {
    verdict: 'incompatible',
    findings: ['blocker:lineset.lift', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'indoor flare joints on R-454B': {
    verdict: 'incompatible',
    findings: ['blocker:lineset.reuse-condition', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'reused line set after a burnout': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:lineset.reuse-condition', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'kept R-22 line set on R-410A': {
    verdict: 'compatible-with-cautions',
    findings: [
      'caution:refrigerant.oil-compatibility',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
      'info:regulation.refrigerant-transition',
    ],
  },
  'breaker 40 A over a 30 A MOCP': {
    verdict: 'incompatible',
    findings: [
      'blocker:electrical.breaker-over-mocp',
      'info:coil.material',
      'info:electrical.wire-ampacity',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'breaker 15 A under an 18 A MCA': {
    verdict: 'incompatible',
    findings: [
      'blocker:electrical.breaker-under-mca',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'non-standard 27 A breaker': {
    verdict: 'compatible-with-cautions',
    findings: [
      'caution:electrical.breaker-nonstandard',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  '14 AWG aluminum on an 18 A MCA': {
    verdict: 'incompatible',
    findings: ['blocker:electrical.wire-ampacity', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'supply 180 V on a 208/230 V unit': {
    verdict: 'incompatible',
    findings: [
      'blocker:electrical.voltage-mismatch',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'three-phase supply on a single-phase unit': {
    verdict: 'incompatible',
    findings: [
      'blocker:electrical.voltage-mismatch',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'SEER2 13.8 in Texas (Southeast)': {
    verdict: 'incompatible',
    findings: [
      'blocker:efficiency.regional-minimum',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'no certified combination for the models': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:rating.no-rated-combination', 'info:coil.material', 'info:lineset.charge-adjustment'],
  },
  'attic install with no overflow protection': {
    verdict: 'compatible-with-cautions',
    findings: [
      'caution:condensate.overflow-protection',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
  'kept copper coil on R-410A': {
    verdict: 'compatible',
    findings: [
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
      'info:regulation.refrigerant-transition',
    ],
  },
  'piston 0.059 in where the unit ships 0.065 in': {
    verdict: 'compatible-with-cautions',
    findings: ['caution:metering.piston-size', 'info:coil.material', 'info:lineset.charge-adjustment', 'info:rating.rated-combination'],
  },
  'R-22 replacement installed after the production ban': {
    verdict: 'incompatible',
    findings: [
      'blocker:regulation.refrigerant-transition',
      'info:coil.material',
      'info:lineset.charge-adjustment',
      'info:rating.rated-combination',
    ],
  },
};

describe('regression table: pairings right before the second pass stay right', () => {
  it('when the table is counted, then it holds at least 30 pairings and each has an expectation', () => {
    expect(REGRESSION_PAIRINGS.length).toBeGreaterThanOrEqual(30);
    for (const c of REGRESSION_PAIRINGS) expect(EXPECTED[c.name], c.name).toBeDefined();
  });

  it.each(REGRESSION_PAIRINGS.map((c) => [c.name, c] as const))(
    'when checking "%s", then verdict and findings are unchanged',
    (_name, c) => {
      const result = runChecks(c.pairing(), DEFAULT_CONTEXT);
      const findings = [...new Set(result.findings.filter((f) => !isMissingFacts(f)).map((f) => `${f.severity}:${f.ruleId}`))].sort();
      expect({ verdict: result.verdict, findings }).toEqual(EXPECTED[c.name]);
    },
  );
});
