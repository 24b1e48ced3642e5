import { nameplateVoltageRange } from '../../electrical';
import { defineRule } from '../define-rule';
import { capitalize } from '../text';
import type { Finding } from '../types';
import { phaseWords } from '../words';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** Supply voltage outside the nameplate range (±10 % utilization tolerance), or a different phase. */
export const voltageMismatch = defineRule({
  id: 'electrical.voltage-mismatch',
  title: 'Supply voltage and phase',
  basis: { kind: 'standard', citation: 'Equipment nameplate rating (NEC 110.3(B)); ±10 % utilization range' },
  evaluate(pairing, _context, tools) {
    const e = pairing.electrical;
    if (!e) return [];
    const o = pairing.outdoor.spec;
    const findings: Finding[] = [];
    const range = nameplateVoltageRange(o.voltage);
    if (e.supplyVoltage === undefined) findings.push(tools.missing('measured supply voltage', 'voltage not checked'));
    else if (!range) findings.push(tools.missing("outdoor unit's nameplate voltage", 'voltage not checked'));
    else if (e.supplyVoltage < range.minV || e.supplyVoltage > range.maxV) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `Supply ${e.supplyVoltage} V is outside the unit's ${range.minV}–${range.maxV} V`,
          detail: `The ${e.supplyVoltage} V supply is outside the ${range.minV}–${range.maxV} V range of the outdoor unit's ${o.voltage} V nameplate.`,
          fix: `Confirm the reading under load and the service voltage with the utility; use a unit rated for the supply. ${ELECTRICAL_SAFETY}`,
          values: { supplyVoltage: e.supplyVoltage, nameplateVoltage: String(o.voltage), minV: range.minV, maxV: range.maxV },
        }),
      );
    }
    if (e.supplyPhase !== undefined && o.phase !== undefined && e.supplyPhase !== o.phase) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          title: `${capitalize(phaseWords(e.supplyPhase))} supply for a ${phaseWords(o.phase)} unit`,
          detail: `The supply is ${phaseWords(e.supplyPhase)} but the outdoor unit is rated ${phaseWords(o.phase)}.`,
          fix: `Use a ${phaseWords(e.supplyPhase)} unit or provide a ${phaseWords(o.phase)} supply. ${ELECTRICAL_SAFETY}`,
          values: { supplyPhase: e.supplyPhase, unitPhase: o.phase },
        }),
      );
    }
    return findings;
  },
});
