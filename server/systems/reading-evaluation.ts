import { evaluateEvacuation, evaluatePressureTest, evaluateReadings, ReadingInputError } from '../../shared/commissioning/index';
import type { RuleSettings } from '../../shared/rules/types';
import type { ReadingCreate } from '../../shared/schemas/systems';
import { AppError } from '../lib/errors';
import type { ReadingResults, ResolvedParts } from './system-types';

/**
 * The one place readings meet the shared commissioning computations: superheat and subcooling with
 * their targets (the outdoor unit's target subcooling when the tech gives none), and the evacuation
 * and nitrogen-test verdicts against the shop's settings.
 */
export function evaluateReading(body: ReadingCreate, settings: RuleSettings, parts: ResolvedParts): ReadingResults {
  const results: ReadingResults = {};
  if (body.charge) {
    const targetSubcoolingF = body.charge.targetSubcoolingF ?? parts.outdoor.spec.targetSubcoolingF;
    try {
      results.charge = evaluateReadings({ ...body.charge, ...(targetSubcoolingF !== undefined ? { targetSubcoolingF } : {}) }, settings);
    } catch (err) {
      if (!(err instanceof ReadingInputError)) throw err;
      throw new AppError('validation-failed', 'The request did not pass validation.', 422, [
        { path: `charge.${err.field}`, message: err.message },
      ]);
    }
  }
  if (body.evacuation) {
    const v = evaluateEvacuation(body.evacuation, settings);
    results.evacuation = { passed: v.pass ?? null, message: v.reason };
  }
  if (body.pressureTest) {
    const { pressurePsig, ...rest } = body.pressureTest;
    const v = evaluatePressureTest({ testPsig: pressurePsig, ...rest }, settings);
    results.pressureTest = { passed: v.pass ?? null, message: v.reason };
  }
  return results;
}
