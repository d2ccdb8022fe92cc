/**
 * A run as the device shows it while some of its results wait for a connection: the
 * server's run, with each waiting result (judged on the device) applied in order by the
 * plan's own rules (lib/plans/branching.ts). Once the server has them, its run replaces this.
 */
import type { RunDto, RunResultDto } from '../contracts/plans';
import type { QueuedResult } from '../offline/reading-queue';
import { targetFor } from './branching';

export type LocalRun = RunDto & {
  /** How many of its results are on this device only. */
  waiting: number;
};

export function withWaiting(run: RunDto, waiting: QueuedResult[]): LocalRun {
  let current = run.currentStep;
  let finding = run.finding;
  let status = run.status;
  const results: RunResultDto[] = [...run.results];
  let applied = 0;
  for (const item of waiting) {
    // A result for another step than the one the run is at: it was for an older state; the server decides.
    if (!current || item.body.stepId !== current.id) break;
    const step = current;
    results.push({
      id: -(applied + 1),
      stepId: step.id,
      title: item.title,
      outcome: item.judged.outcome === 'skip' ? 'skipped' : item.judged.outcome,
      verdict: item.judged.verdict,
      reason: item.judged.reason,
      readingId: null,
      skipReason: item.body.skipReason ?? null,
      createdAt: item.queuedAt,
    });
    applied += 1;
    const target = targetFor(step, item.judged.outcome);
    if ('step' in target) {
      current = run.steps.find((s) => s.id === target.step) ?? null;
      status = 'active';
      finding = null;
    } else {
      current = null;
      status = 'concluded';
      finding = { ...target.finding, stepId: step.id };
    }
  }
  return { ...run, currentStep: current, finding, status, results, waiting: applied };
}
