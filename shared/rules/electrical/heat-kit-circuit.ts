import { conductorAmpacity, conductorColumnC, DEFAULT_HEAT_KIT_RATED_V, heaterOutputKw, nameplateVoltageRange } from '../../electrical';
import { defineRule } from '../define-rule';
import type { Finding } from '../types';
import { ELECTRICAL_SAFETY } from '../../electrical/safety-text';

/** Each reason this rule fires has its own basis (Issue 12 correction 8). */
const BREAKER_BASIS = { kind: 'standard' as const, citation: "NEC 110.3(B) and 440.22: within the air handler's nameplate MCA and MOCP" };
const WIRE_BASIS = { kind: 'standard' as const, citation: 'NEC Table 310.16 at the NEC 110.14(C) terminal rating, against the nameplate MCA' };
const VOLTAGE_BASIS = { kind: 'standard' as const, citation: 'Equipment nameplate rating (NEC 110.3(B)); ±10 % utilization range' };
const OUTPUT_BASIS = { kind: 'common-practice' as const, citation: "Resistive heater output scales with the voltage squared; the kit's rated voltage from its label (240 V when not given)" };

/**
 * The air handler's own circuit (indoorElectrical) against its MCA/MOCP, and the heat kit's output
 * at the supply voltage, scaled from the kit's own rated voltage (default 240 V), not from the air
 * handler's nameplate range. Each fact is optional: a breaker alone runs the breaker checks.
 */
export const heatKitCircuit = defineRule({
  id: 'electrical.heat-kit-circuit',
  title: 'Air handler and heat kit circuit',
  basis: { kind: 'standard', citation: 'NEC 110.3(B) (nameplate MCA/MOCP), Table 310.16 at 110.14(C); resistive output ∝ V²' },
  evaluate(pairing, _context, tools) {
    const ah = pairing.airHandler?.spec;
    if (!ah || ah.kind !== 'air-handler') return [];
    const e = pairing.indoorElectrical;
    if (!e) {
      return ah.heatKitKw || ah.mcaAmps !== undefined ? [tools.missing('air handler circuit (breaker and wire)', 'heat-kit circuit not checked')] : [];
    }
    const findings: Finding[] = [];
    const label = `the air handler${ah.model ? ` ${ah.model}` : ''}`;
    const breakerAmps = e.breakerAmps;
    if (breakerAmps !== undefined && ah.mocpAmps !== undefined && breakerAmps > ah.mocpAmps) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          basis: BREAKER_BASIS,
          title: `Air handler breaker ${breakerAmps} A is above its ${ah.mocpAmps} A maximum`,
          detail: `The ${breakerAmps} A breaker on ${label} is above its ${ah.mocpAmps} A maximum overcurrent protection.`,
          fix: `Fit a breaker of ${ah.mocpAmps} A or less and at least the MCA. ${ELECTRICAL_SAFETY}`,
          values: { breakerAmps, mocpAmps: ah.mocpAmps },
        }),
      );
    }
    if (ah.mcaAmps !== undefined) {
      if (breakerAmps !== undefined && breakerAmps < ah.mcaAmps) {
        findings.push(
          tools.finding({
            severity: 'blocker',
            basis: BREAKER_BASIS,
            title: `Air handler breaker ${breakerAmps} A is below its ${ah.mcaAmps} A minimum circuit ampacity`,
            detail: `The ${breakerAmps} A breaker on ${label} is below its ${ah.mcaAmps} A MCA; it will trip with the heat kit on.`,
            fix: `Fit a breaker between the MCA and MOCP on the air handler's nameplate. ${ELECTRICAL_SAFETY}`,
            values: { breakerAmps, mcaAmps: ah.mcaAmps },
          }),
        );
      }
      if (e.wireAwg !== undefined && e.wireMaterial !== undefined) {
        const column = conductorColumnC(e.terminalRatingC, e.conductorType);
        const ampacity = conductorAmpacity(e.wireAwg, e.wireMaterial, column);
        if (ampacity === undefined || ampacity < ah.mcaAmps) {
          findings.push(
            tools.finding({
              severity: 'blocker',
              basis: WIRE_BASIS,
              title: `Air handler wire ${e.wireAwg} AWG ${e.wireMaterial} carries ${ampacity ?? 'no listed'} A; it needs ${ah.mcaAmps} A`,
              detail: `${e.wireAwg} AWG ${e.wireMaterial} carries ${ampacity ?? 'no listed'} A at the ${column} °C column, below ${label}'s ${ah.mcaAmps} A MCA.`,
              fix: `Run a conductor with ampacity of at least ${ah.mcaAmps} A at the ${column} °C column. ${ELECTRICAL_SAFETY}`,
              values: { wireAwg: String(e.wireAwg), wireMaterial: e.wireMaterial, columnC: column, ampacityAmps: ampacity ?? null, mcaAmps: ah.mcaAmps },
            }),
          );
        }
      } else {
        findings.push(tools.missing('air handler wire size and material', 'air handler wire not checked'));
      }
      if (breakerAmps === undefined) findings.push(tools.missing('air handler breaker size', 'air handler breaker not checked'));
    } else {
      findings.push(tools.missing("air handler's MCA", 'air handler breaker and wire not checked'));
    }
    const range = nameplateVoltageRange(ah.voltage);
    // The air handler is usually fed from the same service: fall back to the outdoor circuit's reading.
    const supplyV = e.supplyVoltage ?? pairing.electrical?.supplyVoltage;
    if (range && supplyV !== undefined && (supplyV < range.minV || supplyV > range.maxV)) {
      findings.push(
        tools.finding({
          severity: 'blocker',
          basis: VOLTAGE_BASIS,
          title: `Supply ${supplyV} V is outside the air handler's ${range.minV}–${range.maxV} V`,
          detail: `The ${supplyV} V supply is outside the ${range.minV}–${range.maxV} V range of ${label}'s ${ah.voltage} V nameplate.`,
          fix: `Confirm the supply voltage; use an air handler rated for it. ${ELECTRICAL_SAFETY}`,
          values: { supplyVoltage: supplyV, nameplateVoltage: String(ah.voltage), minV: range.minV, maxV: range.maxV },
        }),
      );
    }
    if (ah.heatKitKw && supplyV !== undefined) {
      const ratedV = ah.heatKitRatedVoltage ?? DEFAULT_HEAT_KIT_RATED_V;
      const assumed = ah.heatKitRatedVoltage === undefined;
      const kw = Math.round(heaterOutputKw(ah.heatKitKw, supplyV, ratedV) * 100) / 100;
      findings.push(
        tools.finding({
          severity: 'info',
          basis: OUTPUT_BASIS,
          title: `The ${ah.heatKitKw} kW heat kit gives about ${kw} kW at ${supplyV} V`,
          detail: `The ${ah.heatKitKw} kW heat kit, rated at ${ratedV} V${assumed ? ' (assumed: the usual rating when the kit does not say)' : ''}, gives about ${kw} kW at ${supplyV} V (output scales with the voltage squared).`,
          fix: kw < ah.heatKitKw * 0.95 ? 'Size auxiliary or emergency heat on the output at the actual voltage.' : '',
          values: { heatKitKw: ah.heatKitKw, ratedVoltage: ratedV, ratedVoltageAssumed: assumed, supplyVoltage: supplyV, outputKw: kw },
        }),
      );
    }
    return findings;
  },
});
