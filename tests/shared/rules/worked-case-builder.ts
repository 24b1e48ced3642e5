import type { Pairing } from '../../../shared/rules/types';
import type { Electrical, WireAwg } from '../../../shared/schemas/check';

/** ElectricalSchema's inferred wireAwg type is narrower than WIRE_AWG (schema cast); this widens a valid size. */
export const awg = (size: WireAwg) => size as Electrical['wireAwg'];

/**
 * A clean, listed new install to start each worked case from (all invented equipment, brand
 * "Harrow"): a 3-ton R-454B AC, A2L-listed cased coil with a bleed TXV for R-454B and a leak
 * sensor, on an A2L-ready furnace, in Ohio, with a certified combination, a 25 ft line set and a
 * breaker/wire inside the nameplate MCA/MOCP. Each case changes what the case is about.
 */
export function cleanInstall(): Pairing {
  return {
    scope: 'new-system',
    installDate: '2026-06-15',
    site: { state: 'OH', indoorLocation: 'basement', airflowDirection: 'upflow', conditionedAreaSqFt: 1800, hasFloatSwitch: true },
    outdoor: {
      kept: false,
      spec: {
        model: 'HW-C36-B4',
        brand: 'Harrow',
        systemType: 'ac',
        refrigerant: 'R-454B',
        nominalTons: 3,
        coolingBtuh: 35000,
        seer2: 15.2,
        eer2: 12,
        meteringRequired: 'txv',
        liquidLineOdIn: 0.375,
        suctionLineOdIn: 0.875,
        maxLineLengthFt: 80,
        maxLiftFt: 30,
        factoryChargeOz: 110,
        chargedLineLengthFt: 15,
        chargePerFtOz: 0.55,
        mcaAmps: 18,
        mocpAmps: 30,
        voltage: '208/230',
        phase: 1,
        manufactureDate: '2025-09-01',
      },
    },
    indoorCoil: {
      kept: false,
      spec: {
        model: 'HW-K36-MP',
        brand: 'Harrow',
        configuration: 'multi-position',
        cased: true,
        material: 'aluminum',
        minTons: 2.5,
        maxTons: 3.5,
        refrigerants: ['R-454B'],
        meteringType: 'txv',
        meteringRefrigerant: 'R-454B',
        meteringBidirectional: true,
        meteringBleed: true,
        a2lListed: true,
        leakSensor: true,
        widthIn: 17.5,
        manufactureDate: '2025-08-01',
      },
    },
    airHandler: {
      kept: false,
      spec: { model: 'HW-F80-17', brand: 'Harrow', kind: 'furnace', minTons: 2, maxTons: 3.5, airflowCfm: 1200, widthIn: 17.5, a2lListed: true },
    },
    controls: { thermostatHeatPump: false, auxHeatStages: 0 },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 25, liftFt: 6, reused: false, filterDrier: 'bi-flow' },
    electrical: { breakerAmps: 25, wireAwg: awg(10), wireMaterial: 'copper', terminalRatingC: 60, supplyVoltage: 230, supplyPhase: 1 },
    ratedCombinations: [{ outdoorModel: 'HW-C36-B4', indoorModel: 'HW-K36-MP', coolingBtuh: 35000, seer2: 15.2, eer2: 12, reference: 'CERT-HW-0001' }],
  };
}

/** A deep copy to edit per case (the base stays clean). */
export function edit(change: (p: Pairing) => void): Pairing {
  const p = structuredClone(cleanInstall());
  change(p);
  return p;
}
