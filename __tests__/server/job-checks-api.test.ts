/**
 * Beep-only checks on a job: POST /api/jobs/:id/readings with `check` instead of `reading`.
 * A meter that only beeps on its diode range (or a continuity tester) gives no number, yet
 * the check belongs on the job sheet like any other.
 *
 * Trade facts used here (common practice, no published source): a sound diode conducts one
 * way only (forward conducts, reverse open); open both ways is an open diode, conducts both
 * ways a shorted one; a sound fuse shows continuity.
 */
import request from 'supertest';
import { uniqueMake } from '../fixtures/csv/rows';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { expectProblem } from '../helpers/problems';

useTestDatabase();
const app = createApp({ webDist: null });

type Auth = Record<string, string>;
let tech: Auth;
let editor: Auth;
beforeAll(async () => {
  tech = await authHeader('contributor', 'Beep Tester');
  editor = await authHeader('editor', 'Beep Editor');
});

async function newJob() {
  const res = await request(app).post('/api/jobs').set(tech).send({ machineLabel: 'Shop mower, single cylinder' });
  expect(res.status).toBe(201);
  return res.body.id as number;
}

const add = (jobId: number, body: object, key?: string) => {
  const req = request(app).post(`/api/jobs/${jobId}/readings`).set(tech);
  return key ? req.set('Idempotency-Key', key).send(body) : req.send(body);
};

/** A published spec read in `mode`, from the demo library. */
async function specWithMode(mode: string): Promise<number> {
  const [row] = await AppDataSource.query("SELECT id FROM specs WHERE mode = ? AND status = 'published' LIMIT 1", [
    mode,
  ]);
  if (!row) throw new Error(`the demo library has no ${mode} spec`);
  return row.id;
}

/** A continuity spec of its own, created through the editors' route. */
async function continuitySpec(): Promise<number> {
  const res = await request(app)
    .post('/api/specs')
    .set(editor)
    .send({
      make: uniqueMake('Brindle'),
      model: 'Mower 160',
      yearFrom: 2020,
      variant: 'all markets',
      component: 'main fuse',
      parameter: 'continuity end to end',
      max: 0.5,
      unit: 'ohm',
      mode: 'continuity',
      source: { title: 'Invented Brindle Mower Handbook', edition: '2nd edition', page: '3-2' },
      reason: 'New model sheet',
    });
  expect(res.body).toMatchObject({ id: expect.any(Number) });
  return res.body.id;
}

describe('a diode check on a meter that only beeps', () => {
  it('goes on the job with its label, judged pass, shown in words, with no band or unit', async () => {
    const jobId = await newJob();
    const res = await add(jobId, {
      label: 'Rectifier diode D1',
      check: { kind: 'diode', forward: 'conducts', reverse: 'open' },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      label: 'Rectifier diode D1',
      verdict: 'pass',
      valueText: 'Forward conducts, reverse open',
      unit: '',
      expandedUncertainty: null,
      specId: null,
      specLimits: { mode: 'diode_forward' },
      inputs: { check: { kind: 'diode', forward: 'conducts', reverse: 'open' } },
    });
    expect(res.body.reason).toMatch(/one way only/i);
    const job = await request(app).get(`/api/jobs/${jobId}`).set(tech).expect(200);
    expect(job.body.counts).toEqual({ pass: 1, marginal: 0, fail: 0 });
  });

  it.each([
    ['open', 'open', 'fail', /open/i],
    ['conducts', 'conducts', 'fail', /short/i],
    ['open', 'conducts', 'marginal', /re-test/i],
  ])('forward %s, reverse %s is %s', async (forward, reverse, verdict, reason) => {
    const res = await add(await newJob(), { label: 'Regulator diode', check: { kind: 'diode', forward, reverse } });
    expect(res.status).toBe(201);
    expect(res.body.verdict).toBe(verdict);
    expect(res.body.reason).toMatch(reason);
  });

  it('against a diode spec by id, it keeps the spec, its version and its citation', async () => {
    const specId = await specWithMode('diode_forward');
    const spec = (await request(app).get(`/api/specs/${specId}`).expect(200)).body;
    const res = await add(await newJob(), { specId, check: { kind: 'diode', forward: 'open', reverse: 'open' } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      specId,
      specVersion: spec.version,
      label: spec.parameter,
      componentName: spec.component.name,
      verdict: 'fail',
      citation: expect.stringContaining(spec.source.title),
    });
  });

  it('is refused (422 naming check.kind) against a spec read in another mode', async () => {
    const [row] = await AppDataSource.query(
      "SELECT id FROM specs WHERE quantity_kind = 'resistance' AND (mode = 'resistance' OR mode IS NULL) AND status = 'published' LIMIT 1",
    );
    const res = await add(await newJob(), {
      specId: row.id,
      check: { kind: 'diode', forward: 'conducts', reverse: 'open' },
    });
    expectProblem(res, 422);
    expect(res.body.errors).toEqual([expect.objectContaining({ path: 'check.kind' })]);
  });
});

describe('a continuity check', () => {
  it('against a continuity spec passes on continuity and fails open; a diode check there is refused', async () => {
    const specId = await continuitySpec();
    const jobId = await newJob();
    const good = await add(jobId, { specId, check: { kind: 'continuity', continuity: true } });
    expect(good.status).toBe(201);
    expect(good.body).toMatchObject({ verdict: 'pass', valueText: 'Continuity', label: 'continuity end to end' });
    const blown = await add(jobId, { specId, check: { kind: 'continuity', continuity: false } });
    expect(blown.body).toMatchObject({ verdict: 'fail', valueText: 'Open circuit' });
    expect(blown.body.reason).toMatch(/blown/i);
    const wrong = await add(jobId, { specId, check: { kind: 'diode', forward: 'conducts', reverse: 'open' } });
    expectProblem(wrong, 422);
    expect(wrong.body.errors[0].path).toBe('check.kind');
  });

  it('an open circuit where one is expected passes (no short to ground)', async () => {
    const res = await add(await newJob(), {
      label: 'Kill switch wire to ground, switch on RUN',
      check: { kind: 'continuity', continuity: false, expected: false },
    });
    expect(res.body).toMatchObject({ verdict: 'pass', valueText: 'Open circuit (open expected)' });
  });

  it('appears in the readings CSV with the meter result in words and no number', async () => {
    const jobId = await newJob();
    await add(jobId, { label: 'Main fuse', check: { kind: 'continuity', continuity: true } }).expect(201);
    const csv = await request(app).get(`/api/jobs/${jobId}/readings.csv`).set(tech).expect(200);
    const [header, row] = csv.text.trim().split('\r\n');
    const cols = header.split(',');
    const cells = row.split(',');
    expect(cells[cols.indexOf('raw_value')]).toBe('Continuity');
    expect(cells[cols.indexOf('value')]).toBe('');
    expect(cells[cols.indexOf('verdict')]).toBe('pass');
  });
});

describe('the body is one kind of reading or the other', () => {
  const diode = { kind: 'diode', forward: 'conducts', reverse: 'open' };
  it.each([
    ['both a reading and a check', { label: 'x', reading: { value: 0.5, unit: 'V' }, check: diode }, 'reading'],
    ['neither', { label: 'x' }, 'reading'],
    ['a check with test leads', { label: 'x', check: diode, leadResistance: { value: 0.3, unit: 'ohm' } }, 'check'],
    ['a check with typed limits', { label: 'x', check: diode, spec: { min: 0.4, max: 0.8, unit: 'V' } }, 'specId'],
    ['a check without a label or spec', { check: diode }, 'label'],
    ['an unknown kind', { label: 'x', check: { kind: 'megger', continuity: true } }, 'check.kind'],
    ['a diode state that is not one', { label: 'x', check: { ...diode, forward: 'beeps' } }, 'check.forward'],
    [
      'a continuity that is a string',
      { label: 'x', check: { kind: 'continuity', continuity: 'yes' } },
      'check.continuity',
    ],
    ['an extra field in the check', { label: 'x', check: { ...diode, volts: 0.6 } }, 'check'],
  ])('refuses %s (400 naming %s), and stores nothing', async (_what, body, path) => {
    const jobId = await newJob();
    const res = await add(jobId, body);
    expectProblem(res, 400);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
    const job = await request(app).get(`/api/jobs/${jobId}`).set(tech).expect(200);
    expect(job.body.readings).toEqual([]);
  });

  it('a resent check lands once; the same key with another result is refused', async () => {
    const jobId = await newJob();
    const body = { label: 'Stop switch', check: { kind: 'continuity', continuity: true } };
    const first = await add(jobId, body, 'check-key-0001');
    const again = await add(jobId, body, 'check-key-0001');
    expect([first.status, again.status]).toEqual([201, 200]);
    expect(again.body.id).toBe(first.body.id);
    const other = await add(jobId, { ...body, check: { kind: 'continuity', continuity: false } }, 'check-key-0001');
    expectProblem(other, 422, 'idempotency_key_reused');
  });
});
