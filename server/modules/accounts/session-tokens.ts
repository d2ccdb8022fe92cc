/** Refresh-token families: issue, rotate (detecting reuse), revoke. */
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';
import { randomToken, sha256Hex } from '@/server/auth/tokens';
import { RefreshTokenRepository } from './token.repository';

export async function issueRefreshToken(
  m: EntityManager,
  userId: number,
  familyId: string = randomUUID(),
): Promise<string> {
  const token = randomToken();
  await m.withRepository(RefreshTokenRepository).insert({
    userId,
    familyId,
    tokenHash: sha256Hex(token),
    expiresAt: new Date(Date.now() + config.REFRESH_TOKEN_TTL_DAYS * 86_400_000),
  });
  return token;
}

export async function revokeFamily(m: EntityManager, familyId: string) {
  await m.withRepository(RefreshTokenRepository).revokeFamily(familyId);
}

export async function revokeAllFor(m: EntityManager, userId: number) {
  await m.withRepository(RefreshTokenRepository).revokeAllFor(userId);
}

/**
 * Exchanges a refresh token for a new one in the same family. A token that was already
 * replaced is a stolen copy (or a replay): the whole family is revoked.
 */
/** How long a just-replaced refresh token may still be presented without counting as theft. */
export const REUSE_GRACE_MS = 15_000;

export type Rotation = { ok: true; userId: number; token: string } | { ok: false; error: AppError };

/** Returns instead of throwing, so a revocation commits before the caller answers 401. */
export async function rotateRefreshToken(m: EntityManager, token: string): Promise<Rotation> {
  const repo = m.withRepository(RefreshTokenRepository);
  const row = await repo.lockByHash(sha256Hex(token));
  if (!row || row.revokedAt || row.expiresAt.getTime() <= Date.now()) {
    return { ok: false, error: new AppError(401, 'session_ended', 'Your session has ended. Sign in again.') };
  }
  // A token replaced moments ago is a benign race (a reload cut off the answer that carried
  // its successor, or two tabs refreshed at once): rotate again within the family.
  if (row.replacedAt && Date.now() - row.replacedAt.getTime() <= REUSE_GRACE_MS) {
    return { ok: true, userId: row.userId, token: await issueRefreshToken(m, row.userId, row.familyId) };
  }
  if (row.replacedAt) {
    await revokeFamily(m, row.familyId);
    return {
      ok: false,
      error: new AppError(
        401,
        'session_reused',
        'This session was used from somewhere else and has been closed. Sign in again.',
      ),
    };
  }
  await repo.markReplaced(row.id);
  return { ok: true, userId: row.userId, token: await issueRefreshToken(m, row.userId, row.familyId) };
}

export async function familyOf(m: EntityManager, token: string): Promise<string | null> {
  const row = await m.withRepository(RefreshTokenRepository).findByHash(sha256Hex(token));
  return row?.familyId ?? null;
}
