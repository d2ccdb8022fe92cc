/**
 * Job sheets: a technician's jobs and the readings judged on them. Only the owner (and
 * admins) may see or change a job; anyone else gets 404, so ids reveal nothing.
 */
import { In } from 'typeorm';
import type { CreateJobBody, JobDetailDto, JobSummaryDto, UpdateJobBody } from '@/lib/contracts/jobs';
import { AppDataSource } from '@/server/db/data-source';
import { modelTitle } from '@/lib/format/model-title';
import { AppError } from '@/server/errors/app-error';
import type { SignedInUser } from '@/server/auth/roles';
import { VehicleModel } from '../library/vehicle-model.entity';
import { Spec } from '../specs/spec.entity';
import { User } from '../users/user.entity';
import { Job } from './job.entity';
import { Reading } from './reading.entity';
import { toJobSummary, toReadingDto } from './job.mapper';

export async function findOwnJob(user: SignedInUser, id: number): Promise<Job> {
  const job = await AppDataSource.getRepository(Job).findOneBy({ id });
  if (!job || (job.ownerId !== user.id && user.role !== 'admin')) throw AppError.notFound('job', id);
  return job;
}

async function summaries(jobs: Job[]): Promise<Map<number, { summary: JobSummaryDto; readings: Reading[] }>> {
  const ids = jobs.map((j) => j.id);
  const readings = ids.length
    ? await AppDataSource.getRepository(Reading).find({
        where: { jobId: In(ids) },
        order: { takenAt: 'ASC', id: 'ASC' },
      })
    : [];
  const modelIds = [...new Set(jobs.map((j) => j.modelId).filter((id): id is number => id !== null))];
  const models = modelIds.length
    ? await AppDataSource.getRepository(VehicleModel).find({ where: { id: In(modelIds) }, relations: { make: true } })
    : [];
  const owners = await AppDataSource.getRepository(User).find({
    where: { id: In([...new Set(jobs.map((j) => j.ownerId))]) },
  });
  return new Map(
    jobs.map((j) => {
      const own = readings.filter((r) => r.jobId === j.id);
      const model = models.find((m) => m.id === j.modelId);
      const extras = {
        ownerName: owners.find((o) => o.id === j.ownerId)?.displayName ?? '',
        modelTitle: model ? modelTitle(model) : null,
      };
      return [j.id, { summary: toJobSummary(j, extras, own), readings: own }];
    }),
  );
}

export async function createJob(user: SignedInUser, body: CreateJobBody): Promise<JobDetailDto> {
  if (body.modelId !== undefined && !(await AppDataSource.getRepository(VehicleModel).existsBy({ id: body.modelId }))) {
    throw AppError.unprocessable(`No model with id ${body.modelId} in the library.`, [
      { path: 'modelId', message: 'Unknown model' },
    ]);
  }
  const job = await AppDataSource.getRepository(Job).save({
    ownerId: user.id,
    modelId: body.modelId ?? null,
    machineLabel: body.machineLabel ?? '',
    machineId: body.machineId ?? '',
    customerRef: body.customerRef ?? '',
    notes: body.notes || null,
    status: 'open',
  });
  return getJob(user, job.id);
}

export async function listJobs(
  user: SignedInUser,
  query: { q?: string; status?: 'open' | 'closed' },
): Promise<JobSummaryDto[]> {
  const qb = AppDataSource.getRepository(Job)
    .createQueryBuilder('j')
    .leftJoin(VehicleModel, 'vm', 'vm.id = j.model_id')
    .leftJoin('makes', 'mk', 'mk.id = vm.make_id')
    .where('j.ownerId = :owner', { owner: user.id })
    .orderBy('j.createdAt', 'DESC')
    .addOrderBy('j.id', 'DESC')
    .limit(200);
  if (query.status) qb.andWhere('j.status = :status', { status: query.status });
  if (query.q) {
    const like = `%${query.q.replace(/[%_\\]/g, '\\$&')}%`;
    qb.andWhere(
      '(j.machineLabel LIKE :q OR j.machineId LIKE :q OR j.customerRef LIKE :q OR j.notes LIKE :q OR vm.name LIKE :q OR mk.name LIKE :q)',
      { q: like },
    );
  }
  const jobs = await qb.getMany();
  const all = await summaries(jobs);
  return jobs.map((j) => all.get(j.id)!.summary);
}

export async function getJob(user: SignedInUser, id: number): Promise<JobDetailDto> {
  const job = await findOwnJob(user, id);
  const { summary, readings } = (await summaries([job])).get(job.id)!;
  const specIds = [...new Set(readings.map((r) => r.specId).filter((s): s is number => s !== null))];
  const specs = specIds.length
    ? await AppDataSource.getRepository(Spec).find({ where: { id: In(specIds) }, select: { id: true, version: true } })
    : [];
  const versions = new Map(specs.map((s) => [s.id, s.version]));
  return {
    ...summary,
    readings: readings.map((r) => toReadingDto(r, r.specId === null ? null : (versions.get(r.specId) ?? null))),
  };
}

export async function updateJob(user: SignedInUser, id: number, body: UpdateJobBody): Promise<JobDetailDto> {
  const job = await findOwnJob(user, id);
  await AppDataSource.getRepository(Job).update(job.id, {
    ...body,
    ...(body.notes !== undefined ? { notes: body.notes || null } : {}),
  });
  return getJob(user, id);
}
