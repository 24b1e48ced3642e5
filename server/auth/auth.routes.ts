import { Router } from 'express';
import { PasswordChangeSchema, SignInSchema } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { passwordChangeLimit, signInLimits } from './attempt-limits';
import { parseBody } from '../lib/validate';
import { changeOwnPassword, signIn } from './auth.service';
import { currentUser, requireAuth } from './auth.middleware';

export function authRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/sign-in', ...signInLimits(ctx), async (req, res) => {
    res.json(await signIn(ctx, parseBody(SignInSchema, req.body)));
  });

  router.get('/me', requireAuth(ctx), (req, res) => {
    res.json({ user: currentUser(req) });
  });

  router.post('/password', requireAuth(ctx), passwordChangeLimit(ctx), async (req, res) => {
    const body = parseBody(PasswordChangeSchema, req.body);
    res.json({ user: await changeOwnPassword(ctx, currentUser(req).id, body.currentPassword, body.newPassword) });
  });
  return router;
}
