import { DEFAULT_CONTEXT, runChecks } from '../shared/rules/engine';
import { RULES } from '../shared/rules/index';
import type { Pairing } from '../shared/rules/types';
import type { Electrical } from '../shared/schemas/check';
import type { Measure } from './measure';

/** Invented pairings where nearly everything is wrong somewhere (about 13 findings each): the worst case. */
export function makeFaultyPairings(count: number): Pairing[] {
  const refrigerants = ['R-410A', 'R-32', 'R-454B', 'R-22'] as const;
  const meterings = ['txv', 'piston', 'eev', 'none'] as const;
  const directions = ['upflow', 'downflow', 'horizontal-left', 'horizontal-right'] as const;
  const configs = ['upflow', 'downflow', 'horizontal', 'multi-position'] as const;
  const locations = ['attic', 'closet', 'basement', 'garage', 'above-ceiling'] as const;
  const states = ['OH', 'TX', 'AZ', 'FL', 'MN'];
  // ElectricalSchema's inferred wireAwg type is narrower than WIRE_AWG (a schema cast); widen valid sizes.
  const wires = [14, 12, 10, 8] as Electrical['wireAwg'][];
  const out: Pairing[] = [];
  for (let i = 0; i < count; i++) {
    const tons = 1.5 + (i % 8) * 0.5;
    const refrigerant = refrigerants[i % 4];
    const heatPump = i % 3 === 0;
    out.push({
      scope: i % 2 ? 'component-replacement' : 'new-system',
      installDate: i % 5 ? '2026-06-15' : '2025-03-01',
      site: { state: states[i % 5], indoorLocation: locations[i % 5], airflowDirection: directions[i % 4], hasFloatSwitch: i % 7 === 0, conditionedAreaSqFt: 1200 + (i % 10) * 150 },
      outdoor: {
        kept: false,
        spec: {
          model: `BX-${i % 97}`,
          systemType: heatPump ? 'heat-pump' : 'ac',
          refrigerant,
          nominalTons: tons,
          coolingBtuh: tons * 11800,
          seer2: 13 + (i % 6),
          eer2: 10 + (i % 4),
          hspf2: heatPump ? 7 + (i % 3) * 0.5 : undefined,
          meteringRequired: i % 4 === 0 ? 'txv' : 'any',
          pistonSizeIn: 0.055 + (i % 5) * 0.004,
          liquidLineOdIn: 0.375,
          suctionLineOdIn: tons > 3 ? 0.875 : 0.75,
          maxLineLengthFt: i % 6 ? 75 : undefined,
          factoryChargeOz: 90 + tons * 20,
          chargedLineLengthFt: 15,
          chargePerFtOz: i % 2 ? 0.6 : undefined,
          mcaAmps: 10 + tons * 5,
          mocpAmps: 15 + tons * 8,
          voltage: '208/230',
          phase: i % 9 ? 1 : undefined,
        },
      },
      indoorCoil: {
        kept: i % 2 === 1,
        spec: {
          model: `BC-${i % 89}`,
          configuration: configs[i % 4],
          material: i % 3 ? 'aluminum' : 'copper',
          minTons: tons - (i % 3) * 0.5,
          maxTons: tons + 0.5 - (i % 4 === 1 ? 1 : 0),
          refrigerants: i % 5 ? [refrigerant] : ['R-22'],
          meteringType: meterings[i % 4],
          meteringRefrigerant: i % 6 ? refrigerant : 'R-22',
          meteringBidirectional: i % 4 !== 2,
          meteringBleed: i % 3 === 0,
          pistonSizeIn: 0.059,
          a2lListed: i % 2 === 0,
          leakSensor: i % 4 === 0,
          widthIn: 14.5 + (i % 3) * 3.5,
        },
      },
      airHandler: { kept: true, spec: { model: `BF-${i % 13}`, kind: i % 2 ? 'furnace' : 'air-handler', minTons: 2, maxTons: 4, airflowCfm: 800 + (i % 12) * 100, widthIn: 17.5, heatKitKw: i % 2 ? undefined : 8 } },
      controls: { thermostatHeatPump: i % 5 !== 0, auxHeatStages: i % 3 },
      lineSet: { liquidOdIn: i % 10 ? 0.375 : 0.3125, suctionOdIn: 0.75 + (i % 3) * 0.125, lengthFt: 15 + (i % 9) * 10, liftFt: (i % 7) * 6 - 10, reused: i % 2 === 1, burnoutHistory: i % 11 === 0, indoorFlareJoints: i % 13 === 0, filterDrier: i % 4 ? 'bi-flow' : 'one-way', previousRefrigerant: i % 3 ? undefined : 'R-22' },
      electrical: { breakerAmps: [20, 25, 30, 35, 40, 45][i % 6], wireAwg: wires[i % 4], wireMaterial: 'copper', terminalRatingC: i % 2 ? 75 : 60, supplyVoltage: 230, supplyPhase: 1 },
      ratedCombinations: i % 10 === 0 ? undefined : [{ outdoorModel: `BX-${i % 97}`, indoorModel: i % 3 ? `BC-${i % 89}` : 'OTHER', seer2: 14 + (i % 4), eer2: 11, coolingBtuh: tons * 11500 }],
    });
  }
  return out;
}

/** One of the faults a field check meets, applied to a valid pairing. */
type Fault = (p: Pairing, i: number) => void;
const FAULTS: Fault[] = [
  (p) => { p.indoorCoil!.spec = { ...p.indoorCoil!.spec, maxTons: p.outdoor.spec.nominalTons - 0.5 }; },
  (p) => { p.indoorCoil!.spec = { ...p.indoorCoil!.spec, meteringRefrigerant: 'R-22', refrigerants: ['R-22', p.outdoor.spec.refrigerant] }; p.indoorCoil!.kept = true; },
  (p) => { p.airHandler!.spec = { ...p.airHandler!.spec, airflowCfm: p.outdoor.spec.nominalTons * 320 }; },
  (p) => { p.site = { ...p.site!, indoorLocation: 'attic', hasFloatSwitch: false }; },
  (p) => { p.lineSet = { ...p.lineSet!, lengthFt: 95 }; },
  (p) => { p.lineSet = { ...p.lineSet!, liquidOdIn: 0.3125 }; },
  (p) => { p.electrical = { ...p.electrical!, breakerAmps: (p.outdoor.spec.mocpAmps ?? 30) + 10 }; },
  (p) => { p.electrical = { ...p.electrical!, wireAwg: 14 as Electrical['wireAwg'] }; },
  (p) => { p.indoorCoil!.spec = { ...p.indoorCoil!.spec, widthIn: 14.5 }; },
  (p) => { p.ratedCombinations = []; },
  (p) => { p.ratedCombinations = undefined; },
  (p) => { p.site = { ...p.site!, state: 'TX' }; p.ratedCombinations = [{ ...p.ratedCombinations![0], seer2: 13.4 }]; },
  (p) => { p.indoorCoil!.spec = { ...p.indoorCoil!.spec, meteringBleed: false }; },
  (p) => { p.lineSet = { ...p.lineSet!, reused: true, burnoutHistory: true }; },
  (p) => { p.site = { ...p.site!, airflowDirection: 'horizontal-left' }; p.indoorCoil!.spec = { ...p.indoorCoil!.spec, configuration: 'upflow' }; },
  (p) => { p.lineSet = undefined; p.electrical = undefined; },
];

/**
 * Realistic mix: valid pairings (2–5 tons, R-454B / R-32 / R-410A repair, AC and heat pump, varied
 * sites) with 0–3 faults each, chosen deterministically, as a driveway check or a coil search meets them.
 */
export function makePairings(count: number): Pairing[] {
  const refrigerants = ['R-454B', 'R-32', 'R-410A'] as const;
  const states = ['OH', 'TX', 'AZ', 'FL', 'MN', 'GA', 'WA'];
  const out: Pairing[] = [];
  for (let i = 0; i < count; i++) {
    const tons = 2 + (i % 7) * 0.5;
    const refrigerant = refrigerants[i % 3];
    const heatPump = i % 2 === 0;
    const cfm = Math.round(tons * (370 + (i % 5) * 15));
    const width = tons <= 3 ? 17.5 : 21;
    const p: Pairing = {
      scope: refrigerant === 'R-410A' ? 'component-replacement' : 'new-system',
      installDate: '2026-06-15',
      site: { state: states[i % 7], indoorLocation: i % 4 ? 'basement' : 'closet', airflowDirection: i % 3 ? 'upflow' : 'horizontal-right', conditionedAreaSqFt: 1400 + (i % 9) * 200, hasFloatSwitch: true },
      outdoor: {
        kept: false,
        spec: {
          model: `BX-${tons * 12}-${refrigerant}-${heatPump ? 'H' : 'C'}`,
          systemType: heatPump ? 'heat-pump' : 'ac',
          refrigerant,
          nominalTons: tons,
          coolingBtuh: tons * 11700,
          seer2: 15.2 + (i % 4) * 0.5,
          eer2: 12,
          hspf2: heatPump ? 7.8 : undefined,
          meteringRequired: 'txv',
          liquidLineOdIn: 0.375,
          suctionLineOdIn: tons <= 3 ? 0.75 : 0.875,
          maxLineLengthFt: 80,
          maxLiftFt: 30,
          factoryChargeOz: 80 + tons * 20,
          chargedLineLengthFt: 15,
          chargePerFtOz: 0.55,
          mcaAmps: 8 + tons * 4,
          mocpAmps: 15 + tons * 5,
          voltage: '208/230',
          phase: 1,
          manufactureDate: '2025-09-01',
        },
      },
      indoorCoil: {
        kept: false,
        spec: {
          model: `BC-${tons * 12}-MP`,
          configuration: 'multi-position',
          material: 'aluminum',
          minTons: tons - 0.5,
          maxTons: tons + 0.5,
          refrigerants: [refrigerant],
          meteringType: 'txv',
          meteringRefrigerant: refrigerant,
          meteringBidirectional: true,
          meteringBleed: true,
          a2lListed: refrigerant !== 'R-410A',
          leakSensor: refrigerant !== 'R-410A',
          widthIn: width,
          manufactureDate: '2025-08-01',
        },
      },
      airHandler: { kept: false, spec: { model: `BF-${width}`, kind: 'furnace', minTons: tons - 1, maxTons: tons + 1, airflowCfm: cfm, widthIn: width, a2lListed: true } },
      controls: { thermostatHeatPump: heatPump, auxHeatStages: 1 },
      lineSet: { liquidOdIn: 0.375, suctionOdIn: tons <= 3 ? 0.75 : 0.875, lengthFt: 15 + (i % 6) * 8, liftFt: (i % 5) * 4, reused: refrigerant === 'R-410A', burnoutHistory: false, filterDrier: 'bi-flow' },
      electrical: { breakerAmps: 15 + Math.floor(tons) * 5, wireAwg: (tons > 3.5 ? 8 : 10) as Electrical['wireAwg'], wireMaterial: 'copper', terminalRatingC: 75, supplyVoltage: 230, supplyPhase: 1 },
      ratedCombinations: [{ outdoorModel: `BX-${tons * 12}-${refrigerant}-${heatPump ? 'H' : 'C'}`, indoorModel: `BC-${tons * 12}-MP`, seer2: 15.2 + (i % 4) * 0.5, eer2: 12, hspf2: heatPump ? 7.8 : undefined, coolingBtuh: tons * 11700 }],
    };
    const faults = i % 4; // 0, 1, 2 or 3 faults
    for (let k = 0; k < faults; k++) FAULTS[(i * 7 + k * 5) % FAULTS.length](p, i);
    out.push(p);
  }
  return out;
}

/** Checks per second over a pairing set, on this one core, after a warm-up. */
function throughput(pairings: Pairing[], seconds: number): number {
  for (let i = 0; i < 2; i++) for (const p of pairings) runChecks(p, DEFAULT_CONTEXT);
  let checked = 0;
  let elapsedS = 0;
  const start = process.hrtime.bigint();
  while (elapsedS < seconds) {
    // a fresh object per check, as a real request makes: no per-pairing memo carries over
    for (const p of pairings) runChecks({ ...p }, DEFAULT_CONTEXT);
    checked += pairings.length;
    elapsedS = Number(process.hrtime.bigint() - start) / 1e9;
  }
  return Math.round(checked / elapsedS);
}

/** Average findings per pairing, for the note. */
function findingsPerPairing(pairings: Pairing[]): number {
  let n = 0;
  for (const p of pairings) n += runChecks(p, DEFAULT_CONTEXT).findings.length;
  return Math.round((n / pairings.length) * 10) / 10;
}

/** Full-rule-set throughput on one core: pairings checked per second (realistic mix, and all-faults). */
export function measureRules(): Measure[] {
  const mixed = makePairings(4000);
  const faulty = makeFaultyPairings(4000);
  return [
    {
      id: 'rules.pairings-per-s',
      value: throughput(mixed, 2),
      unit: 'pairings/s',
      note: `${RULES.length} rules, ${mixed.length} varied pairings with 0–3 faults (${findingsPerPairing(mixed)} findings each on average), one core, engine bundled as the app ships it; target > 50,000/s`,
    },
    {
      id: 'rules.pairings-per-s.all-faults',
      value: throughput(faulty, 1),
      unit: 'pairings/s',
      note: `worst case: ${faulty.length} pairings that are wrong almost everywhere (${findingsPerPairing(faulty)} findings each)`,
    },
  ];
}
