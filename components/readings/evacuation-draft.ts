import type { RuleSettings } from '@/shared/rules/types';
import { evaluateEvacuation, evaluatePressureTest, type TestVerdict } from '@/shared/commissioning';
import { readNumber } from './number-text';

/** Evacuation and nitrogen test fields as typed (the Jobs record stores them later). */
export interface EvacuationDraft {
  values: Partial<Record<EvacuationKey, string>>;
}

export const EVACUATION_KEYS = [
  'finalMicrons',
  'decayMicrons',
  'decayHoldMinutes',
  'testPsig',
  'maxTestPsig',
  'nitrogenHoldMinutes',
  'dropPsig',
] as const;
export type EvacuationKey = (typeof EVACUATION_KEYS)[number];

export interface EvacuationOutcome {
  /** Undefined until its first field is typed. */
  evacuation?: TestVerdict;
  pressureTest?: TestVerdict;
  errors: Partial<Record<EvacuationKey, string>>;
}

export function initialEvacuationDraft(): EvacuationDraft {
  return { values: {} };
}

/** Pass/fail of the evacuation and the nitrogen test from what is typed, with the shop's limits. */
export function evacuationOutcome(draft: EvacuationDraft, settings: RuleSettings, altitudeFt = 0): EvacuationOutcome {
  const errors: EvacuationOutcome['errors'] = {};
  const n: Partial<Record<EvacuationKey, number>> = {};
  for (const key of EVACUATION_KEYS) {
    const read = readNumber(draft.values[key]);
    if (read.error) errors[key] = read.error;
    else if (read.value !== undefined && read.value < 0) errors[key] = 'Can not be below zero.';
    else if (read.value !== undefined) n[key] = read.value;
  }
  const outcome: EvacuationOutcome = { errors };
  if (n.finalMicrons !== undefined && !errors.decayMicrons && !errors.decayHoldMinutes) {
    outcome.evacuation = evaluateEvacuation(
      { finalMicrons: n.finalMicrons, decayMicrons: n.decayMicrons, holdMinutes: n.decayHoldMinutes },
      settings,
    );
  }
  if (n.testPsig !== undefined && !errors.maxTestPsig && !errors.nitrogenHoldMinutes && !errors.dropPsig) {
    outcome.pressureTest = evaluatePressureTest(
      {
        testPsig: n.testPsig,
        holdMinutes: n.nitrogenHoldMinutes ?? Number.NaN,
        dropPsig: n.dropPsig,
        maxTestPsig: n.maxTestPsig,
        altitudeFt,
      },
      settings,
    );
  }
  return outcome;
}
