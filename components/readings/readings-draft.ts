import type { RuleSettings } from '@/shared/rules/types';
import {
  CommissioningEvaluateSchema,
  type CommissioningEvaluateInput,
  type CommissioningEvaluateResult,
} from '@/shared/schemas/commissioning';
import { dewPointF, bubblePointF, SaturationRangeError } from '@/shared/refrigerants';
import { evaluateReadings, ReadingInputError, wetBulbF } from '@/shared/commissioning';
import { asSentence, plainIssue, readNumber } from './number-text';

/** The Readings form as typed: every number kept as text so a half-typed "3." survives. */
export interface ReadingsDraft {
  refrigerant: string;
  meteringType: CommissioningEvaluateInput['meteringType'] | '';
  mode: 'cooling' | 'heating';
  /** How the tech measured the indoor air: a wet bulb, or dry bulb and humidity. */
  indoorBy: 'wet-bulb' | 'humidity';
  values: Partial<Record<ReadingKey, string>>;
  /** The catalog outdoor unit the refrigerant and target came from, if one was picked. */
  unitLabel?: string;
}

export const READING_KEYS = [
  'suctionPsig',
  'suctionLineF',
  'liquidPsig',
  'liquidLineF',
  'outdoorDbF',
  'indoorWbF',
  'indoorDbF',
  'indoorRhPct',
  'targetSubcoolingF',
  'altitudeFt',
] as const;
export type ReadingKey = (typeof READING_KEYS)[number];

/** What the screen shows, recomputed on every keystroke on the device. */
export interface LiveReadings {
  suctionSatF?: number;
  liquidSatF?: number;
  superheatF?: number;
  subcoolingF?: number;
  /** The wet bulb the evaluation uses (typed, or from dry bulb and humidity), °F. */
  indoorWbF?: number;
  result?: CommissioningEvaluateResult;
  /** Plain words per field key ("above R-410A's critical point"). */
  errors: Partial<Record<ReadingKey | 'refrigerant' | 'meteringType', string>>;
  /** Labels of the fields still needed for a verdict. */
  missing: string[];
}

export function initialReadingsDraft(): ReadingsDraft {
  return { refrigerant: 'R-410A', meteringType: '', mode: 'cooling', indoorBy: 'wet-bulb', values: {} };
}

const NEEDED: { key: ReadingKey | 'meteringType'; label: string }[] = [
  { key: 'meteringType', label: 'metering device' },
  { key: 'suctionPsig', label: 'suction pressure' },
  { key: 'suctionLineF', label: 'suction line temperature' },
  { key: 'liquidPsig', label: 'liquid pressure' },
  { key: 'liquidLineF', label: 'liquid line temperature' },
  { key: 'outdoorDbF', label: 'outdoor dry bulb' },
];

/** To 0.1 °F, as the shared evaluation rounds, so the live figures and the verdict's agree. */
const round1 = (v: number) => Math.round(v * 10) / 10;

/** Runs a saturation step; a reading out of the refrigerant's range becomes the field's message. */
function saturated(compute: () => number, key: ReadingKey, errors: LiveReadings['errors']): number | undefined {
  try {
    return compute();
  } catch (err) {
    if (err instanceof SaturationRangeError) {
      errors[key] = asSentence(err.message);
      return undefined;
    }
    throw err;
  }
}

/**
 * Everything the Readings screen shows, from the draft alone: saturation temperatures, superheat and
 * subcooling as soon as their two fields are typed, and the verdict once every needed field is in.
 */
export function liveReadings(draft: ReadingsDraft, settings: RuleSettings): LiveReadings {
  const errors: LiveReadings['errors'] = {};
  const n: Partial<Record<ReadingKey, number>> = {};
  for (const key of READING_KEYS) {
    const read = readNumber(draft.values[key]);
    if (read.error) errors[key] = read.error;
    else if (read.value !== undefined) n[key] = read.value;
  }
  const live: LiveReadings = { errors, missing: [] };
  const ref = draft.refrigerant;
  if (!ref) errors.refrigerant = 'Pick the refrigerant.';
  const altitudeFt = n.altitudeFt ?? 0;

  if (ref && n.suctionPsig !== undefined) {
    const psig = n.suctionPsig;
    live.suctionSatF = saturated(() => round1(dewPointF(psig, ref, altitudeFt)), 'suctionPsig', errors);
    if (live.suctionSatF !== undefined && n.suctionLineF !== undefined) live.superheatF = round1(n.suctionLineF - live.suctionSatF);
  }
  if (ref && n.liquidPsig !== undefined) {
    const psig = n.liquidPsig;
    live.liquidSatF = saturated(() => round1(bubblePointF(psig, ref, altitudeFt)), 'liquidPsig', errors);
    if (live.liquidSatF !== undefined && n.liquidLineF !== undefined) live.subcoolingF = round1(live.liquidSatF - n.liquidLineF);
  }
  const indoor = indoorAir(draft, n, altitudeFt, errors);
  live.indoorWbF = indoor.indoorWbF;

  live.missing = NEEDED.filter(({ key }) => (key === 'meteringType' ? !draft.meteringType : n[key] === undefined && !errors[key])).map(
    (f) => f.label,
  );
  // A fixed orifice's target superheat comes from the indoor wet bulb (cooling only).
  const wbTyped =
    draft.indoorBy === 'wet-bulb'
      ? n.indoorWbF !== undefined || errors.indoorWbF
      : n.indoorDbF !== undefined && n.indoorRhPct !== undefined;
  if (draft.meteringType === 'piston' && draft.mode === 'cooling' && !wbTyped) live.missing.push('indoor wet bulb');
  if (live.missing.length || Object.keys(errors).length) return live;

  const parsed = CommissioningEvaluateSchema.safeParse({
    refrigerant: ref,
    meteringType: draft.meteringType,
    mode: draft.mode,
    suctionPsig: n.suctionPsig,
    suctionLineF: n.suctionLineF,
    liquidPsig: n.liquidPsig,
    liquidLineF: n.liquidLineF,
    outdoorDbF: n.outdoorDbF,
    ...indoor.input,
    targetSubcoolingF: n.targetSubcoolingF,
    altitudeFt: n.altitudeFt,
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) errors[String(issue.path[0]) as ReadingKey] ??= plainIssue(issue);
    return live;
  }
  try {
    live.result = evaluateReadings(parsed.data, settings);
  } catch (err) {
    if (!(err instanceof ReadingInputError)) throw err;
    const key = (READING_KEYS as readonly string[]).includes(err.field) ? (err.field as ReadingKey) : 'suctionPsig';
    errors[key] = asSentence(err.message);
  }
  return live;
}

/** The indoor air as the evaluation takes it: the typed wet bulb, or dry bulb with humidity. */
function indoorAir(draft: ReadingsDraft, n: Partial<Record<ReadingKey, number>>, altitudeFt: number, errors: LiveReadings['errors']) {
  if (draft.indoorBy === 'wet-bulb') return { indoorWbF: n.indoorWbF, input: { indoorWbF: n.indoorWbF } };
  if (n.indoorDbF === undefined || n.indoorRhPct === undefined)
    return { indoorWbF: undefined, input: { indoorDbF: n.indoorDbF, indoorRhPct: n.indoorRhPct } };
  if (n.indoorRhPct <= 0 || n.indoorRhPct > 100) {
    errors.indoorRhPct = 'Relative humidity is between 1 and 100 %.';
    return { indoorWbF: undefined, input: {} };
  }
  const db = n.indoorDbF;
  const rh = n.indoorRhPct;
  let wb: number | undefined;
  try {
    wb = wetBulbF(db, rh, altitudeFt);
  } catch {
    errors.indoorDbF = 'This dry bulb is outside what the psychrometric formulas cover.';
  }
  return { indoorWbF: wb, input: { indoorDbF: db, indoorRhPct: rh } };
}
