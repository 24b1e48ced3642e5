import type { AppContext } from '../server/context';
import { DEFAULT_SHOP_SETTINGS } from '../shared/estimates/shop-defaults';
import { saveShopSettings } from '../server/options/shop-settings.service';
import { User } from '../server/users/user.entity';

/**
 * The demo shop's rebate programs, so the demo shows a tier met and one missed. Both are invented;
 * a real shop enters its own programs' figures on Admin → Pricing (the defaults have none).
 */
export async function seedDemoShopSettings(ctx: AppContext): Promise<void> {
  const admin = await ctx.dataSource.getRepository(User).findOneByOrFail({ role: 'admin' });
  const note = "Invented demo tier; replace with your program's figures.";
  await saveShopSettings(
    ctx,
    {
      ...DEFAULT_SHOP_SETTINGS,
      rebateTiers: [
        { name: 'Demo utility tier 1 (invented)', seer2: 15.2, eer2: 11, note },
        { name: 'Demo utility tier 2 (invented)', seer2: 17, hspf2: 8.5, note },
      ],
    },
    admin.id,
  );
}
