// Source: NFPA 70 (NEC) 2020/2023 Table 310.16 (was 310.15(B)(16)): allowable ampacity of insulated
// conductors, not more than three current-carrying conductors, 30 °C ambient.
// Copper 14–2 AWG as confirmed in reproductions (values.json EL-01); copper 1–4/0 and all aluminum
// values are from memory of the same table. Kept as data so the office can update them.
import type { WireAwg } from '../schemas/check';

export type ConductorMaterial = 'copper' | 'aluminum';
export type TemperatureColumnC = 60 | 75 | 90;
type Row = [number, number, number];

const COPPER: Record<string, Row> = {
  '14': [15, 20, 25],
  '12': [20, 25, 30],
  '10': [30, 35, 40],
  '8': [40, 50, 55],
  '6': [55, 65, 75],
  '4': [70, 85, 95],
  '3': [85, 100, 115],
  '2': [95, 115, 130],
  '1': [110, 130, 145],
  '1/0': [125, 150, 170],
  '2/0': [145, 175, 195],
  '3/0': [165, 200, 225],
  '4/0': [195, 230, 260],
};

// Aluminum (and copper-clad aluminum): the table starts at 12 AWG; 14 AWG aluminum has no ampacity.
const ALUMINUM: Record<string, Row> = {
  '12': [15, 20, 25],
  '10': [25, 30, 35],
  '8': [35, 40, 45],
  '6': [40, 50, 55],
  '4': [55, 65, 75],
  '3': [65, 75, 85],
  '2': [75, 90, 100],
  '1': [85, 100, 115],
  '1/0': [100, 120, 135],
  '2/0': [115, 135, 150],
  '3/0': [130, 155, 175],
  '4/0': [150, 180, 205],
};

const COLUMN_INDEX: Record<TemperatureColumnC, number> = { 60: 0, 75: 1, 90: 2 };

/** Ampacity in amps from NEC Table 310.16 for a size, material and temperature column; undefined where the table has none. */
export function conductorAmpacity(awg: WireAwg | string | number, material: ConductorMaterial, columnC: TemperatureColumnC): number | undefined {
  const table = material === 'copper' ? COPPER : ALUMINUM;
  return table[String(awg)]?.[COLUMN_INDEX[columnC]];
}

// Source: NEC 240.4(D) small-conductor overcurrent limits (copper 14/12/10 AWG: 15/20/30 A;
// aluminum 12/10 AWG: 15/25 A). NEC 240.4(G): air-conditioning and refrigerating equipment circuits
// are protected per Article 440, so these limits do not apply there (values.json EL-02).
export const SMALL_CONDUCTOR_MAX_OCPD_AMPS: Record<ConductorMaterial, Record<string, number>> = {
  copper: { '14': 15, '12': 20, '10': 30 },
  aluminum: { '12': 15, '10': 25 },
};

export const ARTICLE_440_NOTE =
  'NEC 240.4(G): A/C and refrigeration circuits follow Article 440, so the 240.4(D) small-conductor limits do not apply; the breaker may be up to the nameplate MOCP when the wire ampacity is at least the MCA.';

/**
 * Temperature column to size conductors by at the terminations (NEC 110.14(C)): 60 °C unless both
 * ends are marked 75 °C. A 90 °C marking still uses 75 °C: equipment terminations are rarely rated
 * above 75 °C and the 90 °C column is for derating only (common practice, no source).
 * `terminalRatingC` is the lower rating of the two ends.
 */
export function terminalColumnC(terminalRatingC: number | undefined): TemperatureColumnC {
  return terminalRatingC !== undefined && terminalRatingC >= 75 ? 75 : 60;
}

/** Cable types held to the 60 °C column whatever their terminals: NM-B (NEC 334.80) and UF-B (NEC 340.80). */
export const SIXTY_C_CABLES: readonly string[] = ['nm-b', 'uf-b'];

/**
 * The ampacity column (°C) for a run: 60 °C for NM-B and UF-B cable (NEC 334.80, 340.80), else the
 * terminal rule of terminalColumnC (NEC 110.14(C)).
 */
export function conductorColumnC(terminalRatingC: number | undefined, conductorType: string | undefined): TemperatureColumnC {
  if (conductorType !== undefined && SIXTY_C_CABLES.includes(conductorType)) return 60;
  return terminalColumnC(terminalRatingC);
}
