import { evaluateReadings } from '../../shared/commissioning';
import type { CommissioningEvaluateInput, CommissioningEvaluateResult } from '../../shared/schemas/commissioning';
import type { AppContext } from '../context';
import { getRulesSettings } from '../settings/settings.service';
import { withRangeCheck } from './range-errors';

/** Superheat, subcooling, their targets and the verdict, with the shop's tolerances. */
export async function evaluateCommissioning(ctx: AppContext, input: CommissioningEvaluateInput): Promise<CommissioningEvaluateResult> {
  const { settings } = await getRulesSettings(ctx);
  return withRangeCheck(() => evaluateReadings(input, settings));
}
