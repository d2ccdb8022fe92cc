/**
 * Answering a test plan's step through the device's queue: the step is judged on the
 * device first (lib/plans/judge-step.ts), so with no signal the run still goes on by the
 * plan's rules (lib/plans/local-run.ts) while its results wait; each goes once, in order,
 * with its own Idempotency-Key, and the server's judgement replaces the device's.
 */
import { useState } from 'react';
import type { RunDto, RunResultBody, RunResultDto } from '../contracts/plans';
import { judgeOnDevice } from '../plans/judge-step';
import { withWaiting, type LocalRun } from '../plans/local-run';
import { useReadingQueue } from './use-reading-queue';

export type LastAnswer = { result: RunResultDto; where: 'server' | 'device' };

export function useRunAnswer(jobId: number, runId: number, run: RunDto | undefined) {
  const queue = useReadingQueue();
  const waiting = queue.resultsFor(runId);
  const local: LocalRun | undefined = run ? withWaiting(run, waiting) : undefined;
  const [sending, setSending] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const [last, setLast] = useState<LastAnswer | null>(null);

  const submit = async (body: Omit<RunResultBody, 'stepId'>) => {
    const step = local?.currentStep;
    if (!step) return;
    const full = { ...body, stepId: step.id } as RunResultBody;
    let judged;
    try {
      judged = judgeOnDevice(step, full);
    } catch (err) {
      // A result the step cannot take (StepResultError), or an input the engine refuses.
      setFailure(err instanceof Error ? err.message : String(err));
      return;
    }
    setSending(true);
    setFailure(null);
    try {
      const outcome = await queue.addResult({ jobId, runId, body: full, title: step.title, judged });
      if (outcome.status === 'sent') setLast({ result: outcome.answer.judged, where: 'server' });
      else if (outcome.status === 'rejected') setFailure(outcome.message);
      else
        setLast({
          where: 'device',
          result: {
            id: 0,
            stepId: step.id,
            title: step.title,
            outcome: judged.outcome === 'skip' ? 'skipped' : judged.outcome,
            verdict: judged.verdict,
            reason: judged.reason,
            readingId: null,
            skipReason: full.skipReason ?? null,
            createdAt: new Date().toISOString(),
          },
        });
    } finally {
      setSending(false);
    }
  };

  return {
    run: local,
    /** Results on this device only, and those the server refused (with its reason). */
    waiting: waiting.length,
    refused: queue.rejectedResultsFor(runId),
    dismiss: queue.dismiss,
    submit,
    sending,
    failure,
    last,
  };
}
