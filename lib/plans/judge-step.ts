/**
 * A step's result judged with the shared engine: the pass / fail checks (continuity,
 * diode, spark, visual), an observation's choice, a skip, and — on the device — a measured
 * step against the limits the step uses there (lib/plans/step-reading.ts). The server
 * judges the same result again with the same rules (server/modules/plans/run-judge.ts);
 * on the device this says where the run goes while there is no signal.
 */
import type { PlanStep, RunResultBody, RunStepDto } from '../contracts/plans';
import { evaluateContinuity, evaluateDiode, evaluateReading, type QualitativeResult, type Verdict } from '../verdict';
import { isCanonicalUnit } from '../units';
import { verdictInputOf } from '../verdict/input';
import { allowedOutcomes } from './validate';
import { stepLimits, typedSpec } from './step-reading';

/** A result the step cannot take; `path` names the field of the result body. */
export class StepResultError extends Error {
  constructor(
    message: string,
    readonly path: string,
  ) {
    super(message);
  }
}

export type StepJudgement = { outcome: string; verdict: Verdict | null; reason: string };

/** A pass / fail check: continuity and diodes through the engine's rules, a spark or visual check as seen. */
export function qualitativeResult(step: PlanStep, body: Pick<RunResultBody, 'outcome' | 'diode'>): QualitativeResult {
  const check = step.check as Extract<PlanStep['check'], { kind: 'qualitative' }>;
  if (check.test === 'diode' && body.diode) return evaluateDiode(body.diode);
  const outcome = body.outcome;
  if (outcome !== 'pass' && outcome !== 'fail' && !(outcome === 'marginal' && check.test === 'diode'))
    throw new StepResultError(`Step "${step.id}" takes a pass or fail result.`, 'outcome');
  if (check.test === 'continuity') {
    const expected = !check.open;
    return evaluateContinuity({ continuity: outcome === 'pass' ? expected : !expected, expected });
  }
  const seen = outcome === 'pass' ? 'Seen' : outcome === 'marginal' ? 'Doubtful' : 'Not seen';
  return { verdict: outcome, reason: `${seen}: ${check.expected}.`, steps: [] };
}

/** An observation's choice, or a skip: not judged, only recorded. Null for a check that is judged. */
export function unjudgedResult(step: PlanStep, body: RunResultBody): StepJudgement | null {
  if (body.skipReason !== undefined) return { outcome: 'skip', verdict: null, reason: `Skipped: ${body.skipReason}` };
  const check = step.check;
  if (check.kind !== 'observation') return null;
  const choice = check.choices.find((c) => c.id === body.outcome);
  if (!choice)
    throw new StepResultError(
      `Step "${step.id}" takes one of: ${allowedOutcomes(check)
        .filter((o) => o !== 'skip')
        .join(', ')}.`,
      'outcome',
    );
  return { outcome: choice.id, verdict: null, reason: choice.label };
}

/** The whole judgement on the device, for a step as the run carries it (with its spec on this machine). */
export function judgeOnDevice(step: RunStepDto, body: RunResultBody): StepJudgement {
  const plain = unjudgedResult(step, body);
  if (plain) return plain;
  if (step.check.kind === 'qualitative') {
    const r = qualitativeResult(step, body);
    return { outcome: r.verdict, verdict: r.verdict, reason: r.reason };
  }
  const reading = body.reading;
  if (!reading) throw new StepResultError(`Step "${step.id}" needs a reading.`, 'reading');
  const limits = stepLimits(step)?.spec ?? (reading.limits ? typedSpec(reading.limits) : null);
  if (!limits)
    throw new StepResultError(`Step "${step.id}" has no spec for this model: type the limits.`, 'reading.limits');
  const unit = (u: string, path: string) => {
    if (!isCanonicalUnit(u)) throw new StepResultError(`Not a unit: ${u}`, path);
    return u;
  };
  const { value, unit: readingUnit, limits: _typed, ...corrections } = reading;
  const input = verdictInputOf(limits, { ...corrections, reading: { value, unit: readingUnit } }, unit, 'reading.');
  const r = evaluateReading(input);
  return { outcome: r.verdict, verdict: r.verdict, reason: r.reason };
}
