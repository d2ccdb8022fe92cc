/**
 * Issue 13 item 8: an Idempotency-Key reused with a different body answers 422
 * idempotency_key_reused, and the same body sent again keeps answering the stored reading.
 * Source: IETF draft "The Idempotency-Key HTTP Header Field" (draft-ietf-httpapi-
 * idempotency-key-header), "Error Handling" (§2.7, numbering from memory): a key reused
 * with a different request payload → 422; a request still being processed → 409.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';

useTestDatabase();
const app = createApp({ webDist: null });
let me: { Authorization: string };
let jobId: number;
let keys = 0;
const newKey = () => `idem-${Date.now().toString(36)}-${(keys += 1)}`;

beforeAll(async () => {
  me = await authHeader('contributor', 'idempotency');
  jobId = (await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Quad' }).expect(201)).body.id;
});

const reading = (value = 1.5, extra: Record<string, unknown> = {}) => ({
  label: 'pickup coil',
  spec: { min: 1, max: 2, unit: 'ohm' },
  reading: { value, unit: 'ohm' },
  takenAt: '2026-11-30T10:00:00.000Z',
  ...extra,
});
const post = (key: string, body: object, job = jobId) =>
  request(app).post(`/api/jobs/${job}/readings`).set(me).set('Idempotency-Key', key).send(body);
const readingsWith = async (key: string) =>
  Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM readings WHERE idempotency_key = ?', [key]))[0].n);

describe('POST /api/jobs/:id/readings with an Idempotency-Key', () => {
  it('sent again with the same body, answers 200 with the stored reading', async () => {
    const key = newKey();
    const first = await post(key, reading()).expect(201);
    const again = await post(key, reading()).expect(200);
    expect(again.body).toEqual(first.body);
    expect(await readingsWith(key)).toBe(1);
  });

  it('the same body with its keys in another order is the same request', async () => {
    const key = newKey();
    const first = await post(key, reading()).expect(201);
    const reordered = {
      takenAt: '2026-11-30T10:00:00.000Z',
      reading: { unit: 'ohm', value: 1.5 },
      spec: { unit: 'ohm', max: 2, min: 1 },
      label: 'pickup coil',
    };
    expect((await post(key, reordered).expect(200)).body.id).toBe(first.body.id);
  });

  it.each([
    ['another reading value', reading(1.9)],
    ['another label', reading(1.5, { label: 'primary winding' })],
    ['another time taken', reading(1.5, { takenAt: '2026-11-30T10:05:00.000Z' })],
    ['spaces around the label', reading(1.5, { label: ' pickup coil ' })],
    ['a field added', reading(1.5, { temperatureC: 30, spec: { min: 1, max: 2, unit: 'ohm', material: 'copper' } })],
  ])('reused with %s, answers 422 idempotency_key_reused and stores nothing new', async (_what, other) => {
    const key = newKey();
    const first = await post(key, reading()).expect(201);
    const res = await post(key, other);
    expectProblem(res, 422, 'idempotency_key_reused');
    expect(res.body.detail).toMatch(/Idempotency-Key/);
    expect(await readingsWith(key)).toBe(1);
    // The first request, sent again, still gets its reading.
    expect((await post(key, reading()).expect(200)).body).toEqual(first.body);
  });

  it('two different bodies with one key at once: one is stored, the other answers 422', async () => {
    const key = newKey();
    const results = await Promise.all([post(key, reading(1.2)), post(key, reading(1.8))]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 422]);
    expectProblem(
      results.find((r) => r.status === 422)!,
      422,
      'idempotency_key_reused',
    );
    expect(await readingsWith(key)).toBe(1);
  });

  it('the same key on another job is another request', async () => {
    const key = newKey();
    const other = (await request(app).post('/api/jobs').set(me).send({ machineLabel: 'Other' }).expect(201)).body.id;
    await post(key, reading()).expect(201);
    await post(key, reading(1.9), other).expect(201);
  });
});
