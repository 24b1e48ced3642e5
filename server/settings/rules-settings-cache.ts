import type { DataSource } from 'typeorm';
import type { RulesSettingsResponse } from '../../shared/schemas/settings';
import type { AppContext } from '../context';

// Every check needs the settings: keep them in memory per database, dropped when an admin saves the rules or
// the shop settings (whose rebate tiers checks use). Its own module so both services import it without a cycle.
export const rulesSettingsCache = new WeakMap<DataSource, Promise<RulesSettingsResponse>>();

/** Drops the cached rule settings of this database. */
export function forgetRulesSettings(ctx: AppContext): void {
  rulesSettingsCache.delete(ctx.dataSource);
}
