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

/** Verifies signature, algorithm (HS256 only: `alg: none` and others are refused) and expiry. */
export function verifyToken(secret: string, token: string): TokenClaims {
  try {
    const payload = jwt.verify(token, secret, { algorithms: ['HS256'] });
    const claims = ClaimsSchema.parse(payload);
    return { userId: Number(claims.sub), role: claims.role };
  } catch {
    throw unauthorized('Your session is not valid or has expired. Sign in again.');
  }
}
