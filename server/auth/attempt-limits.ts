import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from '../context';
import { AppError } from '../lib/errors';

/** The window failures are counted in. */
const WINDOW_MS = 15 * 60 * 1000;

/**
 * Only failures count (a status of 400 or more): a user who signs in ten times a day is never locked.
 * `req.ip` already honours TANDEM_TRUST_PROXY (app.ts), so a forged X-Forwarded-For moves nothing
 * unless a configured proxy set it; IPv6 clients are keyed by their /56 as express-rate-limit advises.
 */
function failureLimiter(limit: number, key: (req: Request) => string, error: () => AppError): RequestHandler {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: key,
    handler: (_req, _res, next) => next(error()),
    // The header is ignored on purpose unless a proxy is configured: no warning for it.
    validate: { xForwardedForHeader: false },
  });
}

const clientKey = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

const tooManySignIns = () => new AppError('too-many-attempts', 'Too many failed sign-ins. Wait a few minutes and try again.', 429);

/**
 * Sign-in limits: failures per client address (any accounts), and failures per account FROM that
 * address — so someone guessing elsewhere can not lock the real user out of their own phone.
 */
export function signInLimits(ctx: AppContext): RequestHandler[] {
  const limit = ctx.config.signInLimit;
  const emailOf = (req: Request) => String((req.body as { email?: unknown } | undefined)?.email ?? '').trim().toLowerCase();
  return [
    failureLimiter(limit * 3, (req) => `ip:${clientKey(req)}`, tooManySignIns),
    failureLimiter(limit, (req) => `account:${clientKey(req)}:${emailOf(req)}`, tooManySignIns),
  ];
}

/** Wrong current passwords on POST /api/auth/password, per signed-in user (use after requireAuth). */
export function passwordChangeLimit(ctx: AppContext): RequestHandler {
  return failureLimiter(
    ctx.config.signInLimit,
    (req) => `user:${req.user?.id ?? clientKey(req)}`,
    () => new AppError('too-many-attempts', 'Too many wrong passwords. Wait a few minutes and try again.', 429),
  );
}
