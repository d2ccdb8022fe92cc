import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { evaluateReading } from '@/lib/verdict';
import type { CanonicalUnit } from '@/lib/units';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });

async function someSpec() {
  const [s] = await AppDataSource.query(
    "SELECT id, min_value AS min, max_value AS max, unit, ref_temp_c AS refTempC, material, version FROM specs WHERE quantity_kind = 'resistance' AND min_value IS NOT NULL AND max_value IS NOT NULL ORDER BY id LIMIT 1",
  );
  return s as {
    id: number;
    min: number;
    max: number;
    unit: CanonicalUnit;
    refTempC: number | null;
    material: 'copper' | 'none';
    version: number;
  };
}

async function newJob(who: 'contributor' | 'editor' | 'admin' = 'contributor', name?: string) {
  const res = await request(app)
    .post('/api/jobs')
    .set(await authHeader(who, name))
    .send({ machineLabel: 'Customer quad, 250 cc', machineId: 'FR-2231/B', customerRef: 'WO-1177' });
  expect(res.status).toBe(201);
  return res.body as { id: number };
}

describe('POST /api/jobs', () => {
  it('creates an open job for a library model', async () => {
    const [model] = await AppDataSource.query('SELECT id FROM vehicle_models ORDER BY id LIMIT 1');
    const res = await request(app)
      .post('/api/jobs')
      .set(await authHeader('contributor'))
      .send({ modelId: model.id, machineId: 'ABC123', notes: 'Cuts out when hot' })
      .expect(201);
    expect(res.body).toMatchObject({
      status: 'open',
      modelId: model.id,
      modelTitle: expect.any(String),
      counts: { pass: 0, marginal: 0, fail: 0 },
      readings: [],
    });
  });

  it.each([
    [{}, 'machineLabel'],
    [{ machineLabel: 'x', machineId: 'VIN<script>' }, 'machineId'],
    [{ machineLabel: 'x', machineId: 'A'.repeat(41) }, 'machineId'],
    [{ machineLabel: 'x', owner: 3 }, '(root)'],
  ])('refuses %j naming %s', async (body, field) => {
    const res = await request(app)
      .post('/api/jobs')
      .set(await authHeader('contributor'))
      .send(body);
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
  });

  it('an unknown model id → 422', async () => {
    expect(
      (
        await request(app)
          .post('/api/jobs')
          .set(await authHeader('contributor'))
          .send({ modelId: 999999 })
      ).status,
    ).toBe(422);
  });

  it('anonymous → 401', async () => {
    expect((await request(app).post('/api/jobs').send({ machineLabel: 'x' })).status).toBe(401);
  });
});

describe('who may read a job', () => {
  it('the owner and admins may; another technician gets 404', async () => {
    const job = await newJob('contributor', 'owner-a');
    await request(app)
      .get(`/api/jobs/${job.id}`)
      .set(await authHeader('contributor', 'owner-a'))
      .expect(200);
    await request(app)
      .get(`/api/jobs/${job.id}`)
      .set(await authHeader('admin'))
      .expect(200);
    expect(
      (
        await request(app)
          .get(`/api/jobs/${job.id}`)
          .set(await authHeader('editor', 'someone-else'))
      ).status,
    ).toBe(404);
    expect(
      (
        await request(app)
          .get(`/api/jobs/${job.id}/readings.csv`)
          .set(await authHeader('contributor', 'intruder'))
      ).status,
    ).toBe(404);
  });

  it('lists my jobs newest first, and searches them', async () => {
    const me = await authHeader('contributor', 'lister');
    const a = (
      await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Blue scooter', customerRef: 'FIRST-1' })
    ).body;
    const b = (
      await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Red trail bike', customerRef: 'SECOND-2' })
    ).body;
    const all = await request(app).get('/api/jobs').set(me).expect(200);
    expect(all.body.map((j: { id: number }) => j.id).slice(0, 2)).toEqual([b.id, a.id]);
    const found = await request(app).get('/api/jobs').query({ q: 'scooter' }).set(me).expect(200);
    expect(found.body.map((j: { id: number }) => j.id)).toEqual([a.id]);
  });
});

describe('POST /api/jobs/:id/readings', () => {
  it('stores the same verdict as the engine gives for the inputs, with the spec version', async () => {
    const spec = await someSpec();
    const job = await newJob();
    const body = {
      specId: spec.id,
      reading: { value: (spec.min + spec.max) / 2 + 0.4, unit: spec.unit },
      leadResistance: { value: 0.4, unit: spec.unit },
      meter: { percent: 1, counts: 2, countValue: 0.01, unit: spec.unit },
    };
    const res = await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(await authHeader('contributor'))
      .set('Idempotency-Key', `key-${Date.now()}-a`)
      .send(body)
      .expect(201);
    const engine = evaluateReading({
      spec: { min: spec.min, max: spec.max, unit: spec.unit, refTempC: spec.refTempC, material: spec.material },
      reading: body.reading,
      leadResistance: body.leadResistance,
      meter: body.meter,
    });
    expect(res.body.verdict).toBe(engine.verdict);
    expect(res.body.value).toBeCloseTo(engine.value, 12);
    expect(res.body.expandedUncertainty).toBeCloseTo(engine.expandedUncertainty!, 12);
    expect(res.body).toMatchObject({
      specId: spec.id,
      specVersion: spec.version,
      specChangedSince: false,
      citation: expect.stringMatching(/p\./),
    });
  });

  it('the same Idempotency-Key twice stores one reading', async () => {
    const spec = await someSpec();
    const job = await newJob();
    const send = async () =>
      request(app)
        .post(`/api/jobs/${job.id}/readings`)
        .set(await authHeader('contributor'))
        .set('Idempotency-Key', 'offline-queue-0001')
        .send({ specId: spec.id, reading: { value: spec.min, unit: spec.unit } });
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body.id).toBe(b.body.id);
    const sheet = await request(app)
      .get(`/api/jobs/${job.id}`)
      .set(await authHeader('contributor'))
      .expect(200);
    expect(sheet.body.readings).toHaveLength(1);
  });

  it('a re-take supersedes the old reading without deleting it; counts use the current ones', async () => {
    const spec = await someSpec();
    const job = await newJob();
    const me = await authHeader('contributor');
    const first = await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(me)
      .send({ specId: spec.id, reading: { value: spec.max * 5, unit: spec.unit } })
      .expect(201);
    expect(first.body.verdict).toBe('fail');
    await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(me)
      .send({
        specId: spec.id,
        reading: { value: (spec.min + spec.max) / 2, unit: spec.unit },
        retakeOf: first.body.id,
      })
      .expect(201);
    const sheet = (await request(app).get(`/api/jobs/${job.id}`).set(me)).body;
    expect(sheet.readings).toHaveLength(2);
    expect(sheet.readings[0].supersededBy).toBe(sheet.readings[1].id);
    expect(sheet.counts).toEqual({ pass: 1, marginal: 0, fail: 0 });
    expect(
      (
        await request(app)
          .post(`/api/jobs/${job.id}/readings`)
          .set(me)
          .send({ specId: spec.id, reading: { value: 1, unit: spec.unit }, retakeOf: first.body.id })
      ).status,
    ).toBe(409);
  });

  it('a hand-typed spec needs a label; impossible inputs get 422; a closed job refuses readings', async () => {
    const job = await newJob();
    const me = await authHeader('contributor');
    const url = `/api/jobs/${job.id}/readings`;
    expect(
      (
        await request(app)
          .post(url)
          .set(me)
          .send({ spec: { min: 1, max: 2, unit: 'ohm' }, reading: { value: 1.5, unit: 'ohm' } })
      ).status,
    ).toBe(400);
    expect(
      (
        await request(app)
          .post(url)
          .set(me)
          .send({
            spec: { min: 1, max: 2, unit: 'ohm' },
            label: 'Horn relay coil',
            reading: { value: 1.5, unit: 'ohm' },
          })
      ).status,
    ).toBe(201);
    expect(
      (
        await request(app)
          .post(url)
          .set(me)
          .send({ spec: { min: 0.7, max: 0.8, unit: 'mm' }, label: 'Gap', reading: { value: 1.5, unit: 'ohm' } })
      ).status,
    ).toBe(422);
    expect(
      (
        await request(app)
          .post(url)
          .set(me)
          .set('Idempotency-Key', 'bad key!')
          .send({ spec: { min: 1, max: 2, unit: 'ohm' }, label: 'x', reading: { value: 1.5, unit: 'ohm' } })
      ).status,
    ).toBe(400);
    await request(app).patch(`/api/jobs/${job.id}`).set(me).send({ status: 'closed' }).expect(200);
    expect(
      (
        await request(app)
          .post(url)
          .set(me)
          .send({ spec: { min: 1, max: 2, unit: 'ohm' }, label: 'x', reading: { value: 1.5, unit: 'ohm' } })
      ).status,
    ).toBe(409);
  });

  it('says when the spec changed after the reading was judged', async () => {
    const spec = await someSpec();
    const job = await newJob();
    const me = await authHeader('contributor');
    await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(me)
      .send({ specId: spec.id, reading: { value: spec.min, unit: spec.unit } })
      .expect(201);
    await AppDataSource.query('UPDATE specs SET version = version + 1 WHERE id = ?', [spec.id]);
    try {
      const sheet = (await request(app).get(`/api/jobs/${job.id}`).set(me)).body;
      expect(sheet.readings[0]).toMatchObject({ specVersion: spec.version, specChangedSince: true });
    } finally {
      await AppDataSource.query('UPDATE specs SET version = version - 1 WHERE id = ?', [spec.id]);
    }
  });
});

describe('GET /api/jobs/:id/readings.csv', () => {
  it('exports the readings as RFC 4180 CSV with free text neutralised', async () => {
    const job = await newJob();
    const me = await authHeader('contributor');
    await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(me)
      .send({
        spec: { min: 1, max: 2, unit: 'ohm' },
        label: '=HYPERLINK("x"),coil',
        reading: { value: 1.5, unit: 'ohm' },
      })
      .expect(201);
    const res = await request(app).get(`/api/jobs/${job.id}/readings.csv`).set(me).expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toMatch(/^reading_id,taken_at,component,measured,/);
    // Source: OWASP CSV Injection; CWE-1236 — a leading = is prefixed with ' and the field quoted.
    // Source: RFC 4180 §2 rule 6/7 — a field with a comma or a quote is quoted, inner quotes doubled.
    expect(lines[1]).toContain('"\'=HYPERLINK(""x""),coil"');
  });
});
