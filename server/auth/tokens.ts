import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { z } from 'zod';
import { ROLES, type Role } from '../../shared/schemas/auth';
import { unauthorized } from '../lib/errors';

/** Session tokens: JWT HS256 with `sub` and `role`, 12 hours. The server keeps no session state. */
export const TOKEN_LIFETIME = '12h';

const ClaimsSchema = z.object({ sub: z.string().regex(/^\d+$/), role: z.enum(ROLES) });
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

/** Verifies signature, algorithm (HS256 only: `alg: none` and others are refused) and expiry. */
export function verifyToken(secret: string, token: string): TokenClaims {
  try {
    const payload = jwt.verify(token, keyFor(secret), { algorithms: ['HS256'] });
    const claims = ClaimsSchema.parse(payload);
    return { userId: Number(claims.sub), role: claims.role };
  } catch {
    throw unauthorized('Your session is not valid or has expired. Sign in again.');
  }
}
