import { Router } from 'express';
import { UserCreateSchema, UserPatchSchema } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { currentUser, requireAuth, requireRole } from '../auth/auth.middleware';
import { IdParamSchema, parseBody, parseParams } from '../lib/validate';
import { createUser, listUsers, updateUser } from './users.service';

export function usersRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireAuth(ctx), requireRole('admin'));
  router.get('/', async (_req, res) => {
    res.json({ items: await listUsers(ctx) });
  });
  router.post('/', async (req, res) => {
    res.status(201).json({ user: await createUser(ctx, parseBody(UserCreateSchema, req.body)) });
  });
  router.patch('/:id', async (req, res) => {
    const { id } = parseParams(IdParamSchema, req.params);
    res.json({ user: await updateUser(ctx, currentUser(req).id, id, parseBody(UserPatchSchema, req.body)) });
  });
  return router;
}
