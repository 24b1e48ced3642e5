import type { Pairing } from '../../../shared/rules/types';
import { awg, edit } from './worked-case-builder';

/**
 * Pairings whose verdict and serious findings were right before the engine's second pass and must
 * stay so (Issue 12, "no correct finding of today changes"). Each starts from the clean certified
 * R-454B install in worked-case-builder.ts and changes one or two facts. None touches a corrected
 * principle (airflow from one rated figure, oil in parts that carried no refrigerant, the A2L
 * detection threshold, release height, charge adjustment with differing sizes, heat-kit voltage).
 */
export interface RegressionPairing {
  name: string;
  pairing: () => Pairing;
}

const r410aAc = (p: Pairing) => {
  Object.assign(p.outdoor.spec, { refrigerant: 'R-410A', model: 'HW-C36-A4' });
  Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], meteringRefrigerant: 'R-410A', a2lListed: false, leakSensor: undefined });
  p.ratedCombinations = [{ outdoorModel: 'HW-C36-A4', indoorModel: 'HW-K36-MP', coolingBtuh: 35000, seer2: 15.2, eer2: 12 }];
  p.scope = 'component-replacement';
};
const heatPump = (p: Pairing) => {
  Object.assign(p.outdoor.spec, { systemType: 'heat-pump', hspf2: 7.8 });
  p.controls = { thermostatHeatPump: true, auxHeatStages: 1 };
  p.ratedCombinations![0].hspf2 = 7.8;
};

export const REGRESSION_PAIRINGS: RegressionPairing[] = [
  { name: 'clean certified R-454B AC', pairing: () => edit(() => {}) },
  { name: 'clean R-410A replacement', pairing: () => edit(r410aAc) },
  { name: 'clean R-454B heat pump', pairing: () => edit(heatPump) },
  { name: 'R-22 TXV on an R-454B system', pairing: () => edit((p) => (p.indoorCoil!.spec.meteringRefrigerant = 'R-22')) },
  {
    name: 'coil listed for R-410A only on R-454B',
    pairing: () => edit((p) => Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-410A'], a2lListed: false })),
  },
  { name: 'furnace marked not A2L-listed', pairing: () => edit((p) => (p.airHandler!.spec.a2lListed = false)) },
  { name: '4-ton unit on a 2.5–3.5-ton coil', pairing: () => edit((p) => Object.assign(p.outdoor.spec, { nominalTons: 4 })) },
  {
    name: 'furnace range below the outdoor tons',
    pairing: () => edit((p) => Object.assign(p.airHandler!.spec, { minTons: 1.5, maxTons: 2.5 })),
  },
  {
    name: 'upflow coil installed horizontal-left',
    pairing: () =>
      edit((p) => {
        p.indoorCoil!.spec.configuration = 'upflow';
        p.site!.airflowDirection = 'horizontal-left';
      }),
  },
  { name: 'coil 3.5 in wider than the furnace', pairing: () => edit((p) => (p.indoorCoil!.spec.widthIn = 21)) },
  { name: 'coil 3.5 in narrower than the furnace', pairing: () => edit((p) => (p.airHandler!.spec.widthIn = 21)) },
  {
    name: 'piston coil on a TXV-required unit',
    pairing: () =>
      edit((p) => Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.065, meteringBleed: undefined })),
  },
  { name: 'non-bleed TXV on a single-phase unit', pairing: () => edit((p) => (p.indoorCoil!.spec.meteringBleed = false)) },
  {
    name: 'heat pump with a one-way TXV',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.indoorCoil!.spec.meteringBidirectional = false;
      }),
  },
  {
    name: 'heat pump on a cooling-only thermostat',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.controls = { thermostatHeatPump: false };
      }),
  },
  {
    name: 'heat pump with a one-way drier',
    pairing: () =>
      edit((p) => {
        heatPump(p);
        p.lineSet!.filterDrier = 'one-way';
      }),
  },
  { name: 'no filter-drier on a new system', pairing: () => edit((p) => (p.lineSet!.filterDrier = 'none')) },
  { name: 'liquid line one size small', pairing: () => edit((p) => (p.lineSet!.liquidOdIn = 0.25)) },
  { name: 'suction line two sizes small', pairing: () => edit((p) => (p.lineSet!.suctionOdIn = 0.625)) },
  { name: 'line 90 ft on an 80 ft unit', pairing: () => edit((p) => (p.lineSet!.lengthFt = 90)) },
  { name: 'lift 35 ft on a 30 ft unit', pairing: () => edit((p) => (p.lineSet!.liftFt = -35)) },
  { name: 'indoor flare joints on R-454B', pairing: () => edit((p) => (p.lineSet!.indoorFlareJoints = true)) },
  {
    name: 'reused line set after a burnout',
    pairing: () => edit((p) => Object.assign(p.lineSet!, { reused: true, previousRefrigerant: 'R-410A', burnoutHistory: true })),
  },
  {
    name: 'kept R-22 line set on R-410A',
    pairing: () =>
      edit((p) => {
        r410aAc(p);
        Object.assign(p.lineSet!, { reused: true, previousRefrigerant: 'R-22', burnoutHistory: false });
      }),
  },
  { name: 'breaker 40 A over a 30 A MOCP', pairing: () => edit((p) => (p.electrical!.breakerAmps = 40)) },
  { name: 'breaker 15 A under an 18 A MCA', pairing: () => edit((p) => (p.electrical!.breakerAmps = 15)) },
  { name: 'non-standard 27 A breaker', pairing: () => edit((p) => (p.electrical!.breakerAmps = 27)) },
  {
    name: '14 AWG aluminum on an 18 A MCA',
    pairing: () => edit((p) => Object.assign(p.electrical!, { wireAwg: awg(14), wireMaterial: 'aluminum' })),
  },
  { name: 'supply 180 V on a 208/230 V unit', pairing: () => edit((p) => (p.electrical!.supplyVoltage = 180)) },
  { name: 'three-phase supply on a single-phase unit', pairing: () => edit((p) => (p.electrical!.supplyPhase = 3)) },
  {
    name: 'SEER2 13.8 in Texas (Southeast)',
    pairing: () =>
      edit((p) => {
        p.site!.state = 'TX';
        p.ratedCombinations![0].seer2 = 13.8;
        p.outdoor.spec.seer2 = 13.8;
      }),
  },
  { name: 'no certified combination for the models', pairing: () => edit((p) => (p.ratedCombinations = [])) },
  {
    name: 'attic install with no overflow protection',
    pairing: () =>
      edit((p) => {
        p.site!.indoorLocation = 'attic';
        p.site!.hasFloatSwitch = false;
        p.site!.airflowDirection = 'horizontal-right';
      }),
  },
  {
    name: 'kept copper coil on R-410A',
    pairing: () =>
      edit((p) => {
        r410aAc(p);
        p.indoorCoil!.kept = true;
        p.indoorCoil!.spec.material = 'copper';
      }),
  },
  {
    name: 'piston 0.059 in where the unit ships 0.065 in',
    pairing: () =>
      edit((p) => {
        p.outdoor.spec.meteringRequired = 'any';
        p.outdoor.spec.pistonSizeIn = 0.065;
        Object.assign(p.indoorCoil!.spec, { meteringType: 'piston', pistonSizeIn: 0.059, meteringBleed: undefined });
      }),
  },
  {
    name: 'R-22 replacement installed after the production ban',
    pairing: () =>
      edit((p) => {
        p.scope = 'new-system';
        p.outdoor.spec.refrigerant = 'R-22';
        Object.assign(p.indoorCoil!.spec, { refrigerants: ['R-22'], meteringRefrigerant: 'R-22', a2lListed: false });
      }),
  },
];
