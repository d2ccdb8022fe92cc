/**
 * The users and user_audit queries. Services use these repositories as they are, or
 * bound to a transaction with `m.withRepository(UserRepository)`.
 */
import { In } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';
import { User } from './user.entity';
import { UserAudit } from './user-audit.entity';
import { emailKey } from './user.mapper';

const likePattern = (q: string) => `%${q.toLowerCase().replace(/[%_\\]/g, '\\$&')}%`;

export const UserRepository = AppDataSource.getRepository(User).extend({
  findById(id: number): Promise<User | null> {
    return this.findOneBy({ id });
  },
  getById(id: number): Promise<User> {
    return this.findOneByOrFail({ id });
  },
  /** Case-insensitive: the address is matched on its lower-cased key. */
  findByEmail(email: string): Promise<User | null> {
    return this.findOneBy({ emailKey: emailKey(email) });
  },
  /** The row, locked for update until the transaction ends. */
  lockById(id: number): Promise<User | null> {
    return this.createQueryBuilder('u').setLock('pessimistic_write').where('u.id = :id', { id }).getOne();
  },
  /** The newest 200 accounts, or those whose address or name contains `q`. */
  search(q?: string): Promise<User[]> {
    const qb = this.createQueryBuilder('u').orderBy('u.createdAt', 'DESC').limit(200);
    if (q) qb.where('(u.emailKey LIKE :q OR u.displayName LIKE :q)', { q: likePattern(q) });
    return qb.getMany();
  },
  findByIds(ids: number[]): Promise<User[]> {
    return this.find({ where: { id: In(ids) } });
  },
});

export const UserAuditRepository = AppDataSource.getRepository(UserAudit).extend({
  async record(entry: Omit<UserAudit, 'id' | 'createdAt'>): Promise<void> {
    await this.insert(entry);
  },
  /** The latest 100 changes to one account, newest first. */
  latestFor(userId: number): Promise<UserAudit[]> {
    return this.find({ where: { userId }, order: { id: 'DESC' }, take: 100 });
  },
});
