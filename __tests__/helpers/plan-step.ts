/** One plan step for tests (no database: the lib tests use it too): a typed-limits check by default. */
import type { PlanStep } from '@/lib/contracts/plans';

export const step = (id: string, next: PlanStep['next'], over: Partial<PlanStep> = {}): PlanStep => ({
  id,
  title: `Step ${id}`,
  instructions: 'Measure it.',
  preconditions: [],
  cautions: [],
  testPoint: { text: 'Across the terminals' },
  check: { kind: 'limits', limits: { min: 1, max: 2, unit: 'Ω' } },
  next,
  ...over,
});
