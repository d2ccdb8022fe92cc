/** The plan library: list / read (public), the editors' writes, revisions, the plan file, and bad plans (422 naming the step). */
import { readFileSync } from 'fs';
import { join } from 'path';
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { expectProblem } from '../helpers/problems';
import { modelIdOf, smallPlan, step } from '../helpers/plans';

useTestDatabase();
const app = createApp({ webDist: null });
const editor = () => authHeader('editor', 'plans-editor');

describe('GET /api/plans', () => {
  it('lists the generic no-spark plan for a model that has its components, and not for one that lacks them', async () => {
    const moorland = await modelIdOf('650 Moorland', 2014);
    const urban = await modelIdOf('125 Urban', 2018);
    const forMoorland = await request(app).get(`/api/plans?modelId=${moorland}`).expect(200);
    const forUrban = await request(app).get(`/api/plans?modelId=${urban}`).expect(200);
    const titles = (r: request.Response) => r.body.map((p: { title: string }) => p.title);
    expect(titles(forMoorland)).toContain('No spark on one or all cylinders');
    expect(titles(forMoorland)).not.toContain('Fuel pump does not prime');
    expect(titles(forUrban)).not.toContain('No spark on one or all cylinders');
  });

  it('when q is "no spark", answers the no-spark plan first', async () => {
    const res = await request(app).get('/api/plans?q=no%20spark').expect(200);
    expect(res.body[0]).toMatchObject({ title: 'No spark on one or all cylinders', system: 'ignition', modelId: null });
  });

  it('filters by system, and refuses an unknown system with 400', async () => {
    const res = await request(app).get('/api/plans?system=charging').expect(200);
    expect(res.body.length).toBeGreaterThan(0);
    expect(res.body.every((p: { system: string }) => p.system === 'charging')).toBe(true);
    expectProblem(await request(app).get('/api/plans?system=brakes'), 400, 'validation_failed');
  });

  it('demo plans: one per system, each of at least 8 steps', async () => {
    const demoTitles = new Set(
      JSON.parse(readFileSync(join(__dirname, '../../data/demo-plans.json'), 'utf8')).plans.map(
        (p: { title: string }) => p.title,
      ),
    );
    const res = await request(app).get('/api/plans').expect(200);
    const demo = res.body.filter((p: { title: string }) => demoTitles.has(p.title));
    expect(demo).toHaveLength(demoTitles.size);
    expect(demo.map((p: { system: string }) => p.system).sort()).toEqual([
      'charging',
      'fuel',
      'ignition',
      'lighting',
      'starting',
    ]);
    expect(demo.every((p: { stepCount: number }) => p.stepCount >= 8)).toBe(true);
  });
});

describe('GET /api/plans/:id', () => {
  it('answers one plan with its steps to anyone', async () => {
    const [first] = (await request(app).get('/api/plans?q=no%20spark')).body;
    const res = await request(app).get(`/api/plans/${first.id}`).expect(200);
    expect(res.body.steps.map((s: { id: string }) => s.id).slice(0, 3)).toEqual(['battery', 'fuses', 'coil-supply']);
  });

  it('answers 404 for a missing plan and 400 for a bad id', async () => {
    expectProblem(await request(app).get('/api/plans/999999'), 404, 'not_found');
    expectProblem(await request(app).get('/api/plans/abc'), 400, 'validation_failed');
  });
});

describe('POST /api/plans', () => {
  it('refuses anonymous (401) and contributors (403)', async () => {
    expectProblem(await request(app).post('/api/plans').send(smallPlan('Anon')), 401, 'unauthorized');
    const res = await request(app)
      .post('/api/plans')
      .set(await authHeader('contributor'))
      .send(smallPlan('Contrib'));
    expectProblem(res, 403, 'forbidden');
  });

  it('creates a plan for an editor (201 + Location, version 1, one revision)', async () => {
    const res = await request(app)
      .post('/api/plans')
      .set(await editor())
      .send(smallPlan('Created plan'))
      .expect(201);
    expect(res.headers.location).toBe(`/api/plans/${res.body.id}`);
    expect(res.body).toMatchObject({ version: 1, stepCount: 2, modelId: null });
    const revs = await request(app)
      .get(`/api/plans/${res.body.id}/revisions`)
      .set(await editor())
      .expect(200);
    expect(revs.body).toHaveLength(1);
  });

  it('refuses a malformed plan with 400 naming the field', async () => {
    const res = await request(app)
      .post('/api/plans')
      .set(await editor())
      .send({ ...smallPlan('Bad'), system: 'brakes' });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors).toContainEqual(expect.objectContaining({ path: 'system' }));
  });

  it.each([
    [
      'a loop',
      [
        step('a', { pass: { step: 'b' }, fail: { step: 'b' } }),
        step('b', { pass: { step: 'a' }, fail: { step: 'a' } }),
      ],
      'steps.1.next',
      /"b" leads back to "a"/,
    ],
    [
      'a missing step',
      [step('a', { pass: { step: 'nowhere' }, fail: { finding: { part: 'x', advice: 'y' } } })],
      'steps.0.next.pass.step',
      /missing step "nowhere"/,
    ],
    [
      'an outcome with no branch',
      [step('a', { pass: { finding: { part: 'x', advice: 'y' } } })],
      'steps.0.next.fail',
      /does not say what follows "fail"/,
    ],
  ])('refuses %s with 422 naming the step', async (_what, steps, path, message) => {
    const res = await request(app)
      .post('/api/plans')
      .set(await editor())
      .send(smallPlan('Bad graph', { steps }));
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toContainEqual({ path, message: expect.stringMatching(message) });
  });

  it('refuses a model plan that names a component or parameter the model lacks (422 naming the step)', async () => {
    const modelId = await modelIdOf('650 Moorland', 2014);
    const steps = [
      step(
        'coil',
        { pass: { step: 'pump' }, fail: { finding: { part: 'coil', advice: 'Replace' } } },
        {
          check: { kind: 'spec', component: 'Ignition coil', parameter: 'Tertiary winding resistance' },
        },
      ),
      step(
        'pump',
        { pass: { finding: { part: 'x', advice: 'y' } }, fail: { finding: { part: 'pump', advice: 'Replace' } } },
        {
          check: { kind: 'spec', component: 'Fuel pump', parameter: 'Motor resistance' },
        },
      ),
    ];
    const res = await request(app)
      .post('/api/plans')
      .set(await editor())
      .send(smallPlan('Wrong parts', { modelId, steps }));
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toEqual([
      'steps.0.check.parameter',
      'steps.1.check.component',
    ]);
    expect(res.body.errors[1].message).toMatch(/Step "pump" names a component the model lacks: "Fuel pump"/);
  });
});

describe('PATCH /api/plans/:id', () => {
  it('writes a new version with a reason, keeps the fields left out, and answers 409 when stale', async () => {
    const created = (
      await request(app)
        .post('/api/plans')
        .set(await editor())
        .send(smallPlan('To edit'))
    ).body;
    const res = await request(app)
      .patch(`/api/plans/${created.id}`)
      .set(await editor())
      .send({ version: 1, reason: 'Clearer symptom', symptom: 'Clearer' })
      .expect(200);
    expect(res.body).toMatchObject({ version: 2, symptom: 'Clearer', title: 'To edit', stepCount: 2 });
    const stale = await request(app)
      .patch(`/api/plans/${created.id}`)
      .set(await editor())
      .send({ version: 1, reason: 'Late', symptom: 'Other' });
    expectProblem(stale, 409, 'conflict');
    expect(stale.body.current.version).toBe(2);
    const revs = await request(app)
      .get(`/api/plans/${created.id}/revisions`)
      .set(await editor())
      .expect(200);
    expect(revs.body[0]).toMatchObject({ version: 2, reason: 'Clearer symptom', changedFields: ['symptom'] });
  });

  it('refuses a reason-less edit (400), contributors (403) and a missing plan (404)', async () => {
    expectProblem(
      await request(app)
        .patch('/api/plans/1')
        .set(await editor())
        .send({ version: 1 }),
      400,
    );
    const c = await request(app)
      .patch('/api/plans/1')
      .set(await authHeader('contributor'))
      .send({ version: 1, reason: 'x' });
    expectProblem(c, 403, 'forbidden');
    expectProblem(
      await request(app)
        .patch('/api/plans/999999')
        .set(await editor())
        .send({ version: 1, reason: 'x' }),
      404,
    );
  });
});

describe('the plan file', () => {
  it('exports the library plans and connectors, and importing the export again changes nothing', async () => {
    const file = await request(app)
      .get('/api/plans/export.json')
      .set(await editor())
      .expect(200);
    expect(file.body.format).toBe('specbench-plans/1');
    expect(file.body.connectors.length).toBeGreaterThanOrEqual(10);
    const again = await request(app)
      .post('/api/plans/import')
      .set(await editor())
      .send(file.body)
      .expect(200);
    expect(again.body).toMatchObject({ created: 0, updated: 0, unchanged: file.body.plans.length });
  });

  it('locates a bad plan in the file by its JSON path, and writes nothing', async () => {
    const bad = smallPlan('Imported bad', { steps: [step('a', { pass: { step: 'zz' }, fail: { step: 'a' } })] });
    const res = await request(app)
      .post('/api/plans/import')
      .set(await editor())
      .send({ format: 'specbench-plans/1', plans: [smallPlan('Imported good'), bad] });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors[0].path).toBe('plans.1.steps.0.next.pass.step');
    const list = await request(app).get('/api/plans?q=imported').expect(200);
    expect(list.body).toEqual([]);
  });
});

describe('PUT /api/components/:id/connector', () => {
  const face = {
    rows: 1,
    columns: 2,
    numbering: 'left-to-right',
    view: 'harness',
    key: 'top',
    pins: [
      { number: 1, name: 'Signal', wire: 'white/red' },
      { number: 2, name: 'Ground', wire: null },
    ],
  };
  const someComponent = async () => (await AppDataSource.query('SELECT id FROM components ORDER BY id LIMIT 1'))[0].id;

  it('sets and removes a component connector for an editor', async () => {
    const id = await someComponent();
    const res = await request(app)
      .put(`/api/components/${id}/connector`)
      .set(await editor())
      .send({ connector: face });
    expect(res.status).toBe(200);
    expect(res.body.connector.pins).toHaveLength(2);
    await request(app)
      .put(`/api/components/${id}/connector`)
      .set(await editor())
      .send({ connector: null })
      .expect(200);
  });

  it('refuses a pin beyond rows × columns (400), contributors (403), a missing component (404)', async () => {
    const id = await someComponent();
    const bad = { ...face, pins: [{ number: 3, name: 'X', wire: null }] };
    const res = await request(app)
      .put(`/api/components/${id}/connector`)
      .set(await editor())
      .send({ connector: bad });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors[0].path).toBe('connector.pins');
    const c = await request(app)
      .put(`/api/components/${id}/connector`)
      .set(await authHeader('contributor'))
      .send({ connector: face });
    expectProblem(c, 403, 'forbidden');
    expectProblem(
      await request(app)
        .put('/api/components/999999/connector')
        .set(await editor())
        .send({ connector: face }),
      404,
    );
  });
});
