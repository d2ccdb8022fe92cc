import request from 'supertest';
import type { PlanBody, PlanStep } from '@/lib/contracts/plans';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { authHeader, testUser } from '../helpers/auth';
import { drainOutbox, useFakeMail } from '../helpers/mail';
import { modelIdOf, smallPlan, step } from '../helpers/plans';
import { expectProblem } from '../helpers/problems';
import { useTestDatabase } from '../helpers/test-db';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });

const citation = { title: 'Invented Service Bulletin SB-40', edition: 'Rev. 1', page: '3' };
const rationale = 'The bulletin adds a spark check after the coil.\nSecond line is detail.';
const editor = () => authHeader('editor', 'plan-reviewer');
let seq = 0;
/** A contributor of its own for each proposal, so the per-account proposal limit never bites. */
const proposer = () => `plan-proposer-${(seq += 1)}`;
const finding = (part: string) => ({ finding: { part, advice: `Replace the ${part}.` } });

async function createPlan(over: Partial<PlanBody> = {}) {
  const res = await request(app)
    .post('/api/plans')
    .set(await editor())
    .send(smallPlan(`Proposal target ${(seq += 1)}`, over));
  expect(res.status).toBe(201);
  return res.body as { id: number; version: number; title: string; steps: PlanStep[] };
}

/** The small plan with its first step retitled and a third step added after the second. */
function changedSteps(steps: PlanStep[]): PlanStep[] {
  const [first, second] = steps;
  return [
    { ...first, title: 'Coil primary, measured cold' },
    { ...second, next: { ...second.next, pass: { step: 'third' } } },
    step('third', { pass: finding('nothing'), fail: finding('plug cap') }, { title: 'Plug cap resistance' }),
  ];
}

async function propose(body: Record<string, unknown>, who = proposer()) {
  return request(app)
    .post('/api/corrections')
    .set(await authHeader('contributor', who))
    .send({ kind: 'plan_change', citation, rationale, ...body });
}

async function proposeChange(plan: { id: number; version: number; steps: PlanStep[] }, who = proposer()) {
  const res = await propose({ planId: plan.id, version: plan.version, plan: { steps: changedSteps(plan.steps) } }, who);
  expect(res.status).toBe(201);
  return res.body as { id: number };
}

const stored = async (planId: number) =>
  Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM corrections WHERE plan_id = ?', [planId]))[0].n);

describe('POST /api/corrections (plan_change)', () => {
  it('stores the proposal with its base version and shows which steps it adds and changes', async () => {
    const plan = await createPlan();
    const res = await propose({
      planId: plan.id,
      version: 1,
      plan: { title: plan.title, steps: changedSteps(plan.steps) },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'plan_change',
      status: 'pending',
      baseVersion: 1,
      modelId: null,
      modelTitle: null,
      stale: false,
      currentVersion: 1,
      plan: { id: plan.id, title: plan.title },
    });
    // Only what differs from the plan is kept: the unchanged title is not stored.
    expect(res.body.plan.proposed).toEqual({ steps: changedSteps(plan.steps) });
    expect(res.body.plan.changes).toEqual({
      added: [{ id: 'third', title: 'Plug cap resistance' }],
      removed: [],
      changed: [
        { id: 'first', title: 'Coil primary, measured cold', fields: ['title'] },
        { id: 'second', title: 'Step second', fields: ['next'] },
      ],
      reordered: false,
      planFields: ['citation'],
    });
  });

  it('lists the proposal for its proposer and in the editors’ pending queue', async () => {
    const plan = await createPlan();
    const who = proposer();
    const c = await proposeChange(plan, who);
    const mine = await request(app)
      .get('/api/corrections?mine=true')
      .set(await authHeader('contributor', who))
      .expect(200);
    expect(mine.body.map((x: { id: number }) => x.id)).toEqual([c.id]);
    const queue = await request(app)
      .get('/api/corrections?status=pending')
      .set(await editor())
      .expect(200);
    expect(queue.body.find((x: { id: number }) => x.id === c.id)).toMatchObject({
      kind: 'plan_change',
      plan: { id: plan.id, title: plan.title },
    });
  });

  it('when a step points to a missing step, responds 422 naming the path under plan, and stores nothing', async () => {
    const plan = await createPlan();
    const [first, second] = plan.steps;
    const steps = [{ ...first, next: { ...first.next, pass: { step: 'nowhere' } } }, second];
    const res = await propose({ planId: plan.id, version: 1, plan: { steps } });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toContainEqual({ path: 'plan.steps.0.next.pass.step', message: expect.any(String) });
    expect(await stored(plan.id)).toBe(0);
  });

  it('when the steps loop, responds 422', async () => {
    const plan = await createPlan();
    const [first, second] = plan.steps;
    const steps = [first, { ...second, next: { ...second.next, pass: { step: 'first' } } }];
    const res = await propose({ planId: plan.id, version: 1, plan: { steps } });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toContainEqual({
      path: 'plan.steps.1.next',
      message: expect.stringMatching(/must not loop/),
    });
  });

  it('for a model plan, refuses a component the model lacks (422 naming the step)', async () => {
    const modelId = await modelIdOf('650 Moorland', 2014);
    const coil = step(
      'coil',
      { pass: finding('nothing'), fail: finding('coil') },
      { check: { kind: 'spec', component: 'Ignition coil', parameter: 'Primary winding resistance' } },
    );
    const plan = await createPlan({ modelId, steps: [coil] });
    const pump = { ...coil, check: { kind: 'spec' as const, component: 'Fuel pump', parameter: 'Motor resistance' } };
    const res = await propose({ planId: plan.id, version: 1, plan: { steps: [pump] } });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toContainEqual({
      path: 'plan.steps.0.check.component',
      message: expect.stringMatching(/Fuel pump/),
    });
    // A model plan's proposal is listed under its model.
    const ok = await propose({ planId: plan.id, version: 1, plan: { title: 'Coil check, renamed' } });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ modelId, modelTitle: expect.stringContaining('650 Moorland') });
    const listed = await request(app)
      .get(`/api/corrections?modelId=${modelId}&status=pending`)
      .set(await editor())
      .expect(200);
    expect(listed.body.map((x: { id: number }) => x.id)).toContain(ok.body.id);
  });

  it('refuses a proposal that changes nothing (422)', async () => {
    const plan = await createPlan({ citation });
    const res = await propose({ planId: plan.id, version: 1, plan: { title: plan.title, steps: plan.steps } });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toEqual([{ path: 'plan', message: expect.any(String) }]);
  });

  it('unknown plan → 404; a draft plan → 404 for a contributor', async () => {
    expectProblem(await propose({ planId: 999999, version: 1, plan: { title: 'Anything at all' } }), 404, 'not_found');
    const draft = await createPlan({ status: 'draft' });
    expectProblem(await propose({ planId: draft.id, version: 1, plan: { title: 'Anything at all' } }), 404);
    expect(await stored(draft.id)).toBe(0);
  });

  it('anonymous → 401', async () => {
    const plan = await createPlan();
    const res = await request(app)
      .post('/api/corrections')
      .send({ kind: 'plan_change', planId: plan.id, version: 1, plan: { title: 'New title' }, citation, rationale });
    expectProblem(res, 401);
  });

  it.each([
    ['planId of the wrong type', { planId: 'one' }],
    ['plan as a list', { plan: [] }],
    ['steps as text', { plan: { steps: 'all of them' } }],
    ['a version inside the plan', { plan: { title: 'x', version: 1 } }],
    ['a citation inside the plan', { plan: { citation } }],
    ['no plan fields', { plan: {} }],
    ['spec values', { values: { min: 1, max: 2, unit: 'Ω' } }],
  ])('with %s, responds 400 problem details and stores nothing', async (_name, patch) => {
    const plan = await createPlan();
    const res = await propose({ planId: plan.id, version: 1, plan: { title: 'Renamed' }, ...patch });
    expectProblem(res, 400, 'validation_failed');
    expect(await stored(plan.id)).toBe(0);
  });

  it('with a body over the JSON limit, responds 413 problem details and stores nothing', async () => {
    const plan = await createPlan();
    const res = await propose({ planId: plan.id, version: 1, plan: { title: 'x'.repeat(200_000) } });
    expectProblem(res, 413);
    expect(await stored(plan.id)).toBe(0);
  });

  it('a plan citation longer than a plan allows is refused at its path', async () => {
    const plan = await createPlan();
    const res = await propose({
      planId: plan.id,
      version: 1,
      plan: { title: 'Renamed' },
      citation: { ...citation, edition: 'e'.repeat(80) },
    });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors).toContainEqual({ path: 'citation.edition', message: expect.any(String) });
  });
});

describe('accept and reject (plan_change)', () => {
  it('accept writes version + 1 through the plan’s own update, with a revision naming the correction', async () => {
    const plan = await createPlan();
    const who = proposer();
    const user = await testUser('contributor', who);
    const c = await proposeChange(plan, who);
    const res = await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await editor())
      .send({ note: 'Matches the bulletin.' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'accepted', reviewerName: 'Test plan-reviewer' });
    const after = (await request(app).get(`/api/plans/${plan.id}`).expect(200)).body;
    expect(after.version).toBe(2);
    expect(after.steps.map((s: PlanStep) => s.id)).toEqual(['first', 'second', 'third']);
    expect(after.steps[0].title).toBe('Coil primary, measured cold');
    expect(after.citation).toEqual(citation);
    const revisions = (
      await request(app)
        .get(`/api/plans/${plan.id}/revisions`)
        .set(await editor())
        .expect(200)
    ).body;
    expect(revisions[0]).toMatchObject({
      version: 2,
      reason: `Correction #${c.id}: The bulletin adds a spark check after the coil.`,
      authorName: `Test ${who} (accepted by Test plan-reviewer)`,
      changedFields: expect.arrayContaining(['steps', 'citation']),
    });
    await drainOutbox();
    expect(fakeSmtp.messages.some((m) => m.to.includes(user.email) && /accepted/.test(m.subject))).toBe(true);
  });

  it('reject needs a note, stores it and leaves the plan alone', async () => {
    const plan = await createPlan();
    const c = await proposeChange(plan);
    const url = `/api/corrections/${c.id}/reject`;
    expectProblem(
      await request(app)
        .post(url)
        .set(await editor())
        .send({}),
      400,
      'validation_failed',
    );
    const res = await request(app)
      .post(url)
      .set(await editor())
      .send({ note: 'The bulletin is for the later frame.' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'rejected', decisionNote: 'The bulletin is for the later frame.' });
    expect((await request(app).get(`/api/plans/${plan.id}`).expect(200)).body.version).toBe(1);
  });

  it('a contributor cannot accept (403), nor see someone else’s proposal (404)', async () => {
    const plan = await createPlan();
    const c = await proposeChange(plan);
    const other = await authHeader('contributor', proposer());
    expectProblem(await request(app).post(`/api/corrections/${c.id}/accept`).set(other).send({}), 403);
    expectProblem(await request(app).post(`/api/corrections/${c.id}/reject`).set(other).send({ note: 'no' }), 403);
    expectProblem(await request(app).get(`/api/corrections/${c.id}`).set(other), 404);
    expect((await request(app).get(`/api/plans/${plan.id}`).expect(200)).body.version).toBe(1);
  });

  it('an editor accepts their own proposal, as for specs (no self-review rule)', async () => {
    const plan = await createPlan();
    const res = await request(app)
      .post('/api/corrections')
      .set(await editor())
      .send({ kind: 'plan_change', planId: plan.id, version: 1, plan: { symptom: 'Weak spark' }, citation, rationale });
    expect(res.status).toBe(201);
    await request(app)
      .post(`/api/corrections/${res.body.id}/accept`)
      .set(await editor())
      .send({})
      .expect(200);
  });

  it('a stale proposal answers 409 stale_proposal with what accepting would do now; confirmStale applies it', async () => {
    const plan = await createPlan();
    const c = await proposeChange(plan);
    await request(app)
      .patch(`/api/plans/${plan.id}`)
      .set(await editor())
      .send({ version: 1, reason: 'Symptom reworded', symptom: 'Misfires under load' })
      .expect(200);
    const stale = await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await editor())
      .send({});
    expectProblem(stale, 409, 'stale_proposal');
    expect(stale.body.review).toMatchObject({ stale: true, baseVersion: 1, currentVersion: 2 });
    expect(stale.body.review.plan.changesNow.added).toEqual([{ id: 'third', title: 'Plug cap resistance' }]);
    expect((await request(app).get(`/api/plans/${plan.id}`).expect(200)).body.version).toBe(2);
    await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await editor())
      .send({ confirmStale: true })
      .expect(200);
    const after = (await request(app).get(`/api/plans/${plan.id}`).expect(200)).body;
    expect(after).toMatchObject({ version: 3, symptom: 'Misfires under load' });
    expect(after.steps).toHaveLength(3);
  });

  it('a proposal the current plan no longer accepts is refused (422), stays pending and changes nothing', async () => {
    const coil = step(
      'coil',
      { pass: finding('nothing'), fail: finding('coil') },
      { check: { kind: 'spec', component: 'Ignition coil', parameter: 'Primary winding resistance' } },
    );
    const plan = await createPlan({ steps: [coil] });
    const moorland = await modelIdOf('650 Moorland', 2014);
    const made = await propose({ planId: plan.id, version: 1, plan: { modelId: moorland } });
    expect(made.status).toBe(201);
    // Meanwhile an editor points the generic plan at a part that model lacks.
    const pump = { ...coil, check: { kind: 'spec' as const, component: 'Fuel pump', parameter: 'Motor resistance' } };
    await request(app)
      .patch(`/api/plans/${plan.id}`)
      .set(await editor())
      .send({ version: 1, reason: 'Pump check', steps: [pump] })
      .expect(200);
    const res = await request(app)
      .post(`/api/corrections/${made.body.id}/accept`)
      .set(await editor())
      .send({ confirmStale: true });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors[0].path).toBe('plan.steps.0.check.component');
    const review = await request(app)
      .get(`/api/corrections/${made.body.id}`)
      .set(await editor())
      .expect(200);
    expect(review.body).toMatchObject({ status: 'pending', reviewerName: null });
    expect((await request(app).get(`/api/plans/${plan.id}`).expect(200)).body).toMatchObject({
      version: 2,
      modelId: null,
    });
  });
});

describe('PATCH /api/corrections/:id (plan_change)', () => {
  it('the proposer edits the plan fields while pending; spec values are refused (422)', async () => {
    const plan = await createPlan();
    const who = proposer();
    const c = await proposeChange(plan, who);
    const me = await authHeader('contributor', who);
    const url = `/api/corrections/${c.id}`;
    expectProblem(
      await request(app)
        .patch(url)
        .set(me)
        .send({ values: { min: 1, max: 2, unit: 'Ω' } }),
      422,
      'unprocessable',
    );
    const res = await request(app)
      .patch(url)
      .set(me)
      .send({ plan: { title: 'Weak or no spark, step by step' } })
      .expect(200);
    expect(res.body.plan.proposed).toEqual({ title: 'Weak or no spark, step by step' });
    expect(res.body.plan.changes.planFields).toEqual(['title', 'citation']);
    const bad = await request(app)
      .patch(url)
      .set(me)
      .send({ plan: { steps: [{ ...plan.steps[0], next: { pass: { step: 'gone' }, fail: finding('x') } }] } });
    expectProblem(bad, 422, 'unprocessable');
    expect(bad.body.errors[0].path).toBe('plan.steps.0.next.pass.step');
  });
});
