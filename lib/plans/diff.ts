/**
 * What a proposed version of a test plan changes, step by step: the steps added, removed
 * and changed (matched by step id, with the fields that differ), whether the order moved,
 * and which of the plan's own fields (title, symptom, citation…) differ. Shown on the
 * proposal and on the editor's review, so nobody has to read two JSON documents side by side.
 */
import type { PlanBody, PlanStep } from '../contracts/plans';
import { sameJson } from '../format/canonical-json';

export const STEP_FIELDS = [
  'title',
  'instructions',
  'preconditions',
  'cautions',
  'testPoint',
  'check',
  'next',
] as const satisfies readonly (keyof PlanStep)[];
export type StepField = (typeof STEP_FIELDS)[number];

/** Plain words for each step field, as the review screen names them. */
export const STEP_FIELD_LABELS: Record<StepField, string> = {
  title: 'title',
  instructions: 'instructions',
  preconditions: 'before you start',
  cautions: 'cautions',
  testPoint: 'test point',
  check: 'check',
  next: 'where the outcomes lead',
};

export const PLAN_FIELDS = ['title', 'symptom', 'system', 'model', 'status', 'citation'] as const;
export type PlanField = (typeof PLAN_FIELDS)[number];
export const PLAN_FIELD_LABELS: Record<PlanField, string> = {
  title: 'title',
  symptom: 'symptom',
  system: 'system',
  model: 'model',
  status: 'published or draft',
  citation: 'source',
};

export type StepRef = { id: string; title: string };
export type PlanDiff = {
  added: StepRef[];
  removed: StepRef[];
  changed: (StepRef & { fields: StepField[] })[];
  /** The steps both versions share are in another order. */
  reordered: boolean;
  planFields: PlanField[];
};

/** The plan as compared: its fields (the model by id: the natural key is not compared) and its steps. */
export type ComparablePlan = Partial<Omit<PlanBody, 'steps'>> & { steps: PlanStep[] };

/** Empty lists are what the schema defaults to, so a step without `cautions` has none. */
const field = (s: PlanStep, f: StepField) => s[f] ?? (f === 'preconditions' || f === 'cautions' ? [] : undefined);

export function planDiff(before: ComparablePlan, after: ComparablePlan): PlanDiff {
  const old = new Map(before.steps.map((s) => [s.id, s]));
  const next = new Set(after.steps.map((s) => s.id));
  const ref = (s: PlanStep): StepRef => ({ id: s.id, title: s.title });
  const changed: PlanDiff['changed'] = [];
  for (const s of after.steps) {
    const was = old.get(s.id);
    const fields = was ? STEP_FIELDS.filter((f) => !sameJson(field(was, f), field(s, f))) : [];
    if (fields.length) changed.push({ ...ref(s), fields });
  }
  const shared = (steps: PlanStep[], keep: (id: string) => boolean) => steps.map((s) => s.id).filter(keep);
  return {
    added: after.steps.filter((s) => !old.has(s.id)).map(ref),
    removed: before.steps.filter((s) => !next.has(s.id)).map(ref),
    changed,
    reordered: !sameJson(
      shared(before.steps, (id) => next.has(id)),
      shared(after.steps, (id) => old.has(id)),
    ),
    planFields: PLAN_FIELDS.filter((f) =>
      f === 'model' ? !sameJson(before.modelId, after.modelId) : !sameJson(before[f], after[f]),
    ),
  };
}

export const isEmptyDiff = (d: PlanDiff) =>
  !d.added.length && !d.removed.length && !d.changed.length && !d.reordered && !d.planFields.length;
