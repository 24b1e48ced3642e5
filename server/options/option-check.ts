import { runChecks } from '../../shared/rules/engine';
import type { CheckResult, Pairing } from '../../shared/rules/types';
import type { CheckRequest } from '../../shared/schemas/check';
import type { OptionInput } from '../../shared/schemas/options';
import { resolvePairing } from '../checks/checks.service';
import type { AppContext } from '../context';
import { loadRuleContext } from '../settings/settings.service';

/** The check body of an option: its parts and facts with the job's state; any kept part makes it a component replacement. */
export function optionCheckRequest(content: Omit<OptionInput, 'lines'>, state: string): CheckRequest {
  const kept = [content.indoorCoil, content.airHandler, content.metering].some((p) => p?.kept);
  return {
    scope: kept ? 'component-replacement' : 'new-system',
    site: { ...content.site, state },
    outdoor: content.outdoor,
    indoorCoil: content.indoorCoil,
    airHandler: content.airHandler,
    metering: content.metering,
    lineSet: content.lineSet,
    electrical: content.electrical,
    controls: content.controls,
  };
}

/** Resolves an option's parts and runs the shared engine on them, as the Check screen would. */
export async function checkOption(
  ctx: AppContext,
  content: Omit<OptionInput, 'lines'>,
  state: string,
): Promise<{ pairing: Pairing; check: CheckResult }> {
  const [pairing, ruleContext] = await Promise.all([resolvePairing(ctx, optionCheckRequest(content, state)), loadRuleContext(ctx)]);
  return { pairing, check: runChecks(pairing, ruleContext) };
}
