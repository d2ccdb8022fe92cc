/**
 * A job started with no connection is resent with the Idempotency-Key it was queued
 * with: POST /api/jobs lands it once per owner, answers a resend with the stored job,
 * and refuses the key reused with another body. Source: IETF draft "The
 * Idempotency-Key HTTP Header Field" (draft-ietf-httpapi-idempotency-key-header),
 * "Error Handling" (numbering from memory): a key reused with a different payload → 422.
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
let other: { Authorization: string };
let keys = 0;
const newKey = () => `job-${Date.now().toString(36)}-${(keys += 1)}`;

beforeAll(async () => {
  me = await authHeader('contributor', 'job-idem');
  other = await authHeader('contributor', 'job-idem-other');
});

const job = (extra: Record<string, unknown> = {}) => ({ machineLabel: 'Red quad', machineId: 'FR-0042', ...extra });
const post = (key: string | undefined, body: object, who = me) => {
  const req = request(app).post('/api/jobs').set(who);
  return key === undefined ? req.send(body) : req.set('Idempotency-Key', key).send(body);
};
const jobsWith = async (key: string) =>
  Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM jobs WHERE idempotency_key = ?', [key]))[0].n);

describe('POST /api/jobs with an Idempotency-Key', () => {
  it('resent with the same body, answers 200 with the job stored the first time', async () => {
    const key = newKey();
    const first = await post(key, job()).expect(201);
    const again = await post(key, job()).expect(200);
    expect(again.body.id).toBe(first.body.id);
    expect(again.body).toMatchObject({ machineLabel: 'Red quad', machineId: 'FR-0042', readings: [] });
    expect(await jobsWith(key)).toBe(1);
  });

  it('the same body with its keys in another order is the same request', async () => {
    const key = newKey();
    const first = await post(key, job()).expect(201);
    expect((await post(key, { machineId: 'FR-0042', machineLabel: 'Red quad' }).expect(200)).body.id).toBe(
      first.body.id,
    );
  });

  it.each([
    ['another machine', job({ machineLabel: 'Green quad' })],
    ['a field added', job({ customerRef: 'C-1' })],
  ])('reused with %s, answers 422 idempotency_key_reused and stores nothing new', async (_what, body) => {
    const key = newKey();
    await post(key, job()).expect(201);
    const res = await post(key, body);
    expectProblem(res, 422, 'idempotency_key_reused');
    expect(res.body.detail).toMatch(/Idempotency-Key/);
    expect(await jobsWith(key)).toBe(1);
  });

  it('the same job sent three times at once is stored once; every answer names it', async () => {
    const key = newKey();
    const answers = await Promise.all([post(key, job()), post(key, job()), post(key, job())]);
    expect(answers.map((r) => r.status).sort()).toEqual([200, 200, 201]);
    expect(new Set(answers.map((r) => r.body.id)).size).toBe(1);
    expect(await jobsWith(key)).toBe(1);
  });

  it("another account's key never answers with my job", async () => {
    const key = newKey();
    const mine = await post(key, job()).expect(201);
    const theirs = await post(key, job(), other).expect(201);
    expect(theirs.body.id).not.toBe(mine.body.id);
    expect(theirs.body.ownerId).not.toBe(mine.body.ownerId);
  });

  it.each([
    ['spaces', 'bad key!'],
    ['too short', 'abc'],
    ['too long', 'k'.repeat(81)],
    ['a slash', 'key/with/slash'],
  ])('a key with %s is refused with 400 and stores nothing', async (_what, key) => {
    const before = Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM jobs'))[0].n);
    expectProblem(await post(key, job()), 400, 'validation_failed');
    expect(Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM jobs'))[0].n)).toBe(before);
  });

  it('without a key, each post is a new job (as before)', async () => {
    const a = await post(undefined, job()).expect(201);
    const b = await post(undefined, job()).expect(201);
    expect(b.body.id).not.toBe(a.body.id);
  });

  it('an unknown model is refused (422) before the key is spent, so the corrected job can reuse it', async () => {
    const key = newKey();
    expectProblem(await post(key, { modelId: 999999 }), 422, 'unprocessable');
    expect(await jobsWith(key)).toBe(0);
  });
});
