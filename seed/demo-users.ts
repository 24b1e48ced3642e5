import bcrypt from 'bcryptjs';
import type { Role } from '../shared/schemas/auth';
import type { AppContext } from '../server/context';
import { User } from '../server/users/user.entity';

/** The demo accounts README lists; only ever created in demo mode. */
export const DEMO_PASSWORD = 'tandem-demo';
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'tech@tandem.test', name: 'Dana Ruiz (demo tech)', role: 'tech' },
  { email: 'estimator@tandem.test', name: 'Sam Okafor (demo estimator)', role: 'estimator' },
  { email: 'admin@tandem.test', name: 'Pat Lindqvist (demo admin)', role: 'admin' },
];

export async function seedDemoUsers(ctx: AppContext): Promise<void> {
  const repo = ctx.dataSource.getRepository(User);
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  await repo.save(DEMO_USERS.map((u) => repo.create({ ...u, passwordHash, active: true })));
}
