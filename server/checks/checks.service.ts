import { runChecks } from '../../shared/rules/engine';
import type { CheckResult, Pairing } from '../../shared/rules/types';
import type { CheckRequest } from '../../shared/schemas/check';
import type { AppContext } from '../context';
import { findRatedCombinations } from '../catalog/catalog-specs';
import { loadRuleContext } from '../settings/settings.service';
import { resolvePart } from './resolve-parts';

let todayCached = { date: '', fromMs: 0, untilMs: 0 };

/** Today's date (server clock, UTC) as YYYY-MM-DD, the install date when the request gives none. */
export function today(now?: Date): string {
  if (now) return now.toISOString().slice(0, 10);
  // Every check asks: work the string out once per UTC day rather than formatting a Date each time.
  const ms = Date.now();
  if (ms >= todayCached.untilMs || ms < todayCached.fromMs) {
    const date = new Date(ms).toISOString().slice(0, 10);
    const fromMs = Date.parse(`${date}T00:00:00.000Z`);
    todayCached = { date, fromMs, untilMs: fromMs + 86_400_000 };
  }
  return todayCached.date;
}

/** Resolves every part of a validated check request into the pairing the engine takes. */
export async function resolvePairing(ctx: AppContext, body: CheckRequest, installDate = today()): Promise<Pairing> {
  const [outdoor, indoorCoil, airHandler, metering] = await Promise.all([
    resolvePart(ctx, 'outdoor-units', 'outdoor', body.outdoor),
    resolvePart(ctx, 'indoor-coils', 'indoorCoil', body.indoorCoil),
    resolvePart(ctx, 'air-handlers', 'airHandler', body.airHandler),
    resolvePart(ctx, 'metering-devices', 'metering', body.metering),
  ]);
  const model = outdoor!.spec.model;
  return {
    scope: body.scope,
    installDate: body.installDate ?? installDate,
    site: body.site,
    outdoor: outdoor!,
    indoorCoil,
    airHandler,
    metering,
    controls: body.controls,
    lineSet: body.lineSet,
    electrical: body.electrical,
    indoorElectrical: body.indoorElectrical,
    // A typed outdoor unit with no model can not be looked up: undefined makes the rating rules say so.
    ratedCombinations: model ? await findRatedCombinations(ctx, model) : undefined,
  };
}

/** POST /api/checks: resolve, load the shop's settings, run the shared engine. */
export async function runCheck(ctx: AppContext, body: CheckRequest): Promise<CheckResult> {
  const [pairing, context] = await Promise.all([resolvePairing(ctx, body), loadRuleContext(ctx)]);
  const { verdict, rulesVersion, findings, coverage, computed } = runChecks(pairing, context);
  return { verdict, rulesVersion, findings, coverage, computed };
}
