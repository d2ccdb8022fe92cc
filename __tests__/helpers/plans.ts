/** Rows and bodies for the plan API tests: demo models by name, a small valid plan, a job on a model. */
import request from 'supertest';
import type { Express } from 'express';
import type { PlanBody } from '@/lib/contracts/plans';
import { step } from './plan-step';
import { AppDataSource } from '@/server/db/data-source';
import { authHeader } from './auth';

export async function modelIdOf(name: string, yearFrom: number): Promise<number> {
  const [row] = await AppDataSource.query('SELECT id FROM vehicle_models WHERE name = ? AND year_from = ?', [
    name,
    yearFrom,
  ]);
  return row.id;
}

export { step } from './plan-step';

const finding = (part: string) => ({ finding: { part, advice: `Replace the ${part}.` } });

/** Two steps: a typed-limits check, then a pass / fail qualitative check. */
export function smallPlan(title: string, over: Partial<PlanBody> = {}): PlanBody {
  return {
    title,
    symptom: 'Test symptom',
    system: 'ignition',
    modelId: null,
    status: 'published',
    citation: { title: 'Test notes (invented)' },
    steps: [
      step('first', { pass: { step: 'second' }, fail: finding('first part') }),
      step(
        'second',
        { pass: finding('nothing'), fail: finding('second part') },
        { check: { kind: 'qualitative', test: 'spark', expected: 'A spark' } },
      ),
    ],
    ...over,
  };
}

export async function jobOn(app: Express, modelId: number | undefined, who = 'plans-tech') {
  const res = await request(app)
    .post('/api/jobs')
    .set(await authHeader('contributor', who))
    .send(modelId ? { modelId } : { machineLabel: 'Unlisted machine' });
  expect(res.status).toBe(201);
  return res.body.id as number;
}
