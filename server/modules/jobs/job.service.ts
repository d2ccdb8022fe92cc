/**
 * Job sheets: a technician's jobs and the readings judged on them. Only the owner (and
 * admins) may see or change a job; anyone else gets 404, so ids reveal nothing.
 */
import type { CreateJobBody, JobDetailDto, JobSummaryDto, UpdateJobBody } from '@/lib/contracts/jobs';
import { modelTitle } from '@/lib/format/model-title';
import { AppError } from '@/server/errors/app-error';
import { assertSameRequest } from './request-hash';
import type { SignedInUser } from '@/server/auth/roles';
import { ModelRepository } from '../library/library.repository';
import type { Job } from './job.entity';
import type { Reading } from './reading.entity';
import { ownJobOr404 } from './job-access';
import { toJobSummary, toReadingDto } from './job.mapper';
import { JobRepository, ReadingRepository } from './job.repository';

export async function findOwnJob(user: SignedInUser, id: number): Promise<Job> {
  return ownJobOr404(user, await JobRepository.findWithDetails(id), id);
}

/** Jobs read with their owner and model (JobRepository), summarised with their readings. */
async function summaries(jobs: Job[]): Promise<Map<number, { summary: JobSummaryDto; readings: Reading[] }>> {
  const readings = await ReadingRepository.forJobs(jobs.map((j) => j.id));
  return new Map(
    jobs.map((j) => {
      const own = readings.filter((r) => r.jobId === j.id);
      const extras = {
        ownerName: j.owner?.displayName ?? '',
        modelTitle: j.model ? modelTitle(j.model) : null,
      };
      return [j.id, { summary: toJobSummary(j, extras, own), readings: own }];
    }),
  );
}

/** A job already stored under this key answers again, but only for the same request body. */
async function replayJob(user: SignedInUser, existing: Job, hash: string): Promise<CreatedJob> {
  assertSameRequest(existing.requestHash, hash, 'job');
  return { job: await getJob(user, existing.id), created: false };
}

export type CreatedJob = { job: JobDetailDto; created: boolean };

/**
 * `request.key`: the Idempotency-Key a job started offline is resent with; `hash`:
 * requestHash() of the body as sent. A resend answers with the job stored the first time.
 */
export async function createJob(
  user: SignedInUser,
  body: CreateJobBody,
  request: { key?: string; hash?: string } = {},
): Promise<CreatedJob> {
  const key = request.key ?? null;
  if (key !== null) {
    const existing = await JobRepository.findOneBy({ ownerId: user.id, idempotencyKey: key });
    if (existing) return replayJob(user, existing, request.hash ?? '');
  }
  if (body.modelId !== undefined && !(await ModelRepository.existsById(body.modelId))) {
    throw AppError.unprocessable(`No model with id ${body.modelId} in the library.`, [
      { path: 'modelId', message: 'Unknown model' },
    ]);
  }
  try {
    const job = await JobRepository.save({
      ownerId: user.id,
      modelId: body.modelId ?? null,
      machineLabel: body.machineLabel ?? '',
      machineId: body.machineId ?? '',
      customerRef: body.customerRef ?? '',
      notes: body.notes || null,
      status: 'open',
      idempotencyKey: key,
      requestHash: key === null ? null : (request.hash ?? null),
    });
    return { job: await getJob(user, job.id), created: true };
  } catch (err) {
    // Two copies of the same job raced: the other one won; answer with it.
    if (key === null || (err as { driverError?: { code?: string } }).driverError?.code !== 'ER_DUP_ENTRY') throw err;
    const existing = await JobRepository.findOneByOrFail({ ownerId: user.id, idempotencyKey: key });
    return replayJob(user, existing, request.hash ?? '');
  }
}

export async function listJobs(
  user: SignedInUser,
  query: { q?: string; status?: 'open' | 'closed' },
): Promise<JobSummaryDto[]> {
  const jobs = await JobRepository.listOwned({ ownerId: user.id, q: query.q, status: query.status });
  const all = await summaries(jobs);
  return jobs.map((j) => all.get(j.id)!.summary);
}

export async function getJob(user: SignedInUser, id: number): Promise<JobDetailDto> {
  const job = await findOwnJob(user, id);
  const { summary, readings } = (await summaries([job])).get(job.id)!;
  return {
    ...summary,
    readings: readings.map((r) => toReadingDto(r, r.specId === null ? null : (r.spec?.version ?? null))),
  };
}

export async function updateJob(user: SignedInUser, id: number, body: UpdateJobBody): Promise<JobDetailDto> {
  const job = await findOwnJob(user, id);
  await JobRepository.update(job.id, {
    ...body,
    ...(body.notes !== undefined ? { notes: body.notes || null } : {}),
  });
  return getJob(user, id);
}
