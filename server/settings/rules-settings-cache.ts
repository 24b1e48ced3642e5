import type { DataSource, EntityManager } from 'typeorm';
import type { RulesSettingsResponse } from '../../shared/schemas/settings';
import { bumpCatalogVersion, catalogVersions } from '../catalog/catalog-version';
import type { AppContext } from '../context';

// Every check needs the settings: keep them in memory per database, under the settings' version counter
// (a row of catalog_versions). A save on any instance bumps it in its own transaction, so every instance
// reads the new settings on its next request. Its own module so both services import it without a cycle.
const SETTINGS_KIND = 'settings';
const cache = new WeakMap<DataSource, { version: number; pending: Promise<RulesSettingsResponse> }>();

/** The cached settings of this database if still current, else those `read` returns (then cached). */
export async function cachedRulesSettings(ctx: AppContext, read: () => Promise<RulesSettingsResponse>): Promise<RulesSettingsResponse> {
  const version = (await catalogVersions(ctx.dataSource)).get(SETTINGS_KIND) ?? 0;
  const held = cache.get(ctx.dataSource);
  if (held && held.version === version) return held.pending;
  const pending = read();
  cache.set(ctx.dataSource, { version, pending });
  pending.catch(() => cache.get(ctx.dataSource)?.pending === pending && cache.delete(ctx.dataSource));
  return pending;
}

/** Marks the settings changed, inside the saving transaction (rule settings, transition rules, shop settings). */
export function settingsChanged(manager: EntityManager): Promise<void> {
  return bumpCatalogVersion(manager, SETTINGS_KIND);
}

/** Drops the cached rule settings of this database (a read during a failed save may have cached its rows). */
export function forgetRulesSettings(ctx: AppContext): void {
  cache.delete(ctx.dataSource);
}
