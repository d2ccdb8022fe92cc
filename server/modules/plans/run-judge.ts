/**
 * Judging one step's result with the shared verdict engine (lib/verdict), as a job reading
 * would be: a measured step against its library spec on the job's model or the typed limits,
 * a continuity or diode check through the engine's qualitative rules, a spark or visual check
 * as the technician's pass / fail. An observation and a skip are not judged.
 */
import type { VerdictBody } from '@/lib/contracts/verdicts';
import type { PlanStep, RunResultBody } from '@/lib/contracts/plans';
import { StepResultError, qualitativeResult, unjudgedResult } from '@/lib/plans/judge-step';
import { citationText } from '@/lib/format/citation';
import { AppError } from '@/server/errors/app-error';
import { judge, toVerdictInput } from '../verdicts/verdict.service';
import type { Reading } from '../jobs/reading.entity';
import { specOfStep, type JobModelParts } from './run-step';

export type Judged = {
  outcome: string;
  verdict: 'pass' | 'marginal' | 'fail' | null;
  reason: string;
  /** The reading to keep on the job, without its job, key and times. */
  reading: Omit<
    Reading,
    'id' | 'jobId' | 'job' | 'spec' | 'idempotencyKey' | 'supersededBy' | 'takenAt' | 'createdAt'
  > | null;
};

const refuse = (message: string, path: string) => AppError.unprocessable(message, [{ path, message }]);

async function judgeMeasured(step: PlanStep, body: RunResultBody, parts: JobModelParts): Promise<Judged> {
  if (!body.reading) throw refuse(`Step "${step.id}" needs a reading.`, 'reading');
  const { limits, ...reading } = body.reading;
  const { value, unit, ...corrections } = reading;
  const found = specOfStep(step, parts);
  const typed =
    limits ??
    (step.check.kind === 'limits' ? step.check.limits : step.check.kind === 'spec' ? step.check.limits : undefined);
  if (!found && !typed)
    throw refuse(`Step "${step.id}" has no spec for this model: type the limits.`, 'reading.limits');
  const verdictBody: VerdictBody = {
    ...corrections,
    reading: { value, unit },
    ...(found ? { specId: found.spec.id } : { spec: typed }),
  };
  const { input, specVersion } = await toVerdictInput(verdictBody, found?.spec);
  const r = judge(input);
  const citation = found?.spec.source ? citationText(found.spec.source, found.spec.sourcePage) : null;
  return {
    outcome: r.verdict,
    verdict: r.verdict,
    reason: r.reason,
    reading: {
      specId: found?.spec.id ?? null,
      // The run's own result row is the idempotency record (plan_run_results: run + key).
      requestHash: null,
      specVersion: specVersion ?? null,
      label: found ? found.spec.parameter : step.title,
      componentName: found?.component.name ?? '',
      specLimits: { ...input.spec, citation },
      inputs: { ...verdictBody, planStep: step.id },
      value: r.value,
      unit: r.unit,
      expandedUncertainty: r.expandedUncertainty,
      conformanceProbability: r.conformanceProbability,
      verdict: r.verdict,
      reason: r.reason,
      steps: r.steps,
      zones: r.zones,
    },
  };
}

/** The shared rules (lib/plans/judge-step.ts), their refusals as 422 naming the field. */
function shared<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof StepResultError) throw refuse(err.message, err.path);
    throw err;
  }
}

export async function judgeStep(step: PlanStep, body: RunResultBody, parts: JobModelParts): Promise<Judged> {
  const plain = shared(() => unjudgedResult(step, body));
  if (plain) return { ...plain, reading: null };
  const check = step.check;
  if (check.kind === 'spec' || check.kind === 'limits') return judgeMeasured(step, body, parts);
  if (check.kind !== 'qualitative') throw new Error(`unexpected check kind ${check.kind}`);
  const r = shared(() => qualitativeResult(step, body));
  return {
    outcome: r.verdict,
    verdict: r.verdict,
    reason: r.reason,
    reading: {
      specId: null,
      specVersion: null,
      requestHash: null,
      label: step.title,
      componentName: step.testPoint.component ?? '',
      specLimits: { expected: check.expected, test: check.test },
      inputs: { outcome: body.outcome, diode: body.diode, planStep: step.id },
      value: r.verdict === 'pass' ? 1 : 0,
      unit: '',
      expandedUncertainty: null,
      conformanceProbability: null,
      verdict: r.verdict,
      reason: r.reason,
      steps: r.steps,
      zones: {},
    },
  };
}
