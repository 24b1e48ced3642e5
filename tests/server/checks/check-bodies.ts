/**
 * Check bodies for the API tests, built here (never the demo seed). Models are invented.
 * Electrical figures: MCA 21.2 A / MOCP 35 A for a 16.0 A RLA compressor with a 1.2 A fan
 * (NEC 440.32 and 440.22(A) — values.json EL-04, EL-05).
 */
export const heatPump410a = {
  model: 'ZT-HP36-T1',
  systemType: 'heat-pump',
  refrigerant: 'R-410A',
  nominalTons: 3,
  meteringRequired: 'txv',
  liquidLineOdIn: 0.375,
  suctionLineOdIn: 0.875,
  mcaAmps: 21.2,
  mocpAmps: 35,
  voltage: '208/230',
  phase: 1,
};

/** A coil from an R-22 system whose factory TXV is set for R-22 (kept from the old system). */
export const r22TxvCoil = {
  model: 'ZT-OLDCOIL-30',
  minTons: 2.5,
  maxTons: 3.5,
  refrigerants: ['R-22'],
  meteringType: 'txv',
  meteringRefrigerant: 'R-22',
  meteringBidirectional: true,
};

/** A coil listed for R-410A with a bidirectional TXV for it. */
export const coil410a = {
  model: 'ZT-COIL-36',
  minTons: 2.5,
  maxTons: 3.5,
  refrigerants: ['R-410A'],
  meteringType: 'txv',
  meteringRefrigerant: 'R-410A',
  meteringBidirectional: true,
};

/** 1200 CFM on a 3-ton unit is 400 CFM/ton, the common design figure (common practice, no source). */
export const airHandler1200 = { model: 'ZT-AH-1200', kind: 'air-handler', minTons: 2, maxTons: 4, airflowCfm: 1200 };

export const inline = (spec: object, kept = false) => ({ spec, kept });
