import { DEFAULT_SHOP_SETTINGS } from '../../shared/estimates/shop-defaults';
import type { ShopSettings, ShopSettingsResponse } from '../../shared/schemas/options';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { forgetRulesSettings, settingsChanged } from '../settings/rules-settings-cache';
import { ShopSettingsRow } from './shop-settings.entity';

const ROW_ID = 1;

/** GET /api/settings/shop: the saved settings (each missing field from the defaults) and the defaults. */
export async function getShopSettings(ctx: AppContext): Promise<ShopSettingsResponse> {
  const row = await ctx.dataSource.getRepository(ShopSettingsRow).findOneBy({ id: ROW_ID });
  return { settings: { ...DEFAULT_SHOP_SETTINGS, ...row?.settings }, defaults: DEFAULT_SHOP_SETTINGS, updatedAt: row?.updatedAt ?? null };
}

/** PUT /api/settings/shop (admin): replaces the settings, the rebate tiers that checks use among them. */
export async function saveShopSettings(ctx: AppContext, settings: ShopSettings, userId: number): Promise<ShopSettingsResponse> {
  // The rebate tiers are also what checks run with: drop the cached rule settings (even on failure, as they do).
  await withWriteLock(ctx, async (manager) => {
    await manager.getRepository(ShopSettingsRow).save({ id: ROW_ID, settings, updatedAt: new Date().toISOString(), updatedBy: userId });
    await settingsChanged(manager);
  }).finally(() => forgetRulesSettings(ctx));
  return getShopSettings(ctx);
}
