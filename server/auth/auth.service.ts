import bcrypt from 'bcryptjs';
import type { PublicUser, SignIn, SignInResponse } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { AppError, unauthorized } from '../lib/errors';
import { User } from '../users/user.entity';
import { toPublicUser } from '../users/users.service';
import { signToken } from './tokens';

const BAD_CREDENTIALS = 'E-mail or password is not right.';
/** Compared against when the e-mail is unknown, so both failures take the same time. */
const DUMMY_HASH = bcrypt.hashSync('tandem-no-such-user', 10);

export async function signIn(ctx: AppContext, input: SignIn): Promise<SignInResponse> {
  const user = await ctx.dataSource.getRepository(User).findOneBy({ email: input.email });
  const ok = await bcrypt.compare(input.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) throw unauthorized(BAD_CREDENTIALS);
  if (!user.active) throw new AppError('account-inactive', 'This account has been deactivated. Ask your office.', 401);
  return { token: signToken(ctx.config.jwtSecret, { userId: user.id, role: user.role }), user: toPublicUser(user) };
}

export async function changeOwnPassword(ctx: AppContext, userId: number, current: string, next: string): Promise<PublicUser> {
  const user = await ctx.dataSource.getRepository(User).findOneByOrFail({ id: userId });
  if (!(await bcrypt.compare(current, user.passwordHash))) {
    throw new AppError('wrong-password', 'The current password is not right.', 422, [{ path: 'currentPassword', message: 'Not right.' }]);
  }
  const passwordHash = await bcrypt.hash(next, 10);
  return withWriteLock(ctx, async (manager) => {
    await manager.getRepository(User).update({ id: userId }, { passwordHash });
    return toPublicUser(await manager.getRepository(User).findOneByOrFail({ id: userId }));
  });
}
