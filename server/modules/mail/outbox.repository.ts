/**
 * The outbox_messages queries: enqueue, claim what is due (SKIP LOCKED, so several
 * workers never send one message twice), and record each attempt.
 */
import { AppDataSource } from '@/server/db/data-source';
import { OutboxMessage } from './outbox-message.entity';

export type Mail = { to: string; subject: string; text: string };

export const OutboxRepository = AppDataSource.getRepository(OutboxMessage).extend({
  async enqueue(mail: Mail): Promise<void> {
    await this.insert({ ...mail, attempts: 0, nextAttemptAt: new Date() });
  },
  /** Up to `limit` unsent messages that are due, oldest first, locked (others skip them). */
  claimDue(limit: number): Promise<OutboxMessage[]> {
    return this.createQueryBuilder('o')
      .where('o.sentAt IS NULL AND o.nextAttemptAt <= :now', { now: new Date() })
      .orderBy('o.id', 'ASC')
      .limit(limit)
      .setLock('pessimistic_write')
      .setOnLocked('skip_locked')
      .getMany();
  },
  async markSent(msg: OutboxMessage): Promise<void> {
    await this.update(msg.id, { sentAt: new Date(), attempts: msg.attempts + 1, lastError: null });
  },
  async markFailed(msg: OutboxMessage, error: string, nextAttemptAt: Date): Promise<void> {
    await this.update(msg.id, { attempts: msg.attempts + 1, lastError: error, nextAttemptAt });
  },
});
