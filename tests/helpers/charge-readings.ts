/**
 * R-410A gauge and line readings of a TXV system right on target: dew point 40 °F at 118.4 psig and bubble point
 * 100 °F at 318.5 psig (CoolProp 8.0.0, Lemmon 2003 EOS; values.json PT-02), so 50 °F on the suction line is
 * 10 °F superheat and 90 °F on the liquid line is 10 °F subcooling (±1 °F, PT-02 tolerance).
 */
export const R410A_TXV_ON_TARGET = {
  refrigerant: 'R-410A',
  meteringType: 'txv',
  suctionPsig: 118.4,
  suctionLineF: 50,
  liquidPsig: 318.5,
  liquidLineF: 90,
} as const;
