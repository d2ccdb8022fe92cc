/**
 * Access tokens (JWT, HS256 pinned, issuer and audience checked, short-lived, naming
 * their session as `sid`) and opaque random tokens (refresh, e-mail links) that the
 * database keeps only as SHA-256.
 */
import { createHash, createSecretKey, randomBytes } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { config } from '../config';
import type { SignedInUser } from './roles';

export const JWT_ALGORITHM = 'HS256' as const;
export const JWT_ISSUER = 'specbench';
export const JWT_AUDIENCE = 'specbench-app';
/**
 * The HMAC secret as a KeyObject (the same bytes as the string): given a string,
 * jsonwebtoken first tries to read it as a public key on every sign and verify, and that
 * failed attempt costs more than the check itself.
 */
export const JWT_KEY = createSecretKey(Buffer.from(config.jwtSecret, 'utf8'));

/** A token for the account within one session (sign-in); passport.ts refuses it once the session ends. */
export function signAccessToken(user: Pick<SignedInUser, 'id' | 'role'>, sessionId: string): string {
  return jwt.sign({ role: user.role, sid: sessionId }, JWT_KEY, {
    algorithm: JWT_ALGORITHM,
    issuer: JWT_ISSUER,
    audience: JWT_AUDIENCE,
    subject: String(user.id),
    expiresIn: config.ACCESS_TOKEN_TTL_S,
  });
}

export const randomToken = () => randomBytes(32).toString('base64url');
export const sha256Hex = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');
