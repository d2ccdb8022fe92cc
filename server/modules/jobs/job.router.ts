import { Router, type Request } from 'express';
import { CreateJobBody, IDEMPOTENCY_KEY, JobsQuery, ReadingBody, UpdateJobBody } from '@/lib/contracts/jobs';
import { IdParams } from '@/lib/contracts/library';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';
import { createJob, getJob, listJobs, updateJob } from './job.service';
import { addReading } from './reading.service';
import { readingsCsv } from './readings-csv';
import { requestHash } from './request-hash';

/** The Idempotency-Key header, if sent: a job or reading queued offline is resent with the same one. */
function idempotencyKey(req: Request): string | undefined {
  const key = req.get('Idempotency-Key');
  if (key !== undefined && !IDEMPOTENCY_KEY.test(key))
    throw AppError.badRequest('Idempotency-Key must be 8–80 letters, digits, or . _ : -');
  return key;
}

const create = route({ body: CreateJobBody }, async ({ user, body, req, res }) => {
  const { job, created } = await createJob(user, body, { key: idempotencyKey(req), hash: requestHash(req.body) });
  res.status(created ? 201 : 200);
  return job;
});
const list = route({ query: JobsQuery }, ({ user, query }) => listJobs(user, query));
const show = route({ params: IdParams }, ({ user, params }) => getJob(user, params.id));
const update = route({ params: IdParams, body: UpdateJobBody }, ({ user, params, body }) =>
  updateJob(user, params.id, body),
);
const addReadingRoute = route({ params: IdParams, body: ReadingBody }, async ({ user, params, body, req, res }) => {
  const { reading, created } = await addReading(user, params.id, body, {
    key: idempotencyKey(req),
    hash: requestHash(req.body),
  });
  res.status(created ? 201 : 200);
  return reading;
});

const readingsCsvRoute = route({ params: IdParams }, async ({ user, params, res }) => {
  const job = await getJob(user, params.id);
  res.type('text/csv; charset=utf-8').attachment(`job-${job.id}-readings.csv`).send(readingsCsv(job));
});

export const jobRouter = Router();

jobRouter.post('/', create);
jobRouter.get('/', list);
jobRouter.get('/:id', show);
jobRouter.patch('/:id', update);
jobRouter.post('/:id/readings', addReadingRoute);
jobRouter.get('/:id/readings.csv', readingsCsvRoute);
