import { bubblePointF, dewPointF, saturationRange } from '../shared/refrigerants';
import { REFRIGERANT_IDS } from '../shared/schemas/fields';
import { round, type Measure } from './measure';

/**
 * Dew- plus bubble-point solves per second (pressure → temperature, the Readings screen's work on every
 * keystroke) over random gauge pressures inside each refrigerant's range, all refrigerants, one core.
 * The curves are built first (once per refrigerant, as on first use in the app); target > 200,000/s.
 */
const PRESSURES_PER_REFRIGERANT = 20_000;
const ROUNDS = 5;

/** A small seeded generator so every run solves the same pressures. */
function mulberry32(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export async function run(): Promise<Measure[]> {
  const random = mulberry32(9);
  const buildStarted = performance.now();
  const work = REFRIGERANT_IDS.map((refrigerant) => {
    const range = saturationRange(refrigerant);
    // Inside both lines' ranges so every pressure has a bubble and a dew point.
    const low = Math.max(range.minBubblePsig, range.minDewPsig);
    const high = Math.min(range.maxBubblePsig, range.maxDewPsig);
    return { refrigerant, pressures: Float64Array.from({ length: PRESSURES_PER_REFRIGERANT }, () => low + random() * (high - low)) };
  });
  const buildMs = performance.now() - buildStarted;

  let sink = 0;
  let best = 0;
  for (let r = 0; r < ROUNDS; r++) {
    const started = performance.now();
    let solves = 0;
    for (const { refrigerant, pressures } of work) {
      for (let i = 0; i < pressures.length; i++) {
        sink += dewPointF(pressures[i], refrigerant) + bubblePointF(pressures[i], refrigerant);
        solves += 2;
      }
    }
    const perSecond = solves / ((performance.now() - started) / 1000);
    best = Math.max(best, perSecond);
  }
  if (!Number.isFinite(sink)) throw new Error('saturation bench produced a non-finite temperature');
  return [
    {
      id: 'refrigerants.saturation-build-ms',
      value: round(buildMs, 1),
      unit: 'ms',
      note: `first use: sampling every refrigerant's bubble and dew curves from its model (R-454B by Peng–Robinson flash), one core`,
    },
    {
      id: 'refrigerants.saturation-per-s',
      value: Math.round(best),
      unit: 'solves/s',
      note: `dew + bubble point from random psig, ${REFRIGERANT_IDS.length} refrigerants × ${PRESSURES_PER_REFRIGERANT.toLocaleString('en-US')} pressures, best of ${ROUNDS} rounds, one core; curves built in ${round(buildMs, 1)} ms; target > 200,000`,
    },
  ];
}
