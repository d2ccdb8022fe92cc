/**
 * Judging a reading onto a job. The verdict is the shared engine's, the limits and the
 * spec version are kept with it, and an Idempotency-Key makes a resent reading (a
 * flaky connection, an offline queue flushing twice) land exactly once.
 */
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { ReadingBody, ReadingDto } from '@/lib/contracts/jobs';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import type { SignedInUser } from '@/server/auth/roles';
import { Spec } from '../specs/spec.entity';
import { judge, toVerdictInput } from '../verdicts/verdict.service';
import { Job } from './job.entity';
import { Reading } from './reading.entity';
import { toReadingDto } from './job.mapper';

export type AddedReading = { reading: ReadingDto; created: boolean };

async function describeSpec(m: EntityManager, specId: number) {
  const spec = await m
    .getRepository(Spec)
    .findOne({ where: { id: specId }, relations: { component: true, source: true } });
  if (!spec) throw AppError.notFound('spec', specId);
  const citation = spec.source
    ? `${spec.source.title}${spec.source.edition ? `, ${spec.source.edition}` : ''}${spec.sourcePage ? `, p. ${spec.sourcePage}` : ''}`
    : null;
  return { label: spec.parameter, componentName: spec.component.name, citation };
}

async function lockOpenJob(m: EntityManager, user: SignedInUser, jobId: number): Promise<Job> {
  const job = await m
    .getRepository(Job)
    .createQueryBuilder('j')
    .setLock('pessimistic_write')
    .where('j.id = :id', { id: jobId })
    .getOne();
  if (!job || (job.ownerId !== user.id && user.role !== 'admin')) throw AppError.notFound('job', jobId);
  if (job.status === 'closed') throw AppError.conflict('This job is closed. Reopen it to add readings.');
  return job;
}

export async function addReading(
  user: SignedInUser,
  jobId: number,
  body: ReadingBody,
  key: string | undefined,
): Promise<AddedReading> {
  const idempotencyKey = key ?? randomUUID();
  try {
    return await AppDataSource.transaction(async (m) => {
      await lockOpenJob(m, user, jobId);
      const existing = await m.getRepository(Reading).findOneBy({ jobId, idempotencyKey });
      if (existing) return { reading: toReadingDto(existing, existing.specVersion), created: false };
      const { input, specVersion } = await toVerdictInput(body);
      const result = judge(input);
      const about =
        body.specId !== undefined
          ? await describeSpec(m, body.specId)
          : { label: body.label!, componentName: '', citation: null };
      const saved = await m.getRepository(Reading).save({
        jobId,
        specId: body.specId ?? null,
        specVersion: specVersion ?? null,
        label: about.label,
        componentName: about.componentName,
        specLimits: { ...input.spec, citation: about.citation },
        inputs: { ...body, label: undefined, retakeOf: undefined, takenAt: undefined },
        value: result.value,
        unit: result.unit,
        expandedUncertainty: result.expandedUncertainty,
        conformanceProbability: result.conformanceProbability,
        verdict: result.verdict,
        reason: result.reason,
        steps: result.steps,
        zones: result.zones,
        idempotencyKey,
        supersededBy: null,
        takenAt: body.takenAt ? new Date(body.takenAt) : new Date(),
      });
      if (body.retakeOf !== undefined) await supersede(m, jobId, body.retakeOf, saved.id);
      return { reading: toReadingDto(saved, saved.specVersion), created: true };
    });
  } catch (err) {
    // Two copies of the same reading raced: the other one won; answer with it.
    if ((err as { code?: string; driverError?: { code?: string } }).driverError?.code !== 'ER_DUP_ENTRY') throw err;
    const existing = await AppDataSource.getRepository(Reading).findOneByOrFail({ jobId, idempotencyKey });
    return { reading: toReadingDto(existing, existing.specVersion), created: false };
  }
}

async function supersede(m: EntityManager, jobId: number, oldId: number, newId: number) {
  const old = await m.getRepository(Reading).findOneBy({ id: oldId, jobId });
  if (!old)
    throw AppError.unprocessable(`Reading ${oldId} is not on this job.`, [
      { path: 'retakeOf', message: 'Not on this job' },
    ]);
  if (old.supersededBy !== null) throw AppError.conflict(`Reading ${oldId} has already been re-taken.`);
  await m.getRepository(Reading).update(old.id, { supersededBy: newId });
}
