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
  list?: RatedCombinationSpec[];
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

function matchRatedCombination(pairing: Pairing): RatedCombinationSpec | undefined {
  const list = pairing.ratedCombinations;
  const outdoorModel = pairing.outdoor.spec.model;
  const indoorModel = pairing.indoorCoil?.spec.model ?? (pairing.indoorCoil ? undefined : pairing.airHandler?.spec.model);
  if (!list || list.length === 0 || !outdoorModel || !indoorModel) return undefined;
  const outdoorKey = modelKey(outdoorModel);
  const indoorKey = modelKey(indoorModel);
  const ahModel = pairing.indoorCoil ? pairing.airHandler?.spec.model : undefined;
  const ahKey = ahModel ? modelKey(ahModel) : undefined;
  let general: RatedCombinationSpec | undefined;
  for (const combo of list) {
    if (modelKey(combo.outdoorModel) !== outdoorKey || modelKey(combo.indoorModel) !== indoorKey) continue;
    if (combo.airHandlerModel) {
      if (ahKey !== undefined && modelKey(combo.airHandlerModel) === ahKey) return combo;
    } else if (!general) {
      general = combo;
    }
  }
  return general;
}

/** Words naming the models a rated-combination lookup needs, for a missing-facts note. */
export function ratingModelsMissing(pairing: Pairing): string | undefined {
  if (!pairing.outdoor.spec.model) return 'outdoor unit model number';
  if (pairing.indoorCoil && !pairing.indoorCoil.spec.model) return 'indoor coil model number';
  if (!pairing.indoorCoil && !pairing.airHandler) return 'indoor coil or air handler';
  if (!pairing.indoorCoil && !pairing.airHandler?.spec.model) return 'air handler model number';
  return undefined;
}
