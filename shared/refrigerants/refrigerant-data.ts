// Sources:
// - Safety groups and compositions: ANSI/ASHRAE Standard 34 (2019/2022), Tables 4-1/4-2.
// - GWP: computed from the composition with IPCC AR4 component values (see components.ts).
// - LFL (lower flammability limit) of the A2Ls: ASHRAE 34 — from memory (R-32 0.307 kg/m³,
//   R-454B 0.296 kg/m³); re-check against the standard before relying on a marginal result.
// - Oil: POE for the HFC/HFO refrigerants, mineral oil (or alkylbenzene) for R-22 — common practice (no source).

export type SafetyClass = 'A1' | 'A2L' | 'A2' | 'A3';
export type OilType = 'mineral' | 'poe';
/** HCFCs are regulated as ozone-depleting substances (40 CFR 82), HFCs under the AIM Act (40 CFR 84). */
export type ChemicalKind = 'HCFC' | 'HFC' | 'HFC/HFO blend';

export interface RefrigerantData {
  id: string;
  kind: ChemicalKind;
  safetyClass: SafetyClass;
  oil: OilType;
  /** A zeotropic blend has a temperature glide: bubble and dew points differ. */
  zeotropic: boolean;
  /** Composition by mass, percent per component. */
  compositionMassPct: Record<string, number>;
  /** Lower flammability limit in kg/m³ (flammable classes only). */
  lflKgM3?: number;
}

export const REFRIGERANT_DATA: RefrigerantData[] = [
  { id: 'R-22', kind: 'HCFC', safetyClass: 'A1', oil: 'mineral', zeotropic: false, compositionMassPct: { 'R-22': 100 } },
  // 400-series: zeotropic (R-410A's glide is small, about 0.1 K, but it is still a zeotrope).
  { id: 'R-410A', kind: 'HFC', safetyClass: 'A1', oil: 'poe', zeotropic: true, compositionMassPct: { 'R-32': 50, 'R-125': 50 } },
  { id: 'R-32', kind: 'HFC', safetyClass: 'A2L', oil: 'poe', zeotropic: false, compositionMassPct: { 'R-32': 100 }, lflKgM3: 0.307 },
  { id: 'R-454B', kind: 'HFC/HFO blend', safetyClass: 'A2L', oil: 'poe', zeotropic: true, compositionMassPct: { 'R-32': 68.9, 'R-1234yf': 31.1 }, lflKgM3: 0.296 },
  { id: 'R-407C', kind: 'HFC', safetyClass: 'A1', oil: 'poe', zeotropic: true, compositionMassPct: { 'R-32': 23, 'R-125': 25, 'R-134a': 52 } },
];
