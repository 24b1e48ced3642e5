import bcrypt from 'bcryptjs';
import type { PublicUser, UserCreate, UserPatch } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { conflict, notFound } from '../lib/errors';
import { User } from './user.entity';

export function toPublicUser(user: User): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, active: user.active };
}

export async function listUsers(ctx: AppContext): Promise<PublicUser[]> {
  const users = await ctx.dataSource.getRepository(User).find({ order: { name: 'ASC' } });
  return users.map(toPublicUser);
}

export async function createUser(ctx: AppContext, input: UserCreate): Promise<PublicUser> {
  const repo = ctx.dataSource.getRepository(User);
  if (await repo.existsBy({ email: input.email })) throw conflict('A user with this e-mail already exists.');
  const user = repo.create({
    email: input.email,
    name: input.name,
    role: input.role,
    active: true,
    passwordHash: await bcrypt.hash(input.password, 10),
  });
  return toPublicUser(await repo.save(user));
}

/** Updates a user in one transaction, refusing to leave the shop without an active admin. */
export async function updateUser(ctx: AppContext, id: number, patch: UserPatch): Promise<PublicUser> {
  return ctx.dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(User);
    const user = await repo.findOneBy({ id });
    if (!user) throw notFound('User');
    const losesAdmin = user.role === 'admin' && user.active && ((patch.role && patch.role !== 'admin') || patch.active === false);
    if (losesAdmin) {
      const activeAdmins = await repo.countBy({ role: 'admin', active: true });
      if (activeAdmins <= 1) throw conflict('This is the last active admin: make another admin first.');
    }
    if (patch.name !== undefined) user.name = patch.name;
    if (patch.role !== undefined) user.role = patch.role;
    if (patch.active !== undefined) user.active = patch.active;
    if (patch.password !== undefined) user.passwordHash = await bcrypt.hash(patch.password, 10);
    return toPublicUser(await repo.save(user));
  });
}
