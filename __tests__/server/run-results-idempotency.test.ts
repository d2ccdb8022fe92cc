/**
 * A step's result queued on a device is resent with its Idempotency-Key: the same body
 * answers the stored result again (200), another body under the same key is refused with
 * 422 idempotency_key_reused and changes nothing. Source: IETF draft "The Idempotency-Key
 * HTTP Header Field" (draft-ietf-httpapi-idempotency-key-header), "Error Handling"
 * (numbering from memory): a key reused with a different request payload → 422.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { expectProblem } from '../helpers/problems';
import { jobOn, modelIdOf } from '../helpers/plans';

useTestDatabase();
const app = createApp({ webDist: null });
const tech = () => authHeader('contributor', 'run-idem');
let keys = 0;
const newKey = () => `run-${Date.now().toString(36)}-${(keys += 1)}`;

async function started() {
  const jobId = await jobOn(app, await modelIdOf('650 Moorland', 2014), 'run-idem');
  const planId = (await request(app).get('/api/plans?q=no%20spark')).body[0].id;
  const res = await request(app)
    .post(`/api/jobs/${jobId}/runs`)
    .set(await tech())
    .send({ planId });
  expect(res.status).toBe(201);
  return { jobId, runId: res.body.id as number };
}

const post = async (jobId: number, runId: number, key: string, body: object) =>
  request(app)
    .post(`/api/jobs/${jobId}/runs/${runId}/results`)
    .set(await tech())
    .set('Idempotency-Key', key)
    .send(body);
const battery = (value: number) => ({ stepId: 'battery', reading: { value, unit: 'V' } });
const resultsWith = async (key: string) =>
  Number(
    (await AppDataSource.query('SELECT COUNT(*) AS n FROM plan_run_results WHERE idempotency_key = ?', [key]))[0].n,
  );

describe('POST /api/jobs/:jobId/runs/:runId/results with an Idempotency-Key', () => {
  it('the same body again answers 200 with the stored result, and stores nothing more', async () => {
    const { jobId, runId } = await started();
    const key = newKey();
    const first = await post(jobId, runId, key, battery(12.8));
    expect(first.status).toBe(201);
    const again = await post(jobId, runId, key, battery(12.8));
    expect(again.status).toBe(200);
    expect(again.body.judged).toEqual(first.body.judged);
    expect(await resultsWith(key)).toBe(1);
  });

  it('the same body with its keys in another order is the same request', async () => {
    const { jobId, runId } = await started();
    const key = newKey();
    await post(jobId, runId, key, battery(12.8));
    const reordered = { reading: { unit: 'V', value: 12.8 }, stepId: 'battery' };
    expect((await post(jobId, runId, key, reordered)).status).toBe(200);
  });

  it.each([
    ['another reading', battery(11.9)],
    ['another step', { stepId: 'fuses', outcome: 'pass' }],
    ['a skip instead', { stepId: 'battery', skipReason: 'No meter at hand' }],
  ])('reused with %s: 422 idempotency_key_reused, and the run is unchanged', async (_what, other) => {
    const { jobId, runId } = await started();
    const key = newKey();
    await post(jobId, runId, key, battery(12.8));
    const before = (
      await request(app)
        .get(`/api/jobs/${jobId}/runs/${runId}`)
        .set(await tech())
    ).body;
    const res = await post(jobId, runId, key, other);
    expectProblem(res, 422, 'idempotency_key_reused');
    expect(res.body.detail).toMatch(/Idempotency-Key/);
    const after = (
      await request(app)
        .get(`/api/jobs/${jobId}/runs/${runId}`)
        .set(await tech())
    ).body;
    expect(after.currentStep.id).toBe(before.currentStep.id);
    expect(after.results).toHaveLength(1);
    expect(await resultsWith(key)).toBe(1);
  });

  it('the same result sent three times at once is stored once', async () => {
    const { jobId, runId } = await started();
    const key = newKey();
    const answers = await Promise.all([1, 2, 3].map(() => post(jobId, runId, key, battery(12.8))));
    expect(answers.map((r) => r.status).sort()).toEqual([200, 200, 201]);
    expect(await resultsWith(key)).toBe(1);
  });

  it('a key already spent on this job (a reading, or another run) is refused with 422, not a server error', async () => {
    const { jobId, runId } = await started();
    const key = newKey();
    const reading = await request(app)
      .post(`/api/jobs/${jobId}/readings`)
      .set(await tech())
      .set('Idempotency-Key', key)
      .send({ label: 'battery at rest', spec: { min: 12.4, unit: 'V' }, reading: { value: 12.8, unit: 'V' } });
    expect(reading.status).toBe(201);
    expectProblem(await post(jobId, runId, key, battery(12.8)), 422, 'idempotency_key_reused');
    expect(await resultsWith(key)).toBe(0);

    const other = newKey();
    expect((await post(jobId, runId, other, battery(12.8))).status).toBe(201);
    const second = await request(app)
      .post(`/api/jobs/${jobId}/runs`)
      .set(await tech())
      .send({ planId: (await request(app).get('/api/plans?q=no%20spark')).body[0].id });
    expectProblem(await post(jobId, second.body.id, other, battery(12.8)), 422, 'idempotency_key_reused');
  });
});
