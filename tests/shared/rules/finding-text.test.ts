import { describe, expect, it } from 'vitest';
import { isMissingFacts } from '../../../shared/rules/define-rule';
import { DEFAULT_CONTEXT, runChecks } from '../../../shared/rules/engine';
import { RULES, ruleById } from '../../../shared/rules/index';
import { DEFAULT_TRANSITION_RULES } from '../../../shared/regulation/transition-rules';
import { AIRFLOW_DIRECTIONS, INDOOR_LOCATIONS, SCOPES } from '../../../shared/schemas/check';
import { articleFor } from '../../../shared/rules/text';
import type { Finding, Pairing, RuleContext, Severity } from '../../../shared/rules/types';
import { awg, edit } from './worked-case-builder';
import { REGRESSION_PAIRINGS } from './regression-pairings';
import { heatKitAirHandler, ownCoilAirHandler } from '../../helpers/pairing-edits';

/**
 * Every finding is titled by what is wrong, in plain words with its key numbers (Issue 7): one case
 * per rule and per severity it can produce, with the exact title expected and the numbers its
 * sentence must carry. Pairings start from the clean certified R-454B install (worked-case-builder).
 * Numbers in titles are the pairing's own facts or arithmetic noted beside them.
 */

interface TextCase {
  ruleId: string;
  severity: Severity;
  pairing: () => Pairing;
  title: string;
  /** Fragments the detail sentence must contain (numbers with units, grammar). */
  detail: string[];
  context?: RuleContext;
}

const r410a = (p: Pairing) => {
  Object.assign(p.outdoor.spec, { refrigerant: 'R-410A' });
  Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], meteringRefrigerant: 'R-410A', a2lListed: false });
};
const heatPump = (p: Pairing) => {
  Object.assign(p.outdoor.spec, { systemType: 'heat-pump', hspf2: 7.8 });
  p.controls = { thermostatHeatPump: true, auxHeatStages: 1 };
};
/** An air handler with its own coil (no separate coil part), kept from the old system. */
const keptOwnCoilAirHandler = (p: Pairing, refrigerants: Pairing['outdoor']['spec']['refrigerant'][]) => ownCoilAirHandler(p, { refrigerants }, true);

const CASES: TextCase[] = [
  {
    ruleId: 'refrigerant.metering-device',
    severity: 'blocker',
    pairing: () => edit((p) => (p.indoorCoil!.spec.meteringRefrigerant = 'R-22')),
    title: 'Valve is for R-22; the unit runs R-454B',
    detail: ["The coil's TXV is rated for R-22", 'runs R-454B'],
  },
  {
    ruleId: 'refrigerant.metering-device',
    severity: 'caution',
    pairing: () => edit((p) => Object.assign(p.indoorCoil!.spec, { meteringType: 'none', meteringRefrigerant: undefined })),
    title: 'The indoor coil has no metering device',
    detail: ['an R-454B system needs one'],
  },
  {
    ruleId: 'refrigerant.coil-listing',
    severity: 'blocker',
    pairing: () => edit((p) => Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], a2lListed: true })),
    title: 'Indoor coil is listed for R-410A, not R-454B',
    detail: ['The indoor coil HW-K36-MP is listed for R-410A'],
  },
  {
    // The air handler's listing finding is titled as the air handler's, not the coil's (Issue 7)
    ruleId: 'refrigerant.coil-listing',
    severity: 'blocker',
    pairing: () => edit((p) => keptOwnCoilAirHandler(p, ['R-22', 'R-410A'])),
    title: 'Air handler is listed for R-22 or R-410A, not R-454B',
    detail: ['The air handler HW-AH36 is listed for R-22 and R-410A'],
  },
  {
    ruleId: 'refrigerant.a2l-listing',
    severity: 'blocker',
    pairing: () => edit((p) => (p.airHandler!.spec.a2lListed = false)),
    title: 'Furnace is not listed for A2L refrigerants; the unit runs R-454B',
    detail: ['The furnace HW-F80-17 is marked not listed', 'R-454B (class A2L)'],
  },
  {
    // 110 oz + (25 − 15) ft × 0.55 oz/ft = 115.5 oz; m1 = 6 m³ × 0.296 kg/m³ = 1.776 kg = 62.6 oz (UL 60335-2-40 3rd ed. GG.1)
    ruleId: 'refrigerant.a2l-listing',
    severity: 'blocker',
    pairing: () => edit((p) => (p.indoorCoil!.spec.leakSensor = false)),
    title: 'No leak sensor: 115.5 oz of R-454B is above 62.6 oz',
    detail: ['115.5 oz R-454B charge', '62.6 oz'],
  },
  {
    ruleId: 'refrigerant.a2l-listing',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.leakSensor = false;
        p.outdoor.spec.factoryChargeOz = undefined;
      }),
    title: 'No leak sensor, and the R-454B charge is not known',
    detail: ['an R-454B system with more than 62.6 oz'],
  },
  {
    // m_max = 2.5 × 0.296^1.25 × 0.6 m × √(800 × 0.0929 m²) = 2.823 kg = 99.6 oz (UL 60335-2-40 3rd ed. GG.2, hand arithmetic)
    ruleId: 'refrigerant.a2l-charge-area',
    severity: 'caution',
    pairing: () => edit((p) => (p.site!.conditionedAreaSqFt = 800)),
    title: 'R-454B charge 115.5 oz is above the 99.6 oz allowed for 800 sq ft without mitigation',
    detail: ['115.5 oz', '99.6 oz', '800 sq ft', 'floor value of 0.6 m'],
  },
  {
    ruleId: 'refrigerant.a2l-charge-area',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        p.site!.conditionedAreaSqFt = 800;
        p.airHandler!.spec.a2lListed = undefined;
      }),
    title: 'R-454B charge 115.5 oz is above the 99.6 oz allowed for 800 sq ft',
    detail: ['115.5 oz', '99.6 oz'],
  },
  {
    ruleId: 'refrigerant.oil-compatibility',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        r410a(p);
        Object.assign(p.lineSet!, { reused: true, previousRefrigerant: 'R-22', burnoutHistory: false });
      }),
    title: 'Kept line set holds mineral oil from R-22',
    detail: ['The kept line set, which ran R-22, carries mineral oil into an R-410A system'],
  },
  {
    ruleId: 'refrigerant.oil-compatibility',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        r410a(p);
        keptOwnCoilAirHandler(p, ['R-22']);
        Object.assign(p.lineSet!, { reused: true, previousRefrigerant: 'R-22', burnoutHistory: false });
      }),
    title: 'Kept line set and air handler hold mineral oil from R-22',
    detail: ['The kept line set and the air handler, which both ran R-22, carry mineral oil into an R-410A system'],
  },
  {
    ruleId: 'regulation.refrigerant-transition',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.refrigerant = 'R-22';
      }),
    title: 'Not allowed: a new R-22 system installed 2026-06-15',
    detail: ['Not allowed: a new R-22 system installed 2026-06-15'],
  },
  {
    ruleId: 'regulation.refrigerant-transition',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        p.scope = 'component-replacement';
        p.outdoor.spec.refrigerant = 'R-22';
      }),
    title: 'R-22 component replacement: a condition applies',
    detail: ['An R-22 component replacement installed 2026-06-15'],
  },
  {
    ruleId: 'regulation.refrigerant-transition',
    severity: 'info',
    pairing: () =>
      edit((p) => {
        p.scope = 'component-replacement';
        r410a(p);
      }),
    title: 'Allowed as a repair of an existing system',
    detail: ['Allowed as a repair of an existing system'],
  },
  {
    ruleId: 'capacity.coil-range',
    severity: 'blocker',
    pairing: () => edit((p) => (p.outdoor.spec.nominalTons = 4)),
    title: 'Coil covers 2.5–3.5 tons; the unit is 4 tons',
    detail: ['2.5–3.5 tons', '4 tons'],
  },
  {
    ruleId: 'capacity.air-handler-range',
    severity: 'blocker',
    pairing: () => edit((p) => Object.assign(p.airHandler!.spec, { minTons: 1.5, maxTons: 2.5 })),
    title: 'Furnace blower covers 1.5–2.5 tons; the unit is 3 tons',
    detail: ['1.5–2.5 tons', '3 tons'],
  },
  {
    // 1500 CFM / 3 tons = 500 CFM per ton, above the 450 band top (common practice, no source)
    ruleId: 'airflow.per-ton',
    severity: 'caution',
    pairing: () => edit((p) => (p.airHandler!.spec.airflowCfm = 1500)),
    // Target (350 + 450) / 2 × 3 = 1200 CFM (band midpoint)
    title: 'Airflow 500 CFM per ton is above 450: set the blower to about 1200 CFM',
    detail: ['rated 1500 CFM for a 3-ton outdoor unit', '500 CFM/ton'],
  },
  {
    // High tap 1520 CFM at 0.8 in. w.c. (interpolated 1650 → 1430 between 0.5 and 1.0) < 1750 CFM for 5 tons (350 × 5)
    ruleId: 'airflow.per-ton',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.nominalTons = 5;
        p.airHandler!.spec.blowerTable = [{ tap: 'high', points: [{ staticInWc: 0.5, cfm: 1650 }, { staticInWc: 1, cfm: 1430 }] }];
        p.site!.externalStaticInWc = 0.8;
      }),
    title: 'No blower tap reaches 1750–2250 CFM at 0.8 in. w.c.',
    detail: ['high 1518 CFM', 'a 5-ton outdoor unit needs 1750–2250 CFM'],
  },
  {
    ruleId: 'fit.coil-orientation',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.configuration = 'upflow';
        p.site!.airflowDirection = 'horizontal-left';
      }),
    title: 'Upflow coil installed horizontal, discharging left',
    detail: ['An upflow coil is being installed horizontal, discharging left'],
  },
  {
    ruleId: 'fit.coil-cabinet',
    severity: 'blocker',
    pairing: () => edit((p) => (p.indoorCoil!.spec.widthIn = 21)),
    title: 'Coil is 3.5 in wider than the furnace',
    detail: ['21 in wide', '17.5 in'],
  },
  {
    ruleId: 'fit.coil-cabinet',
    severity: 'caution',
    pairing: () => edit((p) => (p.airHandler!.spec.widthIn = 21)),
    title: 'Coil is 3.5 in narrower than the furnace',
    detail: ['17.5 in wide', '21 in'],
  },
  {
    ruleId: 'metering.type-required',
    severity: 'blocker',
    pairing: () =>
      edit((p) => Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.065, meteringBleed: undefined })),
    title: "The unit needs an expansion valve, not the coil's piston",
    detail: ['requires an expansion valve'],
  },
  {
    ruleId: 'metering.piston-size',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        Object.assign(p.outdoor.spec, { meteringRequired: 'any', pistonSizeIn: 0.065 });
        Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.059, meteringBleed: undefined });
      }),
    title: 'Piston is 0.059 in; the unit specifies 0.065 in',
    detail: ['0.059 in', '0.065 in'],
  },
  {
    ruleId: 'metering.heat-pump-bidirectional',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.indoorCoil!.spec.meteringBidirectional = false;
      }),
    title: "The coil's TXV passes flow one way only; a heat pump needs both",
    detail: ['passes flow one way only'],
  },
  {
    ruleId: 'metering.capacity-range',
    severity: 'blocker',
    pairing: () =>
      edit(
        (p) =>
          (p.metering = {
            kept: false,
            spec: { type: 'txv', refrigerant: 'R-454B', minTons: 1.5, maxTons: 2.5, bidirectional: true, bleed: true },
          }),
      ),
    title: 'Metering kit covers 1.5–2.5 tons; the unit is 3 tons',
    detail: ['1.5–2.5 tons', '3 tons'],
  },
  {
    ruleId: 'metering.start-assist',
    severity: 'caution',
    pairing: () => edit((p) => (p.indoorCoil!.spec.meteringBleed = false)),
    title: 'Non-bleed valve on a single-phase unit with no start assist',
    detail: ['non-bleed (hard shutoff) valve'],
  },
  {
    ruleId: 'controls.heat-pump-thermostat',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.controls = { thermostatHeatPump: false };
      }),
    title: 'Thermostat cannot run a heat pump',
    detail: ['no reversing-valve (O/B) output'],
  },
  {
    ruleId: 'controls.heat-pump-thermostat',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        keptOwnCoilAirHandler(p, ['R-454B']);
        p.airHandler!.spec.heatKitKw = 10;
        p.controls = { thermostatHeatPump: true, auxHeatStages: 0 };
      }),
    title: '10 kW heat kit, but no auxiliary heat stage on the thermostat',
    detail: ['10 kW heat kit'],
  },
  {
    // 5/16 in is one standard size below 3/8 in (ACR tube sizes)
    ruleId: 'lineset.liquid-size',
    severity: 'caution',
    pairing: () => edit((p) => (p.lineSet!.liquidOdIn = 0.3125)),
    title: 'Liquid line is 5/16 in; the unit allows 3/8 in',
    detail: ['(1 size smaller)'],
  },
  {
    ruleId: 'lineset.liquid-size',
    severity: 'blocker',
    pairing: () => edit((p) => (p.lineSet!.liquidOdIn = 0.25)),
    title: 'Liquid line is 1/4 in; the unit allows 3/8 in',
    detail: ['(2 sizes smaller)'],
  },
  {
    ruleId: 'lineset.suction-size',
    severity: 'caution',
    pairing: () => edit((p) => (p.lineSet!.suctionOdIn = 0.75)),
    title: 'Suction line is 3/4 in; the unit allows 7/8 in',
    detail: ['(1 size smaller)'],
  },
  {
    ruleId: 'lineset.suction-size',
    severity: 'blocker',
    pairing: () => edit((p) => (p.lineSet!.suctionOdIn = 1.375)),
    title: 'Suction line is 1-3/8 in; the unit allows 7/8 in',
    detail: ['(2 sizes larger)'],
  },
  {
    ruleId: 'lineset.length',
    severity: 'blocker',
    pairing: () => edit((p) => (p.lineSet!.lengthFt = 90)),
    title: "Line set 90 ft is over the unit's 80 ft maximum",
    detail: ['90 ft', '80 ft', '10 ft over'],
  },
  {
    // 50 ft shop default (settings.ts, common practice, no source)
    ruleId: 'lineset.length',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.maxLineLengthFt = undefined;
        p.lineSet!.lengthFt = 60;
      }),
    title: "Line set 60 ft is over the shop's 50 ft default limit",
    detail: ['60 ft', '50 ft'],
  },
  {
    // (25 − 15) ft × 0.55 oz/ft = 5.5 oz (DESIGN §4 with equal sizes)
    ruleId: 'lineset.charge-adjustment',
    severity: 'info',
    pairing: () => edit(() => {}),
    title: 'Add 5.5 oz for 25 ft of 3/8 in line',
    detail: ['Line is 25 ft', 'add 5.5 oz'],
  },
  {
    // 70 ft against the unit's 50 ft standard length (invented unit figure)
    ruleId: 'lineset.long-line',
    severity: 'caution',
    pairing: () => edit((p) => { p.outdoor.spec.standardLineLengthFt = 50; p.lineSet!.lengthFt = 70; }),
    title: 'Long line (70 ft): a crankcase heater is usually required',
    detail: ['A crankcase heater is usually required', '70 ft measured', "the unit's standard length is 50 ft"],
  },
  {
    ruleId: 'electrical.disconnect',
    severity: 'blocker',
    pairing: () => edit((p) => (p.electrical!.disconnect = { withinSight: true, ratingAmps: 15 })),
    title: "Disconnect rated 15 A is below the unit's 18 A load",
    detail: ['15 A disconnect', '18 A minimum circuit ampacity'],
  },
  {
    ruleId: 'electrical.overcurrent-type',
    severity: 'blocker',
    pairing: () => edit((p) => { p.outdoor.spec.overcurrentRequired = 'fuse-or-hacr'; p.electrical!.overcurrentType = 'breaker'; }),
    title: 'The nameplate calls for fuses or an HACR breaker; the circuit has a standard breaker (not HACR-marked)',
    detail: ['fuses or an HACR breaker', 'a standard breaker (not HACR-marked)'],
  },
  {
    ruleId: 'electrical.wire-ampacity',
    severity: 'blocker',
    pairing: () => edit((p) => { p.outdoor.spec.copperOnly = true; Object.assign(p.electrical!, { wireAwg: awg(8), wireMaterial: 'aluminum' }); }),
    title: 'Aluminum wire on a unit marked for copper conductors only',
    detail: ['8 AWG aluminum'],
  },
  {
    ruleId: 'lineset.lift',
    severity: 'blocker',
    pairing: () => edit((p) => (p.lineSet!.liftFt = -35)),
    title: "Lift 35 ft is over the unit's 30 ft limit",
    detail: ['35 ft apart vertically', '30 ft'],
  },
  {
    ruleId: 'lineset.lift',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.maxLiftFt = undefined;
        p.lineSet!.liftFt = 25;
      }),
    title: "Lift 25 ft is over the shop's 20 ft default limit",
    detail: ['25 ft apart vertically', '20 ft'],
  },
  {
    ruleId: 'lineset.filter-drier',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.lineSet!.filterDrier = 'one-way';
      }),
    title: 'One-way filter-drier on a heat pump',
    detail: ['one-way filter-drier'],
  },
  {
    ruleId: 'lineset.filter-drier',
    severity: 'caution',
    pairing: () => edit((p) => (p.lineSet!.filterDrier = 'none')),
    title: 'No filter-drier on an opened system',
    detail: ['(new system)'],
  },
  {
    ruleId: 'lineset.reuse-condition',
    severity: 'blocker',
    pairing: () => edit((p) => (p.lineSet!.indoorFlareJoints = true)),
    title: 'Flare joints indoors on an R-454B system',
    detail: ['Flare joints indoors on an R-454B (A2L'],
  },
  {
    ruleId: 'lineset.reuse-condition',
    severity: 'caution',
    pairing: () => edit((p) => Object.assign(p.lineSet!, { reused: true, previousRefrigerant: 'R-410A', burnoutHistory: true })),
    title: 'Reused line set from a system with a compressor burnout',
    detail: ['compressor burnout'],
  },
  {
    ruleId: 'electrical.breaker-over-mocp',
    severity: 'blocker',
    pairing: () => edit((p) => (p.electrical!.breakerAmps = 40)),
    title: 'Breaker 40 A is above the 30 A maximum',
    detail: ['40 A breaker', '30 A maximum overcurrent protection'],
  },
  {
    ruleId: 'electrical.breaker-under-mca',
    severity: 'blocker',
    pairing: () => edit((p) => (p.electrical!.breakerAmps = 15)),
    title: 'Breaker 15 A is below the 18 A minimum circuit ampacity',
    detail: ['15 A breaker', '18 A minimum circuit ampacity'],
  },
  {
    // 27 A is not in NEC 240.6(A); 25 and 30 A are (values.json EL-03)
    ruleId: 'electrical.breaker-nonstandard',
    severity: 'caution',
    pairing: () => edit((p) => (p.electrical!.breakerAmps = 27)),
    title: 'Breaker 27 A is not a standard size',
    detail: ['27 A is not a standard breaker rating', '25 A, 30 A'],
  },
  {
    // 12 AWG aluminum: 15 A at 60 °C (NEC Table 310.16, from memory)
    ruleId: 'electrical.wire-ampacity',
    severity: 'blocker',
    pairing: () => edit((p) => Object.assign(p.electrical!, { wireAwg: awg(12), wireMaterial: 'aluminum' })),
    title: '12 AWG aluminum carries 15 A; the unit needs 18 A',
    detail: ['15 A at the 60 °C column', '18 A MCA'],
  },
  {
    // 12 AWG copper: 20 A at 60 °C ≥ 18 A MCA (NEC Table 310.16, values.json EL-01); 240.4(D) limit 20 A; 25 A breaker allowed by 440.22
    ruleId: 'electrical.wire-ampacity',
    severity: 'info',
    pairing: () => edit((p) => Object.assign(p.electrical!, { wireAwg: awg(12), wireMaterial: 'copper', breakerAmps: 25 })),
    title: '12 AWG copper on a 25 A breaker is allowed for this unit',
    detail: ['25 A breaker', '20 A limit of NEC 240.4(D)'],
  },
  {
    // 208/230 V nameplate ±10 %: 187–253 V (values.json EL range, NEC 110.3(B) utilization practice)
    ruleId: 'electrical.voltage-mismatch',
    severity: 'blocker',
    pairing: () => edit((p) => (p.electrical!.supplyVoltage = 180)),
    title: "Supply 180 V is outside the unit's 187–253 V",
    detail: ['180 V supply', '187–253 V'],
  },
  {
    ruleId: 'electrical.voltage-mismatch',
    severity: 'blocker',
    pairing: () => edit((p) => (p.electrical!.supplyPhase = 3)),
    title: 'Three-phase supply for a single-phase unit',
    detail: ['The supply is three-phase but the outdoor unit is rated single-phase'],
  },
  {
    ruleId: 'electrical.heat-kit-circuit',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        heatKitAirHandler(p, {}, true);
        p.indoorElectrical = { breakerAmps: 50, wireAwg: awg(6), wireMaterial: 'copper' };
      }),
    title: 'Air handler breaker 50 A is above its 45 A maximum',
    detail: ['50 A breaker', '45 A maximum'],
  },
  {
    // 10 kW × (230 / 240)² = 9.18 kW (resistive output ∝ V²; 240 V default rating, common practice, no source)
    ruleId: 'electrical.heat-kit-circuit',
    severity: 'info',
    pairing: () =>
      edit((p) => {
        heatKitAirHandler(p, {}, true);
        p.indoorElectrical = { breakerAmps: 45, wireAwg: awg(6), wireMaterial: 'copper', supplyVoltage: 230 };
      }),
    title: 'The 10 kW heat kit gives about 9.18 kW at 230 V',
    detail: ['rated at 240 V', '9.18 kW at 230 V'],
  },
  {
    // Southeast split AC under 45,000 Btu/h: 14.3 SEER2 (values.json EFF-02)
    ruleId: 'efficiency.regional-minimum',
    severity: 'blocker',
    pairing: () =>
      edit((p) => {
        p.site!.state = 'TX';
        p.ratedCombinations![0].seer2 = 13.8;
      }),
    title: 'SEER2 13.8 is below 14.3, the Southeast minimum',
    detail: ['SEER2 13.8 is below 14.3', 'for a split air conditioner under 45,000 Btu/h'],
  },
  {
    ruleId: 'efficiency.rebate-tier',
    severity: 'caution',
    pairing: () => edit(() => {}),
    context: { ...DEFAULT_CONTEXT, settings: { ...DEFAULT_CONTEXT.settings, rebateTiers: [{ name: 'Tier 2', seer2: 16 }] } },
    title: 'Short of the Tier 2 rebate tier: SEER2 15.2 is below 16',
    detail: ['SEER2 15.2 is below 16'],
  },
  {
    ruleId: 'rating.no-rated-combination',
    severity: 'caution',
    pairing: () => edit((p) => (p.ratedCombinations = [])),
    title: 'No certified rating found for these models',
    detail: ['HW-C36-B4 with HW-K36-MP'],
  },
  {
    ruleId: 'rating.rated-combination',
    severity: 'info',
    pairing: () => edit(() => {}),
    title: 'Certified rating: 35000 Btu/h cooling, SEER2 15.2, EER2 12',
    detail: ['CERT-HW-0001'],
  },
  {
    ruleId: 'coil.material',
    severity: 'info',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.kept = true;
        p.indoorCoil!.spec.material = 'copper';
      }),
    title: 'Kept copper coil: check it for leaks',
    detail: ['formicary'],
  },
  {
    ruleId: 'condensate.overflow-protection',
    severity: 'caution',
    pairing: () =>
      edit((p) => {
        p.site!.indoorLocation = 'above-ceiling';
        p.site!.hasFloatSwitch = false;
      }),
    title: 'No overflow protection for a unit above a ceiling',
    detail: ['Indoor unit above a ceiling with no float switch'],
  },
  {
    ruleId: 'condensate.overflow-protection',
    severity: 'info',
    pairing: () => edit((p) => (p.site!.hasFloatSwitch = false)),
    title: 'No float switch or secondary pan for a unit in a basement',
    detail: ['Indoor unit in a basement'],
  },
];

function findingOf(c: TextCase): Finding | undefined {
  const rule = ruleById(c.ruleId);
  if (!rule) throw new Error(`no rule ${c.ruleId}`);
  return rule.evaluate(c.pairing(), c.context ?? DEFAULT_CONTEXT).find((f) => f.severity === c.severity && !isMissingFacts(f));
}

describe('finding titles say what is wrong, with the key numbers', () => {
  it.each(CASES.map((c) => [c.ruleId, c.severity, c.title, c] as const))(
    'when %s gives a %s, then it is titled "%s"',
    (_id, _severity, title, c) => {
      const f = findingOf(c);
      expect(f, `${c.ruleId} gave no ${c.severity}`).toBeDefined();
      expect(f!.title).toBe(title);
      for (const part of c.detail) expect(f!.detail).toContain(part);
      if (f!.severity !== 'info') expect(f!.fix.length).toBeGreaterThan(10);
    },
  );

  it('when the registry is listed, then every rule that can raise a blocker or caution has a titled case for it', () => {
    // Severities each rule can produce (read from the rule files); a new rule must add its cases here.
    const covered = new Set(CASES.map((c) => `${c.ruleId}:${c.severity}`));
    const serious = RULES.map((r) => r.id).filter(
      (id) => !['lineset.charge-adjustment', 'rating.rated-combination', 'coil.material'].includes(id),
    );
    for (const id of serious)
      expect(
        [...covered].some((k) => k.startsWith(`${id}:`)),
        id,
      ).toBe(true);
  });
});

/** Raw codes and internal ids that must never reach a title, detail or fix. */
const CODES = [
  ...INDOOR_LOCATIONS.filter((c) => c.includes('-')),
  ...AIRFLOW_DIRECTIONS.filter((c) => c.includes('-')),
  ...SCOPES,
  ...RULES.map((r) => r.id),
  ...DEFAULT_TRANSITION_RULES.map((r) => r.id),
  'regionName',
  'productClass',
];

/** "a"/"an" before a word whose spoken sound asks for the other one. */
function articleSlips(text: string): string[] {
  const slips: string[] = [];
  // "40 A is" is amperes, not an article: skip a capital A after a number.
  for (const m of text.matchAll(/(?<!\d )\b(a|an|A|An) ([\w-][^\s,.;:)]*)/g)) {
    const want = articleFor(m[2]);
    if (want !== m[1].toLowerCase()) slips.push(m[0]);
  }
  return slips;
}

describe('finding words: plain, grammatical, no codes', () => {
  const all: Finding[] = [];
  for (const c of CASES) all.push(...ruleById(c.ruleId)!.evaluate(c.pairing(), c.context ?? DEFAULT_CONTEXT));
  for (const c of REGRESSION_PAIRINGS) all.push(...runChecks(c.pairing(), DEFAULT_CONTEXT).findings);

  it('when any finding is shown, then no raw code or internal id appears in its words', () => {
    for (const f of all) {
      for (const text of [f.title, f.detail, f.fix]) {
        for (const code of CODES) expect(text.includes(code), `"${code}" in ${f.ruleId}: ${text}`).toBe(false);
        expect(
          /\b[a-z]+[A-Z][a-zA-Z]*\b/.test(text.replace(/\b(?:[A-Z]{2,}[a-z]?\d*|kW|oz\/ft)\b/g, '')),
          `camelCase key in ${f.ruleId}: ${text}`,
        ).toBe(false);
      }
    }
  });

  it('when any finding is shown, then its citation carries no "(from memory)"', () => {
    for (const f of all) expect(f.basis.citation, f.ruleId).not.toMatch(/from memory/i);
    for (const r of RULES) expect(r.basis.citation, r.id).not.toMatch(/from memory/i);
  });

  it('when any finding is shown, then "a" and "an" match the next word\'s sound', () => {
    for (const f of all) for (const text of [f.title, f.detail, f.fix]) expect(articleSlips(text), `${f.ruleId}: ${text}`).toEqual([]);
  });

  it('when a count is 1, then its noun is singular; otherwise plural', () => {
    for (const f of all) {
      for (const text of [f.title, f.detail]) {
        expect(/\b1 (sizes|elbows|tons)\b/.test(text), text).toBe(false);
        expect(/\b([02-9]|\d{2,}) (size|elbow)\b/.test(text), text).toBe(false);
      }
    }
  });

  it('when a finding is not a missing-facts note, then its title is not just the rule name', () => {
    for (const f of all) if (!isMissingFacts(f)) expect(f.title, f.ruleId).not.toBe(ruleById(f.ruleId)!.title);
  });

  it('when an efficiency blocker is shown, then it does not say "Not allowed" (only regulation blockers do)', () => {
    for (const f of all) if (f.ruleId.startsWith('efficiency.')) expect(`${f.title} ${f.detail}`).not.toMatch(/not allowed/i);
  });
});
