/**
 * Which way a run goes after a step. A verdict's outcome is its name; a 'marginal' with no
 * branch of its own follows 'fail' (a part at its limit is suspect: re-check it before
 * going on, common practice, no published source); a skipped step follows its 'skip'
 * branch or else 'pass' (the plan goes on in its order of work without condemning the part).
 */
import type { PlanStep, Target } from '../contracts/plans';

export function targetFor(step: PlanStep, outcome: string): Target {
  const direct = step.next[outcome];
  if (direct) return direct;
  if (outcome === 'marginal' && step.next.fail) return step.next.fail;
  if (outcome === 'skip' && step.next.pass) return step.next.pass;
  if (outcome === 'skip' && step.check.kind === 'observation') return Object.values(step.next)[0];
  throw new Error(`Step "${step.id}" has no branch for "${outcome}"`);
}

/** The step a target leads to, or null at a finding. */
export function stepAfter(steps: PlanStep[], step: PlanStep, outcome: string): PlanStep | null {
  const target = targetFor(step, outcome);
  if (!('step' in target)) return null;
  return steps.find((s) => s.id === target.step) ?? null;
}
