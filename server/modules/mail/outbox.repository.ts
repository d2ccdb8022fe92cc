/**
 * The outbox_messages queries: enqueue, claim what is due, and record each attempt.
 * A claim is its own short transaction: it locks due rows (SKIP LOCKED, so workers in
 * other processes take other rows), pushes their next attempt out by a lease and counts
 * the attempt, then commits, so nothing is held while the mail server is talked to. A
 * worker that dies mid-send leaves its messages to be retried when the lease ends.
 */
import { AppDataSource } from '@/server/db/data-source';
import { OutboxMessage } from './outbox-message.entity';

export type Mail = { to: string; subject: string; text: string };

export const OutboxRepository = AppDataSource.getRepository(OutboxMessage).extend({
  async enqueue(mail: Mail): Promise<void> {
    await this.insert({ ...mail, attempts: 0, nextAttemptAt: new Date() });
  },
  /** Up to `limit` due messages, oldest first, leased to this worker for `leaseMs`. */
  claimDue(limit: number, leaseMs: number): Promise<OutboxMessage[]> {
    return this.manager.transaction(async (m) => {
      const due = await m
        .getRepository(OutboxMessage)
        .createQueryBuilder('o')
        .where('o.sentAt IS NULL AND o.nextAttemptAt <= :now', { now: new Date() })
        .orderBy('o.id', 'ASC')
        .limit(limit)
        .setLock('pessimistic_write')
        .setOnLocked('skip_locked')
        .getMany();
      if (!due.length) return [];
      await m
        .createQueryBuilder()
        .update(OutboxMessage)
        .set({ nextAttemptAt: new Date(Date.now() + leaseMs), attempts: () => 'attempts + 1' })
        .whereInIds(due.map((d) => d.id))
        .execute();
      return due.map((d) => Object.assign(d, { attempts: d.attempts + 1 }));
    });
  },
  async markSent(msg: OutboxMessage): Promise<void> {
    await this.update(msg.id, { sentAt: new Date(), lastError: null });
  },
  async markFailed(msg: OutboxMessage, error: string, nextAttemptAt: Date): Promise<void> {
    await this.update(msg.id, { lastError: error, nextAttemptAt });
  },
});
