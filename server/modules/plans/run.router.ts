import { Router } from 'express';
import { IDEMPOTENCY_KEY } from '@/lib/contracts/jobs';
import { JobParams, RunParams, RunResultBody, StartRunBody } from '@/lib/contracts/plans';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';
import { requestHash } from '../jobs/request-hash';
import { answerStep, getRun, listRuns, startRun, stepBack } from './run.service';

const start = route({ params: JobParams, body: StartRunBody, status: 201 }, ({ user, params, body }) =>
  startRun(user, params.jobId, body.planId),
);
const list = route({ params: JobParams }, ({ user, params }) => listRuns(user, params.jobId));
const show = route({ params: RunParams }, ({ user, params }) => getRun(user, params.jobId, params.runId));
const answer = route({ params: RunParams, body: RunResultBody }, async ({ user, params, body, req, res }) => {
  const key = req.get('Idempotency-Key');
  if (key !== undefined && !IDEMPOTENCY_KEY.test(key))
    throw AppError.badRequest('Idempotency-Key must be 8–80 letters, digits, or . _ : -');
  const { created, ...answered } = await answerStep(user, params.jobId, params.runId, body, {
    key,
    hash: requestHash(req.body),
  });
  res.status(created ? 201 : 200);
  return answered;
});
const back = route({ params: RunParams }, ({ user, params }) => stepBack(user, params.jobId, params.runId));

/** Mounted at /api/jobs beside the job router: a plan run belongs to its job. */
export const runRouter = Router();

runRouter.post('/:jobId/runs', start);
runRouter.get('/:jobId/runs', list);
runRouter.get('/:jobId/runs/:runId', show);
runRouter.post('/:jobId/runs/:runId/results', answer);
runRouter.post('/:jobId/runs/:runId/back', back);
