import type { AppContext } from '../server/context';
import { User } from '../server/users/user.entity';
import { seedDemoCatalog } from './demo-catalog';
import { seedDemoUsers } from './demo-users';
import { seedDemoJobs } from './demo-jobs';
import { seedDemoOptions } from './demo-options';
import { seedDemoShopSettings } from './demo-shop-settings';

/** Demo seeders in order; each module that has demo data adds its step here. */
const steps: { name: string; run: (ctx: AppContext) => Promise<void> }[] = [{ name: 'users', run: seedDemoUsers }, { name: 'catalog', run: seedDemoCatalog }, { name: 'shop settings', run: seedDemoShopSettings }, { name: 'jobs', run: seedDemoJobs }, { name: 'options', run: seedDemoOptions }];

/** Seeds the demo scenario into an empty database (no users yet); returns whether it did. */
export async function seedDemoIfEmpty(ctx: AppContext): Promise<boolean> {
  if ((await ctx.dataSource.getRepository(User).count()) > 0) return false;
  for (const step of steps) {
    ctx.logger.info({ step: step.name }, 'seeding demo data');
    await step.run(ctx);
  }
  return true;
}
