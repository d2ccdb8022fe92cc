import type { PlanStep } from '@/lib/contracts/plans';
import { isEmptyDiff, planDiff, type ComparablePlan } from '@/lib/plans/diff';
import { step as planStep } from '../helpers/plan-step';

const NEXT: PlanStep['next'] = {
  pass: { finding: { part: 'none', advice: 'Nothing to replace.' } },
  fail: { step: 'b' },
};
const step = (id: string, over: Partial<PlanStep> = {}) => planStep(id, NEXT, over);

const plan = (steps: PlanStep[], over: Partial<ComparablePlan> = {}): ComparablePlan => ({
  title: 'Weak spark',
  symptom: 'Misfire',
  system: 'ignition',
  modelId: null,
  status: 'published',
  citation: { title: 'Invented notes' },
  steps,
  ...over,
});

describe('planDiff', () => {
  it('when nothing differs, is empty', () => {
    const d = planDiff(plan([step('a'), step('b')]), plan([step('a'), step('b')]));
    expect(isEmptyDiff(d)).toBe(true);
  });

  it('matches steps by id: added, removed, and the changed fields of the rest', () => {
    const before = plan([step('a'), step('b'), step('c')]);
    const after = plan([
      step('a', { title: 'Coil primary', check: { kind: 'limits', limits: { min: 1, max: 3, unit: 'Ω' } } }),
      step('b'),
      step('d', { title: 'Plug cap' }),
    ]);
    expect(planDiff(before, after)).toEqual({
      added: [{ id: 'd', title: 'Plug cap' }],
      removed: [{ id: 'c', title: 'Step c' }],
      changed: [{ id: 'a', title: 'Coil primary', fields: ['title', 'check'] }],
      reordered: false,
      planFields: [],
    });
  });

  it('ignores the order of object keys and absent empty lists', () => {
    const a = step('a');
    const { preconditions: _p, cautions: _c, ...bare } = a;
    const shuffled = Object.fromEntries(Object.entries(bare).reverse()) as unknown as PlanStep;
    shuffled.next = { fail: a.next.fail, pass: a.next.pass };
    expect(isEmptyDiff(planDiff(plan([a]), plan([shuffled])))).toBe(true);
  });

  it('says when shared steps move, without calling them changed', () => {
    const d = planDiff(plan([step('a'), step('b')]), plan([step('b'), step('a')]));
    expect(d).toMatchObject({ reordered: true, changed: [], added: [], removed: [] });
  });

  it.each([
    ['title', { title: 'No spark' }],
    ['symptom', { symptom: 'Dies when warm' }],
    ['model', { modelId: 4 }],
    ['status', { status: 'draft' as const }],
    ['citation', { citation: { title: 'Invented notes', page: '3' } }],
  ])('names a changed plan field: %s', (field, over) => {
    expect(planDiff(plan([step('a')]), plan([step('a')], over)).planFields).toEqual([field]);
  });

  it('a changed outcome target is a change of "next"', () => {
    const d = planDiff(plan([step('a')]), plan([step('a', { next: { pass: { step: 'c' }, fail: { step: 'b' } } })]));
    expect(d.changed).toEqual([{ id: 'a', title: 'Step a', fields: ['next'] }]);
  });
});
