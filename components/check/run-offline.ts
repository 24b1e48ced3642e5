import { DEFAULT_CONTEXT, runChecks } from '@/shared/rules/engine';
import type { CheckResult, Pairing, ResolvedPart, RuleContext } from '@/shared/rules/types';
import type { CheckRequest } from '@/shared/schemas/check';
import type { RulesSettingsResponse } from '@/shared/schemas/settings';
import type { PickedPart } from './check-store';
import type { PartSlot } from './part-slots';

/** Today on the device, YYYY-MM-DD (the server uses its own clock when online). */
export function deviceToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** The rule context from the kept settings, or the shared defaults when none were ever fetched. */
export function offlineContext(saved: RulesSettingsResponse | undefined): RuleContext {
  return saved ? { settings: saved.settings, transitionRules: saved.transitionRules } : DEFAULT_CONTEXT;
}

/**
 * Runs the shared engine on the device with the parts the screen holds. Rated combinations can not
 * be looked up offline: undefined makes the rating rules say so.
 */
export function runOffline(request: CheckRequest, picked: Partial<Record<PartSlot, PickedPart>>, context: RuleContext): CheckResult {
  const part = <T>(slot: PartSlot, ref: CheckRequest[PartSlot]): ResolvedPart<T> | undefined => {
    if (!ref) return undefined;
    if ('spec' in ref) return { spec: ref.spec as T, kept: ref.kept ?? false };
    const held = picked[slot];
    if (!held) throw new Error(`The ${slot} picked from the catalog is not on this device.`);
    return { spec: held.spec as T, kept: ref.kept ?? false, id: ref.id };
  };
  const pairing: Pairing = {
    scope: request.scope,
    installDate: request.installDate ?? deviceToday(),
    site: request.site,
    outdoor: part('outdoor', request.outdoor)!,
    indoorCoil: part('indoorCoil', request.indoorCoil),
    airHandler: part('airHandler', request.airHandler),
    metering: part('metering', request.metering),
    controls: request.controls,
    lineSet: request.lineSet,
    electrical: request.electrical,
    indoorElectrical: request.indoorElectrical,
    ratedCombinations: undefined,
  };
  return runChecks(pairing, context);
}
