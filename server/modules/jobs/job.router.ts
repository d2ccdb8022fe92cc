import { Router } from 'express';
import { CreateJobBody, IDEMPOTENCY_KEY, JobsQuery, ReadingBody, UpdateJobBody } from '@/lib/contracts/jobs';
import { IdParams } from '@/lib/contracts/library';
import { AppError } from '@/server/errors/app-error';
import { validate } from '@/server/middleware/validate';
import { createJob, getJob, listJobs, updateJob } from './job.service';
import { addReading } from './reading.service';
import { readingsCsv } from './readings-csv';

export const jobRouter = Router();

jobRouter.post('/', validate('body', CreateJobBody), async (req, res) => {
  res.status(201).json(await createJob(req.user!, res.locals.body));
});

jobRouter.get('/', validate('query', JobsQuery), async (req, res) => {
  res.json(await listJobs(req.user!, res.locals.query));
});

jobRouter.get('/:id', validate('params', IdParams), async (req, res) => {
  res.json(await getJob(req.user!, res.locals.params.id));
});

jobRouter.patch('/:id', validate('params', IdParams), validate('body', UpdateJobBody), async (req, res) => {
  res.json(await updateJob(req.user!, res.locals.params.id, res.locals.body));
});

jobRouter.post('/:id/readings', validate('params', IdParams), validate('body', ReadingBody), async (req, res) => {
  const key = req.get('Idempotency-Key');
  if (key !== undefined && !IDEMPOTENCY_KEY.test(key))
    throw AppError.badRequest('Idempotency-Key must be 8–80 letters, digits, or . _ : -');
  const { reading, created } = await addReading(req.user!, res.locals.params.id, res.locals.body, key);
  res.status(created ? 201 : 200).json(reading);
});

jobRouter.get('/:id/readings.csv', validate('params', IdParams), async (req, res) => {
  const job = await getJob(req.user!, res.locals.params.id);
  res.type('text/csv; charset=utf-8').attachment(`job-${job.id}-readings.csv`).send(readingsCsv(job));
});
