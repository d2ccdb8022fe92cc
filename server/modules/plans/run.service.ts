/**
 * Running a plan on a job. A run copies the plan's steps when it starts (a generic plan is
 * checked against the job's model then: 422 naming the step it cannot run), and keeps its
 * state on the server so it can be paused on one device and resumed on another. Each result
 * is judged on the server (run-judge.ts), kept as a job reading linked to its step, and moves
 * the run by the plan's rules (lib/plans/branching.ts) to the next step or to a finding. An
 * Idempotency-Key makes a resent result land exactly once.
 */
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { RunAnswerDto, RunDto, RunResultBody, RunResultDto } from '@/lib/contracts/plans';
import { fitProblems } from '@/lib/plans/applicability';
import { targetFor } from '@/lib/plans/branching';
import type { SignedInUser } from '@/server/auth/roles';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import type { Job } from '../jobs/job.entity';
import type { Reading } from '../jobs/reading.entity';
import { ownJobOr404 } from '../jobs/job-access';
import { toReadingDto } from '../jobs/job.mapper';
import { JobRepository, ReadingRepository } from '../jobs/job.repository';
import type { PlanRun } from './plan-run.entity';
import type { PlanRunResult } from './plan-run-result.entity';
import { PlanRepository, PlanRunRepository, PlanRunResultRepository } from './plan.repository';
import { judgeStep } from './run-judge';
import { jobModelParts, toRunStep, type JobModelParts } from './run-step';
import { assertSameRequest } from '../jobs/request-hash';

function toResultDto(r: PlanRunResult, run: PlanRun): RunResultDto {
  return {
    id: r.id,
    stepId: r.stepId,
    title: run.steps.find((s) => s.id === r.stepId)?.title ?? r.stepId,
    outcome: r.outcome === 'skip' ? 'skipped' : r.outcome,
    verdict: r.verdict,
    reason: r.reason,
    readingId: r.readingId,
    skipReason: r.skipReason,
    createdAt: r.createdAt.toISOString(),
  };
}

function toRunDto(run: PlanRun, results: PlanRunResult[], parts: JobModelParts): RunDto {
  return {
    id: run.id,
    jobId: run.jobId,
    planId: run.planId,
    planVersion: run.planVersion,
    title: run.title,
    symptom: run.symptom,
    system: run.system,
    status: run.status,
    stepCount: run.steps.length,
    currentStep: toRunStep(run.steps, run.currentStep, parts),
    steps: run.steps.map((s) => toRunStep(run.steps, s.id, parts)!),
    finding: run.finding,
    results: results.filter((r) => !r.undone).map((r) => toResultDto(r, run)),
    startedAt: run.startedAt.toISOString(),
    updatedAt: run.updatedAt.toISOString(),
  };
}

async function jobFor(m: EntityManager, user: SignedInUser, jobId: number, lock: boolean): Promise<Job> {
  const jobs = m.withRepository(JobRepository);
  return ownJobOr404(user, lock ? await jobs.lockById(jobId) : await jobs.findOneBy({ id: jobId }), jobId);
}

/** Only the job's owner answers steps (an admin may look, not measure). */
function ownerOnly(user: SignedInUser, job: Job) {
  if (job.ownerId !== user.id)
    throw new AppError(403, 'not_job_owner', 'Only the technician who owns this job can record its results.');
  if (job.status === 'closed') throw AppError.conflict('This job is closed. Reopen it to run a plan.');
}

export async function startRun(user: SignedInUser, jobId: number, planId: number): Promise<RunDto> {
  return AppDataSource.transaction(async (m) => {
    const job = await jobFor(m, user, jobId, true);
    ownerOnly(user, job);
    const plan = await m.withRepository(PlanRepository).findOneBy({ id: planId, status: 'published' });
    if (!plan)
      throw AppError.unprocessable(`No published plan with id ${planId}.`, [
        { path: 'planId', message: 'No such plan' },
      ]);
    if (plan.modelId !== null && plan.modelId !== job.modelId)
      throw AppError.unprocessable('This plan is for another model.', [
        { path: 'planId', message: 'Plan is for another model' },
      ]);
    const parts = await jobModelParts(job.modelId);
    if (job.modelId !== null && plan.modelId === null) {
      const problems = fitProblems(plan.steps, parts.components, false);
      if (problems.length) throw AppError.unprocessable(problems[0].message, problems);
    }
    const runs = m.withRepository(PlanRunRepository);
    const run = await runs.save(
      runs.create({
        jobId,
        planId: plan.id,
        planVersion: plan.version,
        title: plan.title,
        symptom: plan.symptom,
        system: plan.system,
        steps: plan.steps,
        currentStep: plan.steps[0].id,
        status: 'active',
        finding: null,
      }),
    );
    return toRunDto(run, [], parts);
  });
}

export async function getRun(user: SignedInUser, jobId: number, runId: number): Promise<RunDto> {
  const job = await jobFor(AppDataSource.manager, user, jobId, false);
  const run = await PlanRunRepository.findOneBy({ id: runId, jobId });
  if (!run) throw AppError.notFound('run', runId);
  return toRunDto(run, await PlanRunResultRepository.listFor([run.id]), await jobModelParts(job.modelId));
}

export async function listRuns(user: SignedInUser, jobId: number): Promise<RunDto[]> {
  const job = await jobFor(AppDataSource.manager, user, jobId, false);
  const runs = await PlanRunRepository.listForJob(jobId);
  const results = await PlanRunResultRepository.listFor(runs.map((r) => r.id));
  const parts = await jobModelParts(job.modelId);
  return runs.map((run) =>
    toRunDto(
      run,
      results.filter((r) => r.runId === run.id),
      parts,
    ),
  );
}

/** The answer to a result: `results` are the run's results with `result` among them. */
function answerOf(
  run: PlanRun,
  results: PlanRunResult[],
  result: PlanRunResult,
  reading: Reading | null,
  parts: JobModelParts,
): RunAnswerDto {
  const dto = toRunDto(run, results, parts);
  return {
    judged: toResultDto(result, run),
    reading: reading ? toReadingDto(reading, reading.specVersion) : null,
    next: dto.currentStep,
    finding: dto.finding,
    run: dto,
  };
}

async function lockRun(m: EntityManager, user: SignedInUser, jobId: number, runId: number) {
  const job = await jobFor(m, user, jobId, true);
  ownerOnly(user, job);
  const run = await m.withRepository(PlanRunRepository).lockOnJob(runId, jobId);
  if (!run) throw AppError.notFound('run', runId);
  return { job, run, parts: await jobModelParts(job.modelId) };
}

export async function answerStep(
  user: SignedInUser,
  jobId: number,
  runId: number,
  body: RunResultBody,
  request: { key?: string; hash: string },
): Promise<RunAnswerDto & { created: boolean }> {
  const idempotencyKey = request.key ?? randomUUID();
  return AppDataSource.transaction(async (m) => {
    const { run, parts } = await lockRun(m, user, jobId, runId);
    const results = m.withRepository(PlanRunResultRepository);
    const readings = m.withRepository(ReadingRepository);
    // Read once under the run's lock: the replay check, a re-answered step's old reading and the answer.
    const earlier = await results.listFor([runId]);
    const seen = earlier.find((r) => r.idempotencyKey === idempotencyKey);
    if (seen) {
      assertSameRequest(seen.requestHash, request.hash, 'result on this run');
      const reading = seen.readingId ? await readings.findOneBy({ id: seen.readingId }) : null;
      return { ...answerOf(run, earlier, seen, reading, parts), created: false };
    }
    // The step's reading is kept under the same key: a key already spent on this job (a reading,
    // or another run's result) is another request, refused before anything is written.
    if (await readings.findByKey(jobId, idempotencyKey))
      throw new AppError(
        422,
        'idempotency_key_reused',
        'This Idempotency-Key was already used for another request on this job. Send a new key with a new result.',
      );
    if (run.status === 'concluded')
      throw AppError.conflict('This run has reached its finding. Go back a step to change it.');
    if (body.stepId !== run.currentStep)
      throw AppError.conflict(`The run is at step "${run.currentStep}", not "${body.stepId}".`, {
        currentStep: run.currentStep,
      });
    const step = run.steps.find((s) => s.id === run.currentStep)!;
    const judged = await judgeStep(step, body, parts);
    const reading = judged.reading
      ? await keepReading(m, jobId, earlier, step.id, judged.reading, idempotencyKey)
      : null;
    const saved = await results.save(
      results.create({
        runId,
        stepId: step.id,
        outcome: judged.outcome,
        verdict: judged.verdict,
        reason: judged.reason,
        readingId: reading?.id ?? null,
        skipReason: body.skipReason ?? null,
        idempotencyKey,
        requestHash: request.hash,
        undone: false,
      }),
    );
    const target = targetFor(step, judged.outcome);
    if ('step' in target) Object.assign(run, { currentStep: target.step, status: 'active', finding: null });
    else
      Object.assign(run, { currentStep: null, status: 'concluded', finding: { ...target.finding, stepId: step.id } });
    // Only the columns that move (save() would read the row back first to compare).
    run.updatedAt = new Date();
    const { currentStep, status, finding, updatedAt } = run;
    await m.withRepository(PlanRunRepository).update(run.id, { currentStep, status, finding, updatedAt });
    return { ...answerOf(run, [...earlier, saved], saved, reading, parts), created: true };
  });
}

/**
 * Saves the step's reading on the job; a step answered again after going back re-takes its
 * old reading (the newest undone result of the step in the run's `earlier` results).
 */
async function keepReading(
  m: EntityManager,
  jobId: number,
  earlier: PlanRunResult[],
  stepId: string,
  reading: NonNullable<Awaited<ReturnType<typeof judgeStep>>['reading']>,
  idempotencyKey: string,
): Promise<Reading> {
  const readings = m.withRepository(ReadingRepository);
  const saved = await readings.save({ ...reading, jobId, idempotencyKey, supersededBy: null, takenAt: new Date() });
  const old = [...earlier].reverse().find((r) => r.stepId === stepId && r.undone && r.readingId !== null);
  if (old) {
    const previous = await readings.findOneBy({ id: old.readingId! });
    if (previous && previous.supersededBy === null) await readings.markSuperseded(previous.id, saved.id);
  }
  return saved;
}

/** Goes back one step: the last result is marked undone (kept), the run waits at that step again. */
export async function stepBack(user: SignedInUser, jobId: number, runId: number): Promise<RunDto> {
  return AppDataSource.transaction(async (m) => {
    const { run, parts } = await lockRun(m, user, jobId, runId);
    const results = m.withRepository(PlanRunResultRepository);
    const live = (await results.listFor([runId])).filter((r) => !r.undone);
    const last = live.at(-1);
    if (!last) throw AppError.conflict('The run is at its first step.');
    await results.update(last.id, { undone: true });
    Object.assign(run, { currentStep: last.stepId, status: 'active', finding: null });
    await m.withRepository(PlanRunRepository).save(run);
    return toRunDto(run, await results.listFor([runId]), parts);
  });
}
