/**
 * The graph rules of a test plan, beyond its shape (lib/contracts/plans.ts): step ids are
 * unique, every outcome a check can give leads somewhere, every target step exists, the
 * plan never loops (a run must end at a finding), and every step can be reached from the
 * first. Problems are located by the plan file's path ('steps.3.next.fail.step').
 */
import type { PlanProblem, PlanStep, StepCheck } from '../contracts/plans';

/** The outcomes a check can give; 'marginal' and 'skip' are optional (see branching.ts). */
export function requiredOutcomes(check: StepCheck): string[] {
  if (check.kind === 'observation') return check.choices.map((c) => c.id);
  return ['pass', 'fail'];
}

export function allowedOutcomes(check: StepCheck): string[] {
  if (check.kind === 'observation') return [...requiredOutcomes(check), 'skip'];
  return check.kind === 'qualitative' && check.test !== 'diode'
    ? ['pass', 'fail', 'skip']
    : ['pass', 'marginal', 'fail', 'skip'];
}

function outcomeProblems(step: PlanStep, i: number, ids: Set<string>): PlanProblem[] {
  const problems: PlanProblem[] = [];
  const at = `steps.${i}.next`;
  for (const o of requiredOutcomes(step.check))
    if (!step.next[o])
      problems.push({ path: `${at}.${o}`, message: `Step "${step.id}" does not say what follows "${o}".` });
  const allowed = allowedOutcomes(step.check);
  for (const [o, target] of Object.entries(step.next)) {
    if (!allowed.includes(o))
      problems.push({ path: `${at}.${o}`, message: `Step "${step.id}" cannot have the outcome "${o}".` });
    else if ('step' in target && !ids.has(target.step))
      problems.push({
        path: `${at}.${o}.step`,
        message: `Step "${step.id}" points to a missing step "${target.step}".`,
      });
  }
  return problems;
}

const targetsOf = (step: PlanStep) => Object.values(step.next).flatMap((t) => ('step' in t ? [t.step] : []));

/** The first step found on a cycle (depth-first, three colours), or null. */
function stepOnLoop(steps: PlanStep[]): { index: number; to: string } | null {
  const byId = new Map(steps.map((s) => [s.id, s]));
  const state = new Map<string, 'open' | 'done'>();
  const visit = (id: string): { index: number; to: string } | null => {
    state.set(id, 'open');
    const step = byId.get(id)!;
    for (const to of targetsOf(step)) {
      if (!byId.has(to)) continue;
      if (state.get(to) === 'open') return { index: steps.indexOf(step), to };
      if (!state.has(to)) {
        const found = visit(to);
        if (found) return found;
      }
    }
    state.set(id, 'done');
    return null;
  };
  for (const s of steps) {
    if (state.has(s.id)) continue;
    const found = visit(s.id);
    if (found) return found;
  }
  return null;
}

function unreachable(steps: PlanStep[]): number[] {
  const byId = new Map(steps.map((s) => [s.id, s]));
  const seen = new Set<string>();
  const queue = [steps[0].id];
  while (queue.length) {
    const id = queue.pop()!;
    if (seen.has(id) || !byId.has(id)) continue;
    seen.add(id);
    queue.push(...targetsOf(byId.get(id)!));
  }
  return steps.flatMap((s, i) => (seen.has(s.id) ? [] : [i]));
}

/** Every graph problem of a plan's steps; empty when the plan can be run. */
export function planProblems(steps: PlanStep[]): PlanProblem[] {
  if (steps.length === 0) return [{ path: 'steps', message: 'A plan needs at least one step.' }];
  const ids = new Set<string>();
  const problems: PlanProblem[] = [];
  steps.forEach((s, i) => {
    if (ids.has(s.id)) problems.push({ path: `steps.${i}.id`, message: `Two steps are called "${s.id}".` });
    ids.add(s.id);
  });
  steps.forEach((s, i) => problems.push(...outcomeProblems(s, i, ids)));
  const loop = stepOnLoop(steps);
  if (loop)
    problems.push({
      path: `steps.${loop.index}.next`,
      message: `Step "${steps[loop.index].id}" leads back to "${loop.to}": a plan must not loop.`,
    });
  else
    for (const i of unreachable(steps))
      problems.push({ path: `steps.${i}`, message: `Step "${steps[i].id}" is never reached from the first step.` });
  return problems;
}
