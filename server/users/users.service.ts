import bcrypt from 'bcryptjs';
import type { PublicUser, UserCreate, UserPatch } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { withWriteLock } from '../db/write-transaction';
import { AppError, conflict, notFound } from '../lib/errors';
import { User } from './user.entity';

export function toPublicUser(user: User): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, active: user.active };
}

export async function listUsers(ctx: AppContext): Promise<PublicUser[]> {
  const users = await ctx.dataSource.getRepository(User).find({ order: { name: 'ASC' } });
  return users.map(toPublicUser);
}

const emailTaken = () => new AppError('email-taken', 'A user with this e-mail already exists.', 409, { field: 'email' });

/** Adds a user; the e-mail check and the insert hold the write lock together, so twins can not both pass. */
export async function createUser(ctx: AppContext, input: UserCreate): Promise<PublicUser> {
  // Hash before taking the lock: bcrypt is the slow part and needs no database.
  const passwordHash = await bcrypt.hash(input.password, 10);
  return withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(User);
    if (await repo.existsBy({ email: input.email })) throw emailTaken();
    const user = repo.create({ email: input.email, name: input.name, role: input.role, active: true, passwordHash });
    return toPublicUser(await repo.save(user));
  });
}

/**
 * Updates a user under the write lock, refusing to leave the shop without an active admin and
 * refusing an admin's change to their own role or active flag (Issue 7: no self-lockout).
 */
export async function updateUser(ctx: AppContext, actorId: number, id: number, patch: UserPatch): Promise<PublicUser> {
  const passwordHash = patch.password !== undefined ? await bcrypt.hash(patch.password, 10) : undefined;
  return withWriteLock(ctx, async (manager) => {
    const repo = manager.getRepository(User);
    const user = await repo.findOneBy({ id });
    if (!user) throw notFound('User');
    const changesRole = patch.role !== undefined && patch.role !== user.role;
    const changesActive = patch.active !== undefined && patch.active !== user.active;
    if (id === actorId && (changesRole || changesActive)) {
      throw conflict('You can not change your own role or deactivate yourself. Ask another admin.', {
        field: changesRole ? 'role' : 'active',
      });
    }
    const losesAdmin = user.role === 'admin' && user.active && ((changesRole && patch.role !== 'admin') || patch.active === false);
    if (losesAdmin && (await repo.countBy({ role: 'admin', active: true })) <= 1) {
      throw conflict('This is the last active admin: make another admin first.');
    }
    if (patch.name !== undefined) user.name = patch.name;
    if (patch.role !== undefined) user.role = patch.role;
    if (patch.active !== undefined) user.active = patch.active;
    if (passwordHash !== undefined) user.passwordHash = passwordHash;
    return toPublicUser(await repo.save(user));
  });
}
