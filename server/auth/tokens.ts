import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { z } from 'zod';
import { ROLES, type Role } from '../../shared/schemas/auth';
import { unauthorized } from '../lib/errors';

/** Session tokens: JWT HS256 with `sub` and `role`, 12 hours. The server keeps no session state. */
export const TOKEN_LIFETIME = '12h';

// `exp` is required: jsonwebtoken accepts a token without one as valid forever.
const ClaimsSchema = z.object({ sub: z.string().regex(/^[1-9][0-9]{0,15}$/), role: z.enum(ROLES), exp: z.number().int().positive() });
export interface TokenClaims {
  userId: number;
  role: Role;
}

export function signToken(secret: string, claims: TokenClaims): string {
  return jwt.sign({ role: claims.role }, secret, {
    algorithm: 'HS256',
    subject: String(claims.userId),
    expiresIn: TOKEN_LIFETIME,
  });
}

// jsonwebtoken first tries to read a string secret as a public key (and throws) on every verify;
// a ready KeyObject skips that: about 0.5 ms per request.
const keys = new Map<string, KeyObject>();
function keyFor(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    key = createSecretKey(Buffer.from(secret, 'utf8'));
    keys.set(secret, key);
  }
  return key;
}

/**
 * Tokens already verified, with their expiry: a phone sends the same token on every request, and
 * a token can not change, so re-checking its signature each time is wasted work. Bounded; the
 * expiry is still checked on every use.
 */
const verified = new Map<string, { claims: TokenClaims; expiresAtMs: number }>();
const VERIFIED_MAX = 5000;

/** Verifies signature, algorithm (HS256 only: `alg: none` and others are refused) and expiry (required). */
export function verifyToken(secret: string, token: string): TokenClaims {
  const cacheKey = `${secret}\n${token}`;
  const known = verified.get(cacheKey);
  if (known && known.expiresAtMs > Date.now()) return known.claims;
  try {
    const payload = jwt.verify(token, keyFor(secret), { algorithms: ['HS256'] }) as jwt.JwtPayload;
    const parsed = ClaimsSchema.parse(payload);
    const claims = { userId: Number(parsed.sub), role: parsed.role };
    if (verified.size >= VERIFIED_MAX) verified.clear();
    verified.set(cacheKey, { claims, expiresAtMs: parsed.exp * 1000 });
    return claims;
  } catch {
    verified.delete(cacheKey);
    throw unauthorized('Your session is not valid or has expired. Sign in again.');
  }
}
