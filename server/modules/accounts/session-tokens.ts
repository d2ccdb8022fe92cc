/**
 * Sessions and their refresh tokens. One sign-in is one session: a family of refresh
 * tokens (family_id is the session id, `sid` in every access token), each replaced by its
 * successor on refresh. The session ends when any of its tokens is revoked (sign-out,
 * sign-out everywhere, password change or reset, a replayed token) or when its absolute
 * lifetime runs out: every successor inherits the first token's expiry, so rotation never
 * extends a session past REFRESH_TOKEN_TTL_DAYS from sign-in.
 */
import { createHmac, randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';
import { randomToken, sha256Hex } from '@/server/auth/tokens';
import { RefreshTokenRepository } from './token.repository';

/** A refresh token handed to the client, with the session it belongs to. */
export type IssuedToken = { token: string; sessionId: string; expiresAt: Date };

/** How long a just-replaced refresh token may still be presented without counting as theft. */
export const REUSE_GRACE_MS = 15_000;

// The successor of a token is derived from it (HMAC under a key of our own), so a replay
// within the grace window is answered with the very same successor: never a second chain.
const SUCCESSOR_KEY = createHmac('sha256', config.jwtSecret).update('refresh-token successor v1').digest();
const successorOf = (token: string) => createHmac('sha256', SUCCESSOR_KEY).update(token, 'utf8').digest('base64url');

async function insertToken(m: EntityManager, userId: number, sessionId: string, token: string, expiresAt: Date) {
  await m
    .withRepository(RefreshTokenRepository)
    .insert({ userId, familyId: sessionId, tokenHash: sha256Hex(token), expiresAt });
}

/** A new session (sign-in, a changed password): its first refresh token. */
export async function startSession(m: EntityManager, userId: number): Promise<IssuedToken> {
  const issued = {
    token: randomToken(),
    sessionId: randomUUID(),
    expiresAt: new Date(Date.now() + config.REFRESH_TOKEN_TTL_DAYS * 86_400_000),
  };
  await insertToken(m, userId, issued.sessionId, issued.token, issued.expiresAt);
  return issued;
}

export async function revokeSession(m: EntityManager, sessionId: string) {
  await m.withRepository(RefreshTokenRepository).revokeFamily(sessionId);
}

export async function revokeAllFor(m: EntityManager, userId: number) {
  await m.withRepository(RefreshTokenRepository).revokeAllFor(userId);
}

export type Rotation = { ok: true; userId: number; issued: IssuedToken } | { ok: false; error: AppError };

const ended = () => new AppError(401, 'session_ended', 'Your session has ended. Sign in again.');

/**
 * Exchanges a refresh token for its successor in the same session. A token replaced
 * moments ago is a benign race (a reload cut off the answer, two tabs refreshed at once)
 * and gets the same successor again; one replaced earlier is a stolen copy, and the whole
 * session is revoked. Returns instead of throwing, so a revocation commits before the
 * caller answers 401.
 */
export async function rotateRefreshToken(m: EntityManager, token: string): Promise<Rotation> {
  const repo = m.withRepository(RefreshTokenRepository);
  const row = await repo.lockByHash(sha256Hex(token));
  if (!row || row.revokedAt || row.expiresAt.getTime() <= Date.now()) return { ok: false, error: ended() };
  const issued = { token: successorOf(token), sessionId: row.familyId, expiresAt: row.expiresAt };
  if (row.replacedAt && Date.now() - row.replacedAt.getTime() <= REUSE_GRACE_MS) {
    // Only a successor this code derived can be handed out again (tokens from before it had random ones).
    const successor = await repo.findByHash(sha256Hex(issued.token));
    if (!successor || successor.revokedAt) return { ok: false, error: ended() };
    return { ok: true, userId: row.userId, issued };
  }
  if (row.replacedAt) {
    await revokeSession(m, row.familyId);
    const detail = 'This session was used from somewhere else and has been closed. Sign in again.';
    return { ok: false, error: new AppError(401, 'session_reused', detail) };
  }
  await repo.markReplaced(row.id);
  await insertToken(m, row.userId, row.familyId, issued.token, issued.expiresAt);
  return { ok: true, userId: row.userId, issued };
}

export async function sessionOf(m: EntityManager, token: string): Promise<string | null> {
  const row = await m.withRepository(RefreshTokenRepository).findByHash(sha256Hex(token));
  return row?.familyId ?? null;
}
