// Relation: target superheat = (3 × indoor wet bulb − 80 − outdoor dry bulb) / 2 (°F), the widely
// published field formula for charging a fixed-orifice (piston or capillary) system — common practice
// (no source): a straight-line fit of the printed fixed-orifice charging charts, which differ from it by
// up to about 2 °F (values.json CM-05). Valid only inside the charts' range: indoor wet bulb about
// 50–76 °F, outdoor dry bulb 55–115 °F; below a 5 °F target the charge is weighed in instead.

export const TARGET_SUPERHEAT_LIMITS = {
  indoorWbMinF: 50,
  indoorWbMaxF: 76,
  outdoorDbMinF: 55,
  outdoorDbMaxF: 115,
  /** Below this target in °F the superheat method is not used. */
  minTargetF: 5,
} as const;

export const TARGET_SUPERHEAT_RELATION = 'target superheat = (3 × indoor wet bulb − 80 − outdoor dry bulb) ÷ 2, the common field formula for fixed-orifice charging';

/** Target superheat in °F for a fixed orifice from indoor wet bulb (°F) and outdoor dry bulb (°F); no range check. */
export function targetSuperheatF(indoorWbF: number, outdoorDbF: number): number {
  return (3 * indoorWbF - 80 - outdoorDbF) / 2;
}

export type TargetSuperheatCheck = { usable: true; targetF: number } | { usable: false; targetF?: number; reason: string };

/** The fixed-orifice target in °F when the conditions are inside the relation's range, else why not. */
export function checkTargetSuperheat(indoorWbF: number, outdoorDbF: number): TargetSuperheatCheck {
  const L = TARGET_SUPERHEAT_LIMITS;
  if (indoorWbF < L.indoorWbMinF || indoorWbF > L.indoorWbMaxF) {
    return { usable: false, reason: `indoor wet bulb ${fmt(indoorWbF)} °F is outside ${L.indoorWbMinF}–${L.indoorWbMaxF} °F, where the superheat chart applies` };
  }
  if (outdoorDbF < L.outdoorDbMinF || outdoorDbF > L.outdoorDbMaxF) {
    return { usable: false, reason: `outdoor temperature ${fmt(outdoorDbF)} °F is outside ${L.outdoorDbMinF}–${L.outdoorDbMaxF} °F, where the superheat chart applies` };
  }
  const targetF = targetSuperheatF(indoorWbF, outdoorDbF);
  if (targetF < L.minTargetF) {
    return { usable: false, targetF, reason: `the target superheat would be ${fmt(targetF)} °F, under ${L.minTargetF} °F, too small to charge by` };
  }
  return { usable: true, targetF };
}

/** A temperature or difference in °F rounded to 0.1 for sentences. */
export function fmt(valueF: number): string {
  return (Math.round(valueF * 10) / 10).toFixed(1).replace(/\.0$/, '').replace('-', '−');
}
