/** Plan runs on a job: start (generic plans checked against the job's model), results judged on the server, branching to a finding. */
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { expectProblem } from '../helpers/problems';
import { jobOn, modelIdOf, smallPlan, step } from '../helpers/plans';

useTestDatabase();
const app = createApp({ webDist: null });
const tech = () => authHeader('contributor', 'plans-tech');

async function noSparkId(): Promise<number> {
  return (await request(app).get('/api/plans?q=no%20spark')).body[0].id;
}

async function startNoSpark() {
  const jobId = await jobOn(app, await modelIdOf('650 Moorland', 2014));
  const res = await request(app)
    .post(`/api/jobs/${jobId}/runs`)
    .set(await tech())
    .send({ planId: await noSparkId() });
  expect(res.status).toBe(201);
  return { jobId, run: res.body };
}

async function answer(jobId: number, runId: number, body: object, key: string) {
  return request(app)
    .post(`/api/jobs/${jobId}/runs/${runId}/results`)
    .set(await tech())
    .set('Idempotency-Key', key)
    .send(body);
}

describe('POST /api/jobs/:jobId/runs', () => {
  it('starts at the first step, with the model spec it judges against', async () => {
    const { run } = await startNoSpark();
    expect(run).toMatchObject({ status: 'active', finding: null, results: [] });
    expect(run.currentStep).toMatchObject({ id: 'battery', position: 0, spec: { min: 12.4, unit: 'V' } });
  });

  it('refuses a generic plan on a model that lacks its components, naming the step (422)', async () => {
    const jobId = await jobOn(app, await modelIdOf('125 Urban', 2018));
    const res = await request(app)
      .post(`/api/jobs/${jobId}/runs`)
      .set(await tech())
      .send({ planId: await noSparkId() });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors[0]).toMatchObject({
      path: 'steps.1.testPoint.component',
      message: expect.stringMatching(/Step "fuses"/),
    });
  });

  it("answers 401 signed out, 404 on someone else's job, 400 with no planId, 422 for a missing plan", async () => {
    const jobId = await jobOn(app, undefined);
    expectProblem(await request(app).post(`/api/jobs/${jobId}/runs`).send({ planId: 1 }), 401);
    const other = await request(app)
      .post(`/api/jobs/${jobId}/runs`)
      .set(await authHeader('contributor', 'plans-other'))
      .send({ planId: 1 });
    expectProblem(other, 404, 'not_found');
    expectProblem(
      await request(app)
        .post(`/api/jobs/${jobId}/runs`)
        .set(await tech())
        .send({}),
      400,
    );
    expectProblem(
      await request(app)
        .post(`/api/jobs/${jobId}/runs`)
        .set(await tech())
        .send({ planId: 999999 }),
      422,
    );
  });
});

describe('POST /api/jobs/:jobId/runs/:runId/results', () => {
  it('judges each reading on the server, keeps it on the job, and reaches the pickup coil finding', async () => {
    const { jobId, run } = await startNoSpark();
    const steps: [object, string][] = [
      [{ stepId: 'battery', reading: { value: 13.1, unit: 'V' } }, 'fuses'],
      [{ stepId: 'fuses', outcome: 'pass' }, 'coil-supply'],
      [{ stepId: 'coil-supply', reading: { value: 12.4, unit: 'V' } }, 'coil-primary'],
      [
        { stepId: 'coil-primary', reading: { value: 2.4, unit: 'Ω', leadResistance: { value: 0.2, unit: 'Ω' } } },
        'coil-secondary',
      ],
      [
        { stepId: 'coil-secondary', reading: { value: 22.5, unit: 'kΩ', seriesResistance: { value: 5, unit: 'kΩ' } } },
        'pickup',
      ],
    ];
    for (const [i, [body, next]] of steps.entries()) {
      const res = await answer(jobId, run.id, body, `nospark-${run.id}-${i}`);
      expect([res.status, res.body.judged?.verdict, res.body.next?.id]).toEqual([201, 'pass', next]);
    }
    const fail = await answer(
      jobId,
      run.id,
      { stepId: 'pickup', reading: { value: 1450, unit: 'Ω' } },
      `nospark-${run.id}-p`,
    );
    expect(fail.status).toBe(201);
    expect(fail.body).toMatchObject({
      judged: { stepId: 'pickup', verdict: 'fail' },
      next: null,
      finding: { part: 'Pickup coil', stepId: 'pickup' },
      run: { status: 'concluded' },
      reading: { verdict: 'fail', componentName: 'Pickup coil', value: 1450, unit: 'Ω' },
    });
    const job = await request(app)
      .get(`/api/jobs/${jobId}`)
      .set(await tech())
      .expect(200);
    expect(job.body.readings).toHaveLength(6);
    expect(job.body.counts).toEqual({ pass: 5, marginal: 0, fail: 1 });
    // The lead resistance was subtracted: 2.4 − 0.2 Ω.
    expect(
      job.body.readings.find((r: { label: string }) => r.label === 'Primary winding resistance').value,
    ).toBeCloseTo(2.2);
  });

  it('answers a resent result once (same Idempotency-Key → 200, same result, one reading)', async () => {
    const { jobId, run } = await startNoSpark();
    const body = { stepId: 'battery', reading: { value: 13.1, unit: 'V' } };
    const first = await answer(jobId, run.id, body, `resend-${run.id}`);
    const again = await answer(jobId, run.id, body, `resend-${run.id}`);
    expect([first.status, again.status]).toEqual([201, 200]);
    expect(again.body.judged.id).toBe(first.body.judged.id);
    // The replay is read back from the database; the first answer was built from what was written.
    expect(again.body).toEqual(first.body);
    const job = await request(app)
      .get(`/api/jobs/${jobId}`)
      .set(await tech());
    expect(job.body.readings).toHaveLength(1);
  });

  it('skips with a reason, goes back, and supersedes the old reading when the step is re-taken', async () => {
    const { jobId, run } = await startNoSpark();
    await answer(jobId, run.id, { stepId: 'battery', reading: { value: 13.1, unit: 'V' } }, `back-${run.id}-1`);
    const skipped = await answer(
      jobId,
      run.id,
      { stepId: 'fuses', skipReason: 'Fuses replaced this morning' },
      `back-${run.id}-2`,
    );
    expect(skipped.body).toMatchObject({
      judged: { outcome: 'skipped', skipReason: 'Fuses replaced this morning' },
      next: { id: 'coil-supply' },
    });
    await request(app)
      .post(`/api/jobs/${jobId}/runs/${run.id}/back`)
      .set(await tech())
      .expect(200);
    const back = await request(app)
      .post(`/api/jobs/${jobId}/runs/${run.id}/back`)
      .set(await tech())
      .expect(200);
    expect(back.body.currentStep.id).toBe('battery');
    await answer(jobId, run.id, { stepId: 'battery', reading: { value: 12.1, unit: 'V' } }, `back-${run.id}-3`);
    const job = await request(app)
      .get(`/api/jobs/${jobId}`)
      .set(await tech());
    const struck = job.body.readings.map((r: { value: number; supersededBy: number | null }) => [
      r.value,
      r.supersededBy !== null,
    ]);
    expect(struck.sort()).toEqual([
      [12.1, false],
      [13.1, true],
    ]);
  });

  it('refuses a result for a step the run is not at (409), and a reading for a qualitative step (422)', async () => {
    const { jobId, run } = await startNoSpark();
    const wrong = await answer(
      jobId,
      run.id,
      { stepId: 'pickup', reading: { value: 400, unit: 'Ω' } },
      `wrong-${run.id}-1`,
    );
    expectProblem(wrong, 409, 'conflict');
    await answer(jobId, run.id, { stepId: 'battery', reading: { value: 13.1, unit: 'V' } }, `wrong-${run.id}-2`);
    const bad = await answer(jobId, run.id, { stepId: 'fuses', reading: { value: 1, unit: 'Ω' } }, `wrong-${run.id}-3`);
    expectProblem(bad, 422, 'unprocessable');
  });

  it("lets only the job's owner answer: another contributor 404, an admin 403, anonymous 401; a bad body 400", async () => {
    const { jobId, run } = await startNoSpark();
    const url = `/api/jobs/${jobId}/runs/${run.id}/results`;
    const body = { stepId: 'battery', reading: { value: 13.1, unit: 'V' } };
    expectProblem(await request(app).post(url).send(body), 401);
    expectProblem(
      await request(app)
        .post(url)
        .set(await authHeader('contributor', 'plans-other'))
        .send(body),
      404,
    );
    expectProblem(
      await request(app)
        .post(url)
        .set(await authHeader('admin', 'plans-admin'))
        .send(body),
      403,
      'not_job_owner',
    );
    expectProblem(
      await request(app)
        .post(url)
        .set(await tech())
        .send({ stepId: 'battery' }),
      400,
      'validation_failed',
    );
  });

  it("offers typed limits when a generic plan step has no spec on the job's machine", async () => {
    const created = await request(app)
      .post('/api/plans')
      .set(await authHeader('editor', 'plans-editor'))
      .send(
        smallPlan('Typed limits plan', {
          steps: [
            step(
              'gap',
              {
                pass: { finding: { part: 'none', advice: 'ok' } },
                fail: { finding: { part: 'plug', advice: 'Replace' } },
              },
              {
                check: { kind: 'spec', component: 'Spark plug', parameter: 'Electrode gap' },
              },
            ),
          ],
        }),
      );
    const jobId = await jobOn(app, undefined);
    const run = (
      await request(app)
        .post(`/api/jobs/${jobId}/runs`)
        .set(await tech())
        .send({ planId: created.body.id })
    ).body;
    expect(run.currentStep.spec).toBeNull();
    const none = await answer(
      jobId,
      run.id,
      { stepId: 'gap', reading: { value: 0.7, unit: 'mm' } },
      `typed-${run.id}-1`,
    );
    expectProblem(none, 422, 'unprocessable');
    const typed = await answer(
      jobId,
      run.id,
      { stepId: 'gap', reading: { value: 1.2, unit: 'mm', limits: { min: 0.6, max: 0.8, unit: 'mm' } } },
      `typed-${run.id}-2`,
    );
    expect(typed.body).toMatchObject({ judged: { verdict: 'fail' }, finding: { part: 'plug' } });
  });
});

describe('GET /api/jobs/:jobId/runs/:runId', () => {
  it('resumes a run where it was left (another device reads the same state)', async () => {
    const { jobId, run } = await startNoSpark();
    await answer(jobId, run.id, { stepId: 'battery', reading: { value: 13.1, unit: 'V' } }, `resume-${run.id}`);
    const res = await request(app)
      .get(`/api/jobs/${jobId}/runs/${run.id}`)
      .set(await tech())
      .expect(200);
    expect(res.body).toMatchObject({ currentStep: { id: 'fuses' }, results: [{ stepId: 'battery', verdict: 'pass' }] });
    const list = await request(app)
      .get(`/api/jobs/${jobId}/runs`)
      .set(await tech())
      .expect(200);
    expect(list.body.map((r: { id: number }) => r.id)).toEqual([run.id]);
    expectProblem(
      await request(app)
        .get(`/api/jobs/${jobId}/runs/999999`)
        .set(await tech()),
      404,
    );
  });
});

describe('the model parts a run judges against', () => {
  it('follow an edit of the spec at once (the cache is dropped on a library change)', async () => {
    const editor = await authHeader('editor');
    const { run } = await startNoSpark();
    const spec = run.currentStep.spec;
    const edit = (version: number, min: number) =>
      request(app).patch(`/api/specs/${spec.id}`).set(editor).send({ version, reason: 'Cache check edit', min });
    const current = (await request(app).get(`/api/specs/${spec.id}`)).body;
    expect((await edit(current.version, 12.2)).status).toBe(200);
    try {
      const again = await startNoSpark();
      expect(again.run.currentStep.spec).toMatchObject({ id: spec.id, min: 12.2 });
    } finally {
      await edit(current.version + 1, spec.min).expect(200);
    }
    expect((await startNoSpark()).run.currentStep.spec.min).toBe(spec.min);
  });

  it("follow a connector edit at once: the step's test point shows the new face", async () => {
    const editor = await authHeader('editor');
    const { run } = await startNoSpark();
    // The battery step names no test-point component: its face is its spec's component's.
    const [{ id }] = await AppDataSource.query('SELECT component_id AS id FROM specs WHERE id = ?', [
      run.currentStep.spec.id,
    ]);
    const before = run.currentStep.connector;
    const face = {
      rows: 1,
      columns: 2,
      numbering: 'left-to-right',
      view: 'component',
      key: 'top',
      pins: [
        { number: 1, name: 'Plus', wire: 'red' },
        { number: 2, name: 'Minus', wire: 'black' },
      ],
    };
    const put = (connector: object | null) =>
      request(app).put(`/api/components/${id}/connector`).set(editor).send({ connector });
    expect((await put(face)).status).toBe(200);
    try {
      expect((await startNoSpark()).run.currentStep.connector).toMatchObject({ view: 'component', columns: 2 });
    } finally {
      await put(before).expect(200);
    }
    expect((await startNoSpark()).run.currentStep.connector).toEqual(before);
  });
});
