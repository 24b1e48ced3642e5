import { isA2L } from '../refrigerants';
import { bubblePointF, dewPointF, SaturationRangeError } from '../refrigerants/saturation';
import { PsychrometricInputError, wetBulbF } from '../psychrometrics/wet-bulb';
import type { CommissioningEvaluateInput, CommissioningEvaluateResult } from '../schemas/commissioning';
import { resolveCommissioningSettings, type CommissioningSettingsInput } from './settings';
import { checkTargetSuperheat, fmt } from './target-superheat';

/**
 * Start-up readings → superheat, subcooling, their targets and a plain verdict (DESIGN.md §4, §5).
 * Superheat = suction line temperature − dew point at suction pressure; subcooling = bubble point at
 * liquid pressure − liquid line temperature (the definitions). Pure: the Readings screen runs it
 * offline on every keystroke and the server runs the same code for POST /api/commissioning/evaluate.
 */

/** An input the evaluation cannot use; `field` names it as in CommissioningEvaluateSchema. */
export class ReadingInputError extends Error {
  constructor(
    readonly field: keyof CommissioningEvaluateInput,
    message: string,
  ) {
    super(message);
    this.name = 'ReadingInputError';
  }
}

// An expansion valve normally holds about 8–12 °F evaporator superheat (values.json CM-06, common
// practice); only clearly abnormal readings outside 5–20 °F are called a valve problem here — common
// practice (no source), wide so a valve still settling is not blamed.
export const VALVE_SUPERHEAT_MIN_F = 5;
export const VALVE_SUPERHEAT_MAX_F = 20;
// On a fixed orifice, subcooling above this (°F) with high superheat points to a restriction rather
// than a low charge — common practice (no source).
export const FIXED_ORIFICE_HIGH_SUBCOOLING_F = 15;

const round1 = (v: number) => Math.round(v * 10) / 10;

function saturation(fn: () => number, field: 'suctionPsig' | 'liquidPsig' | 'refrigerant'): number {
  try {
    return fn();
  } catch (err) {
    if (err instanceof SaturationRangeError) throw new ReadingInputError(err.field === 'refrigerant' ? 'refrigerant' : field, err.message);
    throw err;
  }
}

/** The indoor wet bulb in °F: as measured, else from dry bulb and humidity (psychrolib), else undefined. */
function indoorWetBulb(input: CommissioningEvaluateInput, altitudeFt: number): { wbF?: number; source?: 'measured' | 'from-humidity' } {
  if (input.indoorWbF !== undefined) return { wbF: input.indoorWbF, source: 'measured' };
  if (input.indoorDbF !== undefined && input.indoorRhPct !== undefined) {
    try {
      return { wbF: wetBulbF(input.indoorDbF, input.indoorRhPct, altitudeFt), source: 'from-humidity' };
    } catch (err) {
      if (err instanceof PsychrometricInputError) throw new ReadingInputError(err.field === 'rhPct' ? 'indoorRhPct' : err.field === 'dryBulbF' ? 'indoorDbF' : 'altitudeFt', err.message);
      throw err;
    }
  }
  return {};
}

// The usual cautions for charging work (DESIGN: safety), shown with every verdict.
export const CHARGING_CAUTION =
  'Refrigerant work is for certified technicians only, with gauges and hoses rated for the refrigerant; follow the installation instructions — local codes and the authority having jurisdiction take precedence.';
export const A2L_CAUTION =
  'A2L refrigerant (mildly flammable): keep ignition sources away, ventilate the area, and use recovery equipment and cylinders rated for A2L refrigerants.';

/** Superheat, subcooling, targets and verdict in °F for one set of start-up readings. */
export function evaluateReadings(input: CommissioningEvaluateInput, settingsInput: CommissioningSettingsInput = {}): CommissioningEvaluateResult {
  const result = judgeReadings(input, settingsInput);
  return { ...result, cautions: isA2L(input.refrigerant) ? [CHARGING_CAUTION, A2L_CAUTION] : [CHARGING_CAUTION] };
}

function judgeReadings(input: CommissioningEvaluateInput, settingsInput: CommissioningSettingsInput): CommissioningEvaluateResult {
  const settings = resolveCommissioningSettings(settingsInput);
  const altitudeFt = input.altitudeFt ?? 0;
  const suctionSatF = round1(saturation(() => dewPointF(input.suctionPsig, input.refrigerant, altitudeFt), 'suctionPsig'));
  const liquidSatF = round1(saturation(() => bubblePointF(input.liquidPsig, input.refrigerant, altitudeFt), 'liquidPsig'));
  const superheatF = round1(input.suctionLineF - suctionSatF);
  const subcoolingF = round1(liquidSatF - input.liquidLineF);
  const base = { superheatF, subcoolingF, suctionSatF, liquidSatF };
  const readings = `superheat ${fmt(superheatF)} °F, subcooling ${fmt(subcoolingF)} °F`;

  if (input.mode === 'heating') {
    return {
      ...base,
      verdict: 'not-evaluated',
      advice: `Heating mode: the charge is judged in cooling mode only, so these readings (${readings}) are recorded but not judged; check the charge in cooling or weigh it in per the installation instructions.`,
      reasons: ['heating mode'],
    };
  }
  if (liquidSatF <= suctionSatF) {
    return {
      ...base,
      verdict: 'not-evaluated',
      advice: `The liquid pressure reads no higher than the suction pressure (saturation ${fmt(liquidSatF)} °F vs ${fmt(suctionSatF)} °F): check the gauge connections and that the compressor is running.`,
      reasons: ['liquid pressure not above suction pressure'],
    };
  }
  return input.meteringType === 'piston' ? evaluateFixedOrifice(input, base, settings.superheatToleranceF, altitudeFt) : evaluateValve(input, base, settings);
}

type Base = Pick<CommissioningEvaluateResult, 'superheatF' | 'subcoolingF' | 'suctionSatF' | 'liquidSatF'>;

function evaluateFixedOrifice(input: CommissioningEvaluateInput, base: Base, toleranceF: number, altitudeFt: number): CommissioningEvaluateResult {
  const { wbF, source } = indoorWetBulb(input, altitudeFt);
  const wb = wbF === undefined ? {} : { indoorWbF: round1(wbF), wetBulbSource: source };
  if (wbF === undefined) {
    return {
      ...base,
      verdict: 'not-evaluated',
      advice: `Superheat is ${fmt(base.superheatF)} °F; enter the indoor wet bulb (or dry bulb and humidity) to get the fixed-orifice target superheat.`,
      reasons: ['indoor wet bulb missing'],
    };
  }
  const check = checkTargetSuperheat(round1(wbF), input.outdoorDbF);
  if (!check.usable) {
    return {
      ...base,
      ...wb,
      ...(check.targetF !== undefined ? { targetSuperheatF: round1(check.targetF) } : {}),
      verdict: 'not-evaluated',
      advice: `Not charged by superheat: ${check.reason}. Weigh in the charge per the nameplate and the line-set length instead.`,
      reasons: [check.reason],
    };
  }
  const targetSuperheatF = round1(check.targetF);
  const diffF = round1(base.superheatF - targetSuperheatF);
  const band = `the ${fmt(targetSuperheatF)} °F target`;
  const tol = `±${fmt(toleranceF)} °F`;
  const common = { ...base, ...wb, targetSuperheatF, toleranceF, marginF: diffF };
  if (Math.abs(diffF) <= toleranceF) {
    return { ...common, verdict: 'on-target', advice: `On target: superheat ${fmt(base.superheatF)} °F is within ${tol} of ${band}; leave the charge as it is.`, reasons: ['superheat within tolerance'] };
  }
  if (base.superheatF < 0) {
    return {
      ...common,
      verdict: 'off-target',
      advice: `Liquid is reaching the suction line: the suction line at ${fmt(input.suctionLineF)} °F is below its ${fmt(base.suctionSatF)} °F saturation. Check indoor airflow (filter, blower, coil) and recover charge if airflow is right.`,
      reasons: ['negative superheat'],
    };
  }
  if (diffF > 0) {
    // High superheat: too little refrigerant reaches the coil — low charge, or a restriction when the liquid line is backed up (high subcooling).
    if (base.subcoolingF > FIXED_ORIFICE_HIGH_SUBCOOLING_F) {
      return {
        ...common,
        verdict: 'off-target',
        advice: `Check for a restriction: superheat ${fmt(base.superheatF)} °F is ${fmt(diffF)} °F above ${band} (tolerance ${tol}) while subcooling is high at ${fmt(base.subcoolingF)} °F (filter drier, the piston, kinked line) before adding charge.`,
        reasons: ['superheat high', 'subcooling high'],
      };
    }
    return {
      ...common,
      verdict: 'off-target',
      advice: `Add charge: superheat ${fmt(base.superheatF)} °F is ${fmt(diffF)} °F above ${band} (tolerance ${tol}); add refrigerant in small amounts, let it settle 10–15 minutes and read again.`,
      reasons: ['superheat high'],
    };
  }
  // Low superheat: too much refrigerant in the coil — overcharge, or too little air across the indoor coil.
  return {
    ...common,
    verdict: 'off-target',
    advice: `Superheat ${fmt(base.superheatF)} °F is ${fmt(-diffF)} °F below ${band} (tolerance ${tol}): first check indoor airflow (filter, blower speed, a dirty coil), then recover charge in small amounts if airflow is right.`,
    reasons: ['superheat low'],
  };
}

function evaluateValve(input: CommissioningEvaluateInput, base: Base, settings: ReturnType<typeof resolveCommissioningSettings>): CommissioningEvaluateResult {
  const targetSubcoolingF = round1(input.targetSubcoolingF ?? settings.defaultTargetSubcoolingF);
  const toleranceF = settings.subcoolingToleranceF;
  const diffF = round1(base.subcoolingF - targetSubcoolingF);
  const band = `the ${fmt(targetSubcoolingF)} °F target${input.targetSubcoolingF === undefined ? " (the shop's default)" : ''}`;
  const tol = `±${fmt(toleranceF)} °F`;
  const common = { ...base, targetSubcoolingF, toleranceF, marginF: diffF };
  const sh = base.superheatF;
  const valveLow = sh < VALVE_SUPERHEAT_MIN_F;
  const valveHigh = sh > VALVE_SUPERHEAT_MAX_F;
  const valveNote = `superheat ${fmt(sh)} °F (a valve normally holds about ${VALVE_SUPERHEAT_MIN_F}–${VALVE_SUPERHEAT_MAX_F} °F)`;

  if (Math.abs(diffF) <= toleranceF) {
    if (valveLow || valveHigh) {
      return {
        ...common,
        verdict: 'off-target',
        advice: `Check the metering device: subcooling ${fmt(base.subcoolingF)} °F is within ${tol} of ${band}, but ${valveNote}${valveLow ? ' — the valve may be overfeeding (check its bulb is strapped tight and insulated)' : ' — the valve may be starving the coil (check for a restriction or a weak valve)'}.`,
        reasons: ['subcooling within tolerance', valveLow ? 'valve superheat low' : 'valve superheat high'],
      };
    }
    return { ...common, verdict: 'on-target', advice: `On target: subcooling ${fmt(base.subcoolingF)} °F is within ${tol} of ${band} and ${valveNote} shows the valve in control; leave the charge as it is.`, reasons: ['subcooling within tolerance'] };
  }
  if (diffF < 0) {
    return {
      ...common,
      verdict: 'off-target',
      advice: `Add charge: subcooling ${fmt(base.subcoolingF)} °F is ${fmt(-diffF)} °F below ${band} (tolerance ${tol})${valveHigh ? `, and high ${valveNote} agrees` : ''}; add refrigerant in small amounts, let it settle 10–15 minutes and read again.`,
      reasons: ['subcooling low', ...(valveHigh ? ['valve superheat high'] : [])],
    };
  }
  if (valveHigh) {
    return {
      ...common,
      verdict: 'off-target',
      advice: `Check for a restriction: subcooling ${fmt(base.subcoolingF)} °F is ${fmt(diffF)} °F above ${band} (tolerance ${tol}) while ${valveNote} — liquid is backing up (filter drier, the valve, a kinked line); do not recover charge until that is ruled out.`,
      reasons: ['subcooling high', 'valve superheat high'],
    };
  }
  return {
    ...common,
    verdict: 'off-target',
    advice: `Recover charge: subcooling ${fmt(base.subcoolingF)} °F is ${fmt(diffF)} °F above ${band} (tolerance ${tol}); check outdoor airflow (a dirty condenser coil also raises it), then recover refrigerant in small amounts and read again.`,
    reasons: ['subcooling high'],
  };
}
