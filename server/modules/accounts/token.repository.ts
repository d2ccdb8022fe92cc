/**
 * The email_tokens and refresh_tokens queries. Tokens are looked up by their SHA-256
 * only; the rules (single use, expiry, rotation, reuse) live in email-links.ts and
 * session-tokens.ts. Bind to a transaction with `m.withRepository(...)`.
 */
import { IsNull } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';
import { User } from '../users/user.entity';
import { EmailToken } from './email-token.entity';
import { RefreshToken } from './refresh-token.entity';

export const EmailTokenRepository = AppDataSource.getRepository(EmailToken).extend({
  /** The link's row, locked for update until the transaction ends. */
  lockByHash(tokenHash: string, purpose: EmailToken['purpose']): Promise<EmailToken | null> {
    return this.createQueryBuilder('t')
      .setLock('pessimistic_write')
      .where('t.tokenHash = :h AND t.purpose = :p', { h: tokenHash, p: purpose })
      .getOne();
  },
  async markUsed(id: number): Promise<void> {
    await this.update(id, { usedAt: new Date() });
  },
  /** Every unused link of this kind for the account stops working. */
  async useUpAll(userId: number, purpose: EmailToken['purpose']): Promise<void> {
    await this.update({ userId, purpose, usedAt: IsNull() }, { usedAt: new Date() });
  },
});

export const RefreshTokenRepository = AppDataSource.getRepository(RefreshToken).extend({
  findByHash(tokenHash: string): Promise<RefreshToken | null> {
    return this.findOneBy({ tokenHash });
  },
  /** The token's row, locked for update until the transaction ends. */
  lockByHash(tokenHash: string): Promise<RefreshToken | null> {
    return this.createQueryBuilder('r')
      .setLock('pessimistic_write')
      .where('r.tokenHash = :h', { h: tokenHash })
      .getOne();
  },
  async markReplaced(id: number): Promise<void> {
    await this.update(id, { replacedAt: new Date() });
  },
  async revokeFamily(familyId: string): Promise<void> {
    await this.update({ familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  },
  async revokeAllFor(userId: number): Promise<void> {
    await this.update({ userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  },
});

/**
 * The per-request read behind every access token: the account, only while the token's
 * session is open (not revoked, not past its absolute end). One query, so ending a session
 * refuses its access tokens at once rather than when they expire.
 */
export function findSessionUser(userId: number, sessionId: string): Promise<User | null> {
  return AppDataSource.getRepository(User)
    .createQueryBuilder('u')
    .where('u.id = :userId', { userId })
    .andWhere(
      'EXISTS (SELECT 1 FROM refresh_tokens r WHERE r.family_id = :sessionId AND r.user_id = u.id ' +
        'AND r.revoked_at IS NULL AND r.expires_at > :now)',
      { sessionId, now: new Date() },
    )
    .getOne();
}
