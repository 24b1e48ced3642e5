import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { PasswordChangeSchema, SignInSchema } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';
import { parseBody } from '../lib/validate';
import { changeOwnPassword, signIn } from './auth.service';
import { currentUser, requireAuth } from './auth.middleware';

const WINDOW_MS = 15 * 60 * 1000;

function tooMany() {
  return new AppError('too-many-attempts', 'Too many sign-in attempts. Wait a few minutes and try again.', 429);
}

export function authRouter(ctx: AppContext): Router {
  const router = Router();
  // Two limiters: one per client address, one per e-mail tried (guessing one account from many addresses).
  const perIp = rateLimit({
    windowMs: WINDOW_MS,
    limit: ctx.config.signInLimit * 3,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(tooMany()),
  });
  const perEmail = rateLimit({
    windowMs: WINDOW_MS,
    limit: ctx.config.signInLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `email:${String(req.body?.email ?? '').trim().toLowerCase()}`,
    handler: (_req, _res, next) => next(tooMany()),
  });

  router.post('/sign-in', perIp, perEmail, async (req, res) => {
    res.json(await signIn(ctx, parseBody(SignInSchema, req.body)));
  });

  router.get('/me', requireAuth(ctx), (req, res) => {
    res.json({ user: currentUser(req) });
  });

  router.post('/password', requireAuth(ctx), async (req, res) => {
    const body = parseBody(PasswordChangeSchema, req.body);
    res.json({ user: await changeOwnPassword(ctx, currentUser(req).id, body.currentPassword, body.newPassword) });
  });
  return router;
}
