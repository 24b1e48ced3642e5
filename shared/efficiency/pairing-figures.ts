// Source: DESIGN §3 and 10 CFR 429.16 — the installed outdoor + indoor combination is what is rated;
// the outdoor unit's own figures stand in only when no rated combination matches (and we say so).
import { findRatedCombination } from '../rules/rated-match';
import type { Pairing } from '../rules/types';

export interface EfficiencyFigures {
  source: 'rated-combination' | 'outdoor-unit';
  /** Words for the detail sentence: where the figures came from. */
  sourceText: string;
  seer2?: number;
  eer2?: number;
  hspf2?: number;
  /** Cooling capacity in Btu/h: rated, else the unit's, else nominal tons × 12,000. */
  coolingBtuh: number;
  reference?: string;
}

/** The SEER2/EER2/HSPF2 (and capacity, Btu/h) to judge a pairing by. */
export function efficiencyFigures(pairing: Pairing): EfficiencyFigures {
  const o = pairing.outdoor.spec;
  const fallbackBtuh = o.coolingBtuh ?? o.nominalTons * 12000;
  const combo = findRatedCombination(pairing);
  if (combo) {
    return {
      source: 'rated-combination',
      sourceText: `the rated combination${combo.reference ? ` ${combo.reference}` : ''}`,
      seer2: combo.seer2,
      eer2: combo.eer2,
      hspf2: combo.hspf2,
      coolingBtuh: combo.coolingBtuh ?? fallbackBtuh,
      reference: combo.reference,
    };
  }
  const why = pairing.ratedCombinations === undefined ? 'rated combinations not looked up' : 'no rated combination matches this outdoor + indoor';
  return { source: 'outdoor-unit', sourceText: `the outdoor unit's own figures (${why})`, seer2: o.seer2, eer2: o.eer2, hspf2: o.hspf2, coolingBtuh: fallbackBtuh };
}
