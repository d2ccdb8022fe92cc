/**
 * Judging a reading onto a job. The verdict is the shared engine's, the limits and the
 * spec version are kept with it, and an Idempotency-Key makes a resent reading (a
 * flaky connection, an offline queue flushing twice) land exactly once.
 */
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { CHECK_KIND_MODE, MEASUREMENT_MODE_LABEL } from '@/lib/contracts/enums';
import type { ReadingBody, ReadingCheck, ReadingDto } from '@/lib/contracts/jobs';
import { defaultMode } from '@/lib/specs/classify';
import { unitKind, type CanonicalUnit } from '@/lib/units';
import { checkValue, evaluateCheck } from '@/lib/verdict';
import { writeTransaction } from '@/server/db/deadlock-retry';
import { AppError } from '@/server/errors/app-error';
import { assertSameRequest } from './request-hash';
import type { SignedInUser } from '@/server/auth/roles';
import { judge, toVerdictInput } from '../verdicts/verdict.service';
import type { Job } from './job.entity';
import type { Reading } from './reading.entity';
import { ownJobOr404 } from './job-access';
import { citationText } from '@/lib/format/citation';
import { toReadingDto } from './job.mapper';
import { JobRepository, ReadingRepository, specForReading } from './job.repository';

export type AddedReading = { reading: ReadingDto; created: boolean };

/** What a saved reading records of its judgement, whichever kind of reading it was. */
type Judged = Pick<
  Reading,
  | 'specVersion'
  | 'label'
  | 'componentName'
  | 'specLimits'
  | 'value'
  | 'unit'
  | 'expandedUncertainty'
  | 'conformanceProbability'
  | 'verdict'
  | 'reason'
  | 'steps'
  | 'zones'
>;

async function describeSpec(m: EntityManager, specId: number) {
  const spec = await specForReading(m, specId);
  if (!spec) throw AppError.notFound('spec', specId);
  const citation = spec.source ? citationText(spec.source, spec.sourcePage) : null;
  return { spec, label: spec.parameter, componentName: spec.component.name, citation };
}

/** A meter value: the shared engine, against the spec by id or the limits sent. */
async function judgeMeasured(m: EntityManager, body: ReadingBody): Promise<Judged> {
  const { input, specVersion } = await toVerdictInput({ ...body, reading: body.reading! });
  const result = judge(input);
  const about =
    body.specId !== undefined
      ? await describeSpec(m, body.specId)
      : { label: body.label!, componentName: '', citation: null };
  return {
    specVersion: specVersion ?? null,
    label: about.label,
    componentName: about.componentName,
    specLimits: { ...input.spec, citation: about.citation },
    value: result.value,
    unit: result.unit,
    expandedUncertainty: result.expandedUncertainty,
    conformanceProbability: result.conformanceProbability,
    verdict: result.verdict,
    reason: result.reason,
    steps: result.steps,
    zones: result.zones,
  };
}

/**
 * A beep-only check: against a library spec read in that check's mode (a diode spec takes a
 * diode check, a continuity spec a continuity check), or described by its label alone.
 */
async function judgeCheck(m: EntityManager, body: ReadingBody, check: ReadingCheck): Promise<Judged> {
  const mode = CHECK_KIND_MODE[check.kind];
  let about: { label: string; componentName: string; citation: string | null } = {
    label: body.label!,
    componentName: '',
    citation: null,
  };
  let limits: Record<string, unknown> = { unit: '', mode };
  let specVersion: number | null = null;
  if (body.specId !== undefined) {
    const described = await describeSpec(m, body.specId);
    const { spec } = described;
    const specMode = spec.mode ?? defaultMode(spec.parameter, unitKind(spec.unit as CanonicalUnit));
    if (specMode !== mode) {
      const message = `This spec is read on ${specMode ? MEASUREMENT_MODE_LABEL[specMode] : 'its own range'}, not ${MEASUREMENT_MODE_LABEL[mode]}: type the meter reading instead.`;
      throw AppError.unprocessable(message, [{ path: 'check.kind', message }]);
    }
    about = described;
    limits = { min: spec.min, nominal: spec.nominal, max: spec.max, unit: spec.unit, mode };
    specVersion = spec.version;
  }
  const result = evaluateCheck(check);
  return {
    specVersion,
    label: about.label,
    componentName: about.componentName,
    specLimits: { ...limits, citation: about.citation },
    value: checkValue(check),
    unit: '',
    expandedUncertainty: null,
    conformanceProbability: null,
    verdict: result.verdict,
    reason: result.reason,
    steps: result.steps,
    zones: {},
  };
}

async function lockOpenJob(m: EntityManager, user: SignedInUser, jobId: number): Promise<Job> {
  const job = ownJobOr404(user, await m.withRepository(JobRepository).lockById(jobId), jobId);
  if (job.status === 'closed') throw AppError.conflict('This job is closed. Reopen it to add readings.');
  return job;
}

/** The reading stored under this key answers again, but only for the same request body. */
function replay(existing: Reading, hash: string): AddedReading {
  assertSameRequest(existing.requestHash, hash, 'reading on this job');
  return { reading: toReadingDto(existing, existing.specVersion), created: false };
}

/** `hash`: requestHash() of the body as sent, kept beside the key. */
export async function addReading(
  user: SignedInUser,
  jobId: number,
  body: ReadingBody,
  request: { key: string | undefined; hash: string },
): Promise<AddedReading> {
  const idempotencyKey = request.key ?? randomUUID();
  try {
    return await writeTransaction(async (m) => {
      await lockOpenJob(m, user, jobId);
      const readings = m.withRepository(ReadingRepository);
      const existing = await readings.findByKey(jobId, idempotencyKey);
      if (existing) return replay(existing, request.hash);
      const judged = body.check ? await judgeCheck(m, body, body.check) : await judgeMeasured(m, body);
      const saved = await readings.save({
        ...judged,
        jobId,
        specId: body.specId ?? null,
        inputs: { ...body, label: undefined, retakeOf: undefined, takenAt: undefined },
        idempotencyKey,
        requestHash: request.hash,
        supersededBy: null,
        takenAt: body.takenAt ? new Date(body.takenAt) : new Date(),
      });
      if (body.retakeOf !== undefined) await supersede(m, jobId, body.retakeOf, saved.id);
      return { reading: toReadingDto(saved, saved.specVersion), created: true };
    });
  } catch (err) {
    // Two copies of the same reading raced: the other one won; answer with it.
    if ((err as { code?: string; driverError?: { code?: string } }).driverError?.code !== 'ER_DUP_ENTRY') throw err;
    return replay(await ReadingRepository.getByKey(jobId, idempotencyKey), request.hash);
  }
}

async function supersede(m: EntityManager, jobId: number, oldId: number, newId: number) {
  const readings = m.withRepository(ReadingRepository);
  const old = await readings.findOnJob(oldId, jobId);
  if (!old)
    throw AppError.unprocessable(`Reading ${oldId} is not on this job.`, [
      { path: 'retakeOf', message: 'Not on this job' },
    ]);
  if (old.supersededBy !== null) throw AppError.conflict(`Reading ${oldId} has already been re-taken.`);
  await readings.markSuperseded(old.id, newId);
}
