/**
 * The jobs and readings queries. A job is read with its owner and its library model
 * (and the model's make) through the entities' relations; readings come with the
 * current version of the spec they were judged against. Bind to a transaction with
 * `m.withRepository(...)`.
 */
import type { EntityManager } from 'typeorm';
import { AppDataSource } from '@/server/db/data-source';
import { Spec } from '../specs/spec.entity';
import { Job } from './job.entity';
import { Reading } from './reading.entity';

export type JobFilter = { ownerId: number; q?: string; status?: 'open' | 'closed' };

const likePattern = (q: string) => `%${q.replace(/[%_\\]/g, '\\$&')}%`;

export const JobRepository = AppDataSource.getRepository(Job).extend({
  findWithDetails(id: number): Promise<Job | null> {
    return this.findOne({ where: { id }, relations: { owner: true, model: { make: true } } });
  },
  /** The row, locked for update until the transaction ends. */
  lockById(id: number): Promise<Job | null> {
    return this.createQueryBuilder('j').setLock('pessimistic_write').where('j.id = :id', { id }).getOne();
  },
  /** One owner's newest 200 jobs; `q` matches the machine, customer, notes, model or make. */
  listOwned(filter: JobFilter): Promise<Job[]> {
    const qb = this.createQueryBuilder('j')
      .leftJoinAndSelect('j.owner', 'o')
      .leftJoinAndSelect('j.model', 'vm')
      .leftJoinAndSelect('vm.make', 'mk')
      .where('j.ownerId = :owner', { owner: filter.ownerId })
      .orderBy('j.createdAt', 'DESC')
      .addOrderBy('j.id', 'DESC')
      .limit(200);
    if (filter.status) qb.andWhere('j.status = :status', { status: filter.status });
    if (filter.q) {
      qb.andWhere(
        '(j.machineLabel LIKE :q OR j.machineId LIKE :q OR j.customerRef LIKE :q OR j.notes LIKE :q OR vm.name LIKE :q OR mk.name LIKE :q)',
        { q: likePattern(filter.q) },
      );
    }
    return qb.getMany();
  },
});

export const ReadingRepository = AppDataSource.getRepository(Reading).extend({
  /** The jobs' readings in the order taken, each with its spec's current version (spec.id, spec.version). */
  forJobs(jobIds: number[]): Promise<Reading[]> {
    if (jobIds.length === 0) return Promise.resolve([]);
    return this.createQueryBuilder('r')
      .leftJoin('r.spec', 's')
      .addSelect(['s.id', 's.version'])
      .where('r.jobId IN (:...ids)', { ids: jobIds })
      .orderBy('r.takenAt', 'ASC')
      .addOrderBy('r.id', 'ASC')
      .getMany();
  },
  findByKey(jobId: number, idempotencyKey: string): Promise<Reading | null> {
    return this.findOneBy({ jobId, idempotencyKey });
  },
  getByKey(jobId: number, idempotencyKey: string): Promise<Reading> {
    return this.findOneByOrFail({ jobId, idempotencyKey });
  },
  findOnJob(id: number, jobId: number): Promise<Reading | null> {
    return this.findOneBy({ id, jobId });
  },
  async markSuperseded(id: number, by: number): Promise<void> {
    await this.update(id, { supersededBy: by });
  },
});

/** The spec a reading is judged against, with what the reading records of it (component, source). */
export function specForReading(m: EntityManager, specId: number): Promise<Spec | null> {
  // Published only, as for verdicts: a draft is not in the library yet (hardening, issue 13).
  return m
    .getRepository(Spec)
    .findOne({ where: { id: specId, status: 'published' }, relations: { component: true, source: true } });
}
