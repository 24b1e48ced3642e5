import type { Pairing } from '../../shared/rules/types';

type AirHandlerSpec = NonNullable<Pairing['airHandler']>['spec'];

/** An air handler with its own coil standing in for the coil part (invented model; 1200 CFM over 2–3.5 tons). */
export function ownCoilAirHandler(p: Pairing, spec: Partial<AirHandlerSpec> = {}, kept = false): void {
  p.indoorCoil = undefined;
  p.airHandler = { kept, spec: { model: 'HW-AH36', kind: 'air-handler', minTons: 2, maxTons: 3.5, airflowCfm: 1200, ...spec } };
}

/**
 * The same air handler listed for R-454B with a leak sensor and a 10 kW heat kit on its own 208/230 V circuit,
 * MCA 40 A / MOCP 45 A (invented nameplate figures for the heat-kit circuit cases).
 */
export function heatKitAirHandler(p: Pairing, spec: Partial<AirHandlerSpec> = {}, kept = false): void {
  ownCoilAirHandler(
    p,
    { refrigerants: ['R-454B'], a2lListed: true, leakSensor: true, heatKitKw: 10, mcaAmps: 40, mocpAmps: 45, voltage: '208/230', ...spec },
    kept,
  );
}
