import { bubblePointF, bubblePressurePsig, dewPointF, dewPressurePsig, SaturationRangeError } from '@/shared/refrigerants';
import { asSentence, readNumber } from './number-text';

export interface LookupAnswer {
  bubble?: number;
  dew?: number;
  error?: string;
}

function solve(text: string, bubble: (v: number) => number, dew: (v: number) => number): LookupAnswer {
  const read = readNumber(text);
  if (read.error) return { error: read.error };
  if (read.value === undefined) return {};
  const v = read.value;
  try {
    return { bubble: bubble(v), dew: dew(v) };
  } catch (err) {
    if (err instanceof SaturationRangeError) return { error: asSentence(err.message) };
    throw err;
  }
}

/** Bubble and dew points (°F) at a typed gauge pressure. */
export function lookupByPressure(psigText: string, refrigerant: string, altitudeFt: number): LookupAnswer {
  return solve(
    psigText,
    (p) => bubblePointF(p, refrigerant, altitudeFt),
    (p) => dewPointF(p, refrigerant, altitudeFt),
  );
}

/** Bubble and dew pressures (psig) at a typed temperature in °F. */
export function lookupByTemperature(tempText: string, refrigerant: string, altitudeFt: number): LookupAnswer {
  return solve(
    tempText,
    (t) => bubblePressurePsig(t, refrigerant, altitudeFt),
    (t) => dewPressurePsig(t, refrigerant, altitudeFt),
  );
}
