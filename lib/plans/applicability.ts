/**
 * Whether a plan fits a model. A step names components and parameters in words; a model's
 * component matches when its name is the same ignoring case and spacing, or the same
 * before a bracketed qualifier ("Ignition coil" matches "Ignition coil (rear)"). A generic
 * plan applies to every model that has each component its steps name; a parameter the
 * model lacks is not a refusal there: the step offers typed limits. A model-specific plan
 * must name only components and parameters its model has.
 */
import type { PlanProblem, PlanStep } from '../contracts/plans';

export type ModelParts = { id: number; name: string; specs: { id: number; parameter: string }[] }[];

const norm = (s: string) => s.toLowerCase().replace(/\s+/g, ' ').trim();
const base = (s: string) => norm(s).replace(/\s*\([^)]*\)\s*$/, '');

export function findComponent<C extends { name: string }>(name: string, components: C[]): C | null {
  const n = norm(name);
  return components.find((c) => norm(c.name) === n) ?? components.find((c) => base(c.name) === n) ?? null;
}

export function findSpec<S extends { parameter: string }>(parameter: string, specs: S[]): S | null {
  const p = norm(parameter);
  return specs.find((s) => norm(s.parameter) === p) ?? null;
}

/** The components a step names: its spec check's and its test point's. */
export function componentsOf(step: PlanStep): { name: string; path: string }[] {
  const names: { name: string; path: string }[] = [];
  if (step.check.kind === 'spec') names.push({ name: step.check.component, path: 'check.component' });
  if (step.testPoint.component) names.push({ name: step.testPoint.component, path: 'testPoint.component' });
  return names;
}

/**
 * The problems of running these steps on this model, each naming the step. `strict` (a
 * model-specific plan) also refuses a spec check whose parameter the model lacks; a generic
 * plan's step then offers the plan's or the technician's typed limits.
 */
export function fitProblems(steps: PlanStep[], parts: ModelParts, strict: boolean): PlanProblem[] {
  const problems: PlanProblem[] = [];
  steps.forEach((step, i) => {
    for (const { name, path } of componentsOf(step))
      if (!findComponent(name, parts))
        problems.push({
          path: `steps.${i}.${path}`,
          message: `Step "${step.id}" names a component the model lacks: "${name}".`,
        });
    const check = step.check;
    if (check.kind !== 'spec') return;
    const component = findComponent(check.component, parts);
    if (strict && component && !findSpec(check.parameter, component.specs))
      problems.push({
        path: `steps.${i}.check.parameter`,
        message: `Step "${step.id}": the model's ${component.name} has no spec "${check.parameter}".`,
      });
  });
  return problems;
}

/** Whether a generic plan applies to a model: it has every component the plan names. */
export function appliesTo(steps: PlanStep[], parts: ModelParts): boolean {
  return steps.every((s) => componentsOf(s).every(({ name }) => findComponent(name, parts)));
}
