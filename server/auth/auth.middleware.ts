import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/schemas/auth';
import type { AppContext } from '../context';
import { forbidden, unauthorized } from '../lib/errors';
import { StampedCache } from '../db/change-watch';
import { dialectOf, type UserRow } from '../db/dialect';
import { verifyToken } from './tokens';

export interface AuthUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: AuthUser;
  }
}

/**
 * Checks the bearer token and loads the user: a deactivated or deleted user is refused even with a
 * valid token, and a role change takes effect at once (the role comes from the database, through a
 * cache that every write to the users table, on any instance, invalidates).
 */
export function requireAuth(ctx: AppContext): RequestHandler {
  const findUser = userLookup(ctx);
  return async (req, _res, next) => {
    const header = req.headers.authorization ?? '';
    const match = /^Bearer\s+(\S+)$/i.exec(header);
    if (!match) throw unauthorized();
    const claims = verifyToken(ctx.config.jwtSecret, match[1]);
    const user = await findUser(claims.userId);
    if (!user || !user.active) throw unauthorized('This account is not active. Ask your office.');
    req.user = { id: user.id, email: user.email, name: user.name, role: user.role as Role };
    next();
  };
}

/**
 * The user behind a token through the database's fast path (no query builder), kept in memory until
 * the users table may have changed: a write in this process, another process's commit on the SQLite
 * file, or a NOTIFY from another instance on PostgreSQL (server/db/change-watch.ts).
 */
function userLookup(ctx: AppContext) {
  const dialect = dialectOf(ctx.dataSource);
  let cache = userCaches.get(ctx.dataSource);
  if (!cache) userCaches.set(ctx.dataSource, (cache = new StampedCache(ctx.dataSource)));
  const users = cache;
  return (id: number) => users.get(id, () => dialect.userById(ctx.dataSource, id));
}

// One per data source, shared by every router's requireAuth.
const userCaches = new WeakMap<DataSource, StampedCache<number, UserRow | null>>();

/** Allows only the listed roles (use after requireAuth). */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthorized();
    if (!roles.includes(req.user.role)) throw forbidden(`This needs the ${roles.join(' or ')} role.`);
    next();
  };
}

/** The signed-in user; routes behind requireAuth call this instead of asserting. */
export function currentUser(req: { user?: AuthUser }): AuthUser {
  if (!req.user) throw unauthorized();
  return req.user;
}
