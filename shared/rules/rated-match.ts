import { normalizeModel } from '../schemas/fields';
import type { RatedCombinationSpec } from '../schemas/equipment';
import type { Pairing } from './types';

/**
 * The certified combination matching this pairing's outdoor + indoor (+ air handler) models, by
 * normalized model. The indoor model is the coil's, or the air handler's when there is no coil.
 * A combination that names an air handler matches only that air handler. Returns undefined when
 * no combination matches or models are missing; more specific (air-handler) matches win.
 */
export function findRatedCombination(pairing: Pairing): RatedCombinationSpec | undefined {
  // Two rules, the efficiency figures and the engine's `computed` all ask for the match of the same
  // pairing in a row: remember the last one (pairings are treated as immutable). A WeakMap memo was
  // measured slower: one ephemeron entry per check weighs on the garbage collector.
  if (pairing === last.pairing && pairing.ratedCombinations === last.list && pairing.outdoor === last.outdoor && pairing.indoorCoil === last.coil && pairing.airHandler === last.airHandler) {
    return last.match;
  }
  const found = matchRatedCombination(pairing);
  last.pairing = pairing;
  last.list = pairing.ratedCombinations;
  last.outdoor = pairing.outdoor;
  last.coil = pairing.indoorCoil;
  last.airHandler = pairing.airHandler;
  last.match = found;
  return found;
}

const last: {
  pairing?: Pairing;
  list?: readonly RatedCombinationSpec[];
  outdoor?: Pairing['outdoor'];
  coil?: Pairing['indoorCoil'];
  airHandler?: Pairing['airHandler'];
  match?: RatedCombinationSpec;
} = {};

/** Model keys repeat across checks (catalog models); the regex in normalizeModel is the hot part. */
const modelKeys = new Map<string, string>();
const MODEL_KEY_CACHE_MAX = 20000;
function modelKey(model: string): string {
  let key = modelKeys.get(model);
  if (key === undefined) {
    if (modelKeys.size >= MODEL_KEY_CACHE_MAX) modelKeys.clear();
    key = normalizeModel(model);
    modelKeys.set(model, key);
  }
  return key;
}

/** A compiled model pattern: `*` any run of characters, `?` one character, on the normalised model. */
interface ModelPattern {
  test(key: string): boolean;
  /** Literal characters: more literal characters is a more specific pattern. */
  literal: number;
  exact: boolean;
}

const patterns = new Map<string, ModelPattern>();
const PATTERN_CACHE_MAX = 20000;

/** Compiles a rated-combination model (possibly a family pattern) once, normalised like a model key. */
function modelPattern(model: string): ModelPattern {
  let p = patterns.get(model);
  if (p === undefined) {
    if (patterns.size >= PATTERN_CACHE_MAX) patterns.clear();
    const key = normalizeModel(model);
    if (!/[*?]/.test(key)) {
      p = { test: (k) => k === key, literal: key.length, exact: true };
    } else {
      const re = new RegExp(`^${key.replace(/[.+^${}()|[\]\\]/g, '\\$&').replace(/\*/g, '.*').replace(/\?/g, '.')}$`);
      p = { test: (k) => re.test(k), literal: key.replace(/[*?]/g, '').length, exact: false };
    }
    patterns.set(model, p);
  }
  return p;
}

/** True when a model (or family pattern with `*` and `?`) matches a normalised model key. */
export function modelMatches(patternModel: string, key: string): boolean {
  return modelPattern(patternModel).test(key);
}

function matchRatedCombination(pairing: Pairing): RatedCombinationSpec | undefined {
  const list = pairing.ratedCombinations;
  const outdoorModel = pairing.outdoor.spec.model;
  const indoorModel = pairing.indoorCoil?.spec.model ?? (pairing.indoorCoil ? undefined : pairing.airHandler?.spec.model);
  if (!list || list.length === 0 || !outdoorModel || !indoorModel) return undefined;
  const outdoorKey = modelKey(outdoorModel);
  const indoorKey = modelKey(indoorModel);
  const ahModel = pairing.indoorCoil ? pairing.airHandler?.spec.model : undefined;
  const ahKey = ahModel ? modelKey(ahModel) : undefined;
  // Most specific wins: a row naming the air handler beats a coil-only row; then exact models beat
  // family patterns; then the pattern with more literal characters; ties keep list order.
  let best: RatedCombinationSpec | undefined;
  let bestScore = -1;
  for (const combo of list) {
    const o = modelPattern(combo.outdoorModel);
    if (!o.test(outdoorKey)) continue;
    const i = modelPattern(combo.indoorModel);
    if (!i.test(indoorKey)) continue;
    let score = 0;
    if (combo.airHandlerModel) {
      if (ahKey === undefined) continue;
      const a = modelPattern(combo.airHandlerModel);
      if (!a.test(ahKey)) continue;
      score += 1_000_000 + (a.exact ? 10_000 : 0) + a.literal;
    }
    score += (o.exact ? 100_000 : 0) + (i.exact ? 100_000 : 0) + o.literal + i.literal;
    if (score > bestScore) {
      best = combo;
      bestScore = score;
    }
  }
  return best;
}

/** Words naming the models a rated-combination lookup needs, for a missing-facts note. */
export function ratingModelsMissing(pairing: Pairing): string | undefined {
  if (!pairing.outdoor.spec.model) return 'outdoor unit model number';
  if (pairing.indoorCoil && !pairing.indoorCoil.spec.model) return 'indoor coil model number';
  if (!pairing.indoorCoil && !pairing.airHandler) return 'indoor coil or air handler';
  if (!pairing.indoorCoil && !pairing.airHandler?.spec.model) return 'air handler model number';
  return undefined;
}
