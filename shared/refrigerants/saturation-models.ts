import { moleFractionsFromMass, prBubblePressureKpa, prDewPressureKpa, type PrComponent, type PrMixture } from './peng-robinson';
import { ancillaryPressureKpa, type AncillaryEquation } from './vapor-pressure';

/**
 * How each refrigerant's saturation pressures are computed (T in K → p in kPa absolute), with sources.
 * Pure fluids and the pseudo-pure blends use the published ancillary vapor-pressure equations that
 * accompany their reference equations of state; R-454B is a Peng–Robinson mixture of its components.
 */
export interface SaturationModel {
  id: string;
  /** Where the equations and constants come from, in words a reader can look up. */
  source: string;
  /** Critical (or pseudo-critical) temperature in K and pressure in kPa. */
  criticalTempK: number;
  criticalPressureKpa: number;
  bubblePressureKpa(tempK: number): number;
  dewPressureKpa(tempK: number): number;
}

function ancillary(reducingTempK: number, reducingPressureKpa: number, n: number[], t: number[]): AncillaryEquation {
  return { reducingTempK, reducingPressureKpa, n, t };
}

function pureModel(id: string, source: string, eq: AncillaryEquation): SaturationModel {
  const p = (tempK: number) => ancillaryPressureKpa(eq, tempK);
  return { id, source, criticalTempK: eq.reducingTempK, criticalPressureKpa: eq.reducingPressureKpa, bubblePressureKpa: p, dewPressureKpa: p };
}

// critical point of Kamei, Beyerlein & Jacobsen, Int. J. Thermophys. 16 (1995) (369.295 K,
// 4.990 MPa); the vapor-pressure ancillary distributed with that reference EOS in NIST REFPROP.
const R22_VAPOR = ancillary(369.295, 4990, [-7.078, 1.7211, -1.6379, -3.7952, 0.86937], [1, 1.5, 2.2, 4.8, 6.2]);

// critical point of Tillner-Roth & Yokozeki, J. Phys. Chem. Ref. Data 26 (1997) 1273 (351.255 K,
// 5.782 MPa); the vapor-pressure ancillary distributed with that reference EOS in NIST REFPROP.
const R32_VAPOR = ancillary(351.255, 5782, [-7.4883, 1.9697, -1.7496, -4.0224, 1.5209], [1, 1.5, 2.2, 4.8, 6.2]);

// R-1234yf: Richter, McLinden & Lemmon, J. Chem. Eng. Data 56 (2011) 3254 — critical point (367.85 K,
// 3.3822 MPa) and the vapor-pressure ancillary published with the EOS.
const R1234YF_VAPOR = ancillary(367.85, 3382.2, [-7.4697, 2.7915, -2.1312, -2.9531], [1, 1.5, 1.8, 3.8]);

// R-410A and R-407C: Lemmon, "Pseudo-pure fluid equations of state for the refrigerant blends R-410A,
// R-404A, R-507A and R-407C", Int. J. Thermophys. 24 (2003) 991 — the bubble- and dew-point pressure
// ancillaries published with those EOS (reducing point = the blend's pseudo-critical point).
const R410A_BUBBLE = ancillary(344.494, 4901.2, [-7.2818, 2.5093, -3.2695, -2.8022], [1, 1.8, 2.4, 4.9]);
const R410A_DEW = ancillary(344.494, 4901.2, [-7.4411, 1.9883, -2.4925, -3.2633], [1, 1.6, 2.4, 5]);
const R407C_BUBBLE = ancillary(359.345, 4631.7, [0.48722, -6.6959, -1.4165, -2.5109], [0.54, 0.925, 2.7, 4.7]);
const R407C_DEW = ancillary(359.345, 4631.7, [-0.086077, -6.6364, -2.4648, -3.4776], [0.4, 0.965, 3.1, 5]);

// R-454B = R-32/R-1234yf 68.9/31.1 % by mass (ANSI/ASHRAE 34). Critical constants and acentric factors:
// values.json RP-11/RP-13 (the reference EOS papers above); molar masses 52.024 and 114.0416 g/mol.
const R32_PR: PrComponent = { id: 'R-32', criticalTempK: 351.255, criticalPressureKpa: 5782, acentric: 0.2769, vaporPressureKpa: (t) => ancillaryPressureKpa(R32_VAPOR, t) };
const R1234YF_PR: PrComponent = { id: 'R-1234yf', criticalTempK: 367.85, criticalPressureKpa: 3382.2, acentric: 0.276, vaporPressureKpa: (t) => ancillaryPressureKpa(R1234YF_VAPOR, t) };
const R454B_X = moleFractionsFromMass([0.689, 0.311], [52.024, 114.0416]);
/**
 * k_ij of R-32/R-1234yf for this Peng–Robinson model: no published value was at hand, so it was FITTED
 * (scripts/fit-r454b-kij.ts, least squares in pressure) to the R-454B bubble and dew points of
 * ../shared/reference/values.json PT-04, which were computed with CoolProp 8.0.0 (an open reference
 * library; R-32/R-1234yf mixture model with the 'Bell-JPCRD-2023' binary parameters).
 */
export const R454B_KIJ = 0.0386;
const R454B_MIX: PrMixture = { components: [R32_PR, R1234YF_PR], moleFractions: R454B_X, kij: [[0, R454B_KIJ], [R454B_KIJ, 0]] };

export const SATURATION_MODELS: Record<string, SaturationModel> = {
  'R-22': pureModel('R-22', 'Kamei et al. (1995) reference EOS: critical point and vapor-pressure ancillary', R22_VAPOR),
  'R-32': pureModel('R-32', 'Tillner-Roth & Yokozeki (1997) reference EOS: critical point and vapor-pressure ancillary', R32_VAPOR),
  'R-410A': {
    id: 'R-410A',
    source: 'Lemmon (2003) pseudo-pure EOS for R-410A: bubble and dew ancillaries',
    criticalTempK: R410A_BUBBLE.reducingTempK,
    criticalPressureKpa: R410A_BUBBLE.reducingPressureKpa,
    bubblePressureKpa: (t) => ancillaryPressureKpa(R410A_BUBBLE, t),
    dewPressureKpa: (t) => ancillaryPressureKpa(R410A_DEW, t),
  },
  'R-407C': {
    id: 'R-407C',
    source: 'Lemmon (2003) pseudo-pure EOS for R-407C: bubble and dew ancillaries',
    criticalTempK: R407C_BUBBLE.reducingTempK,
    criticalPressureKpa: R407C_BUBBLE.reducingPressureKpa,
    bubblePressureKpa: (t) => ancillaryPressureKpa(R407C_BUBBLE, t),
    dewPressureKpa: (t) => ancillaryPressureKpa(R407C_DEW, t),
  },
  'R-454B': {
    id: 'R-454B',
    source: 'Peng–Robinson (1976) mixture of R-32 and R-1234yf, each matched to its reference vapor pressure, van der Waals mixing with a fitted k_ij',
    // Pseudo-critical point by Kay's rule (mole-fraction average of the components): an estimate only
    // used to bound the range; the blend's true critical point differs by a few kelvin.
    criticalTempK: R454B_X[0] * R32_PR.criticalTempK + R454B_X[1] * R1234YF_PR.criticalTempK,
    criticalPressureKpa: R454B_X[0] * R32_PR.criticalPressureKpa + R454B_X[1] * R1234YF_PR.criticalPressureKpa,
    bubblePressureKpa: (t) => prBubblePressureKpa(R454B_MIX, t),
    dewPressureKpa: (t) => prDewPressureKpa(R454B_MIX, t),
  },
};

/** The pure components of the R-454B model (R-32, R-1234yf) with their PR constants. */
export const R454B_COMPONENTS: readonly PrComponent[] = [R32_PR, R1234YF_PR];

/** The R-454B mixture with another k_ij (for the fitting script and its test). */
export function r454bMixture(kij: number): PrMixture {
  return { ...R454B_MIX, kij: [[0, kij], [kij, 0]] };
}
