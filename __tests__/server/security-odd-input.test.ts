/**
 * Issue 13 item 7: odd input answers 4xx problem details, never a 500. A lone surrogate
 * (which MariaDB's JSON check refuses), C0 control characters and bidirectional
 * override/isolate characters in any free-text field; absurd numbers in a verdict; two
 * commits of previews that create the same new specs at once (an InnoDB deadlock, retried).
 */
import express from 'express';
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { DEADLOCK_ATTEMPTS, retryDeadlocks } from '@/server/db/deadlock-retry';
import { errorHandler } from '@/server/middleware/error-handler';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';
import { uniqueMake, validFile } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
type Header = { Authorization: string };
let editor: Header;
let contributor: Header;
let spec: { id: number; version: number; min: number; max: number; unit: string };
let jobId: number;
let correctionId: number;
let batchId: number;

const LONE = 'S\ud800';
const newSpec = (over: Record<string, unknown> = {}) => ({
  make: uniqueMake(),
  model: 'Vireo 250',
  yearFrom: 2015,
  component: 'pickup coil',
  parameter: 'pickup coil resistance',
  min: 400,
  max: 560,
  unit: 'ohm',
  source: { title: 'Invented Vireo Workshop Manual', page: '4-7' },
  ...over,
});
const proposal = (over: Record<string, unknown> = {}) => ({
  kind: 'change',
  specId: spec.id,
  version: spec.version,
  citation: { title: 'Invented Service Bulletin SB-12', page: '4' },
  rationale: 'Later bulletin raises the upper limit.',
  values: { min: spec.min, max: spec.max * 1.1, unit: spec.unit },
  ...over,
});

beforeAll(async () => {
  editor = await authHeader('editor', 'odd-editor');
  contributor = await authHeader('contributor', 'odd-contributor');
  [spec] = await AppDataSource.query(
    "SELECT id, version, min_value AS min, max_value AS max, unit FROM specs WHERE quantity_kind = 'resistance' AND status = 'published' AND min_value IS NOT NULL AND max_value IS NOT NULL ORDER BY id LIMIT 1",
  );
  jobId = (await request(app).post('/api/jobs').set(contributor).send({ machineLabel: 'Quad' }).expect(201)).body.id;
  correctionId = (await request(app).post('/api/corrections').set(contributor).send(proposal()).expect(201)).body.id;
  const upload = await request(app)
    .post('/api/imports')
    .set(editor)
    .attach('file', Buffer.from(validFile(uniqueMake(), 1), 'utf8'), { filename: 'a.csv', contentType: 'text/csv' })
    .expect(201);
  batchId = upload.body.id;
});

type Case = [
  where: string,
  path: string,
  method: 'post' | 'patch',
  url: () => string,
  who: () => Header,
  body: () => object,
];
/** Every free-text field of every write, with `bad` in it, and the field's path as the 4xx names it. */
const textFields = (bad: string): Case[] => [
  ['spec notes', 'notes', 'post', () => '/api/specs', () => editor, () => newSpec({ notes: bad })],
  [
    'spec source title',
    'source.title',
    'post',
    () => '/api/specs',
    () => editor,
    () => newSpec({ source: { title: bad, page: '1' } }),
  ],
  [
    'spec edit',
    'conditions',
    'patch',
    () => `/api/specs/${spec.id}`,
    () => editor,
    () => ({ version: spec.version, reason: 'Because', conditions: bad }),
  ],
  [
    'spec edit reason',
    'reason',
    'patch',
    () => `/api/specs/${spec.id}`,
    () => editor,
    () => ({ version: spec.version, reason: `Because ${bad}`, notes: 'x' }),
  ],
  [
    'correction citation',
    'citation.title',
    'post',
    () => '/api/corrections',
    () => contributor,
    () => proposal({ citation: { title: bad, page: '4' } }),
  ],
  [
    'correction rationale',
    'rationale',
    'post',
    () => '/api/corrections',
    () => contributor,
    () => proposal({ rationale: `A long enough reason ${bad}` }),
  ],
  [
    'correction values',
    'values.testPoints',
    'patch',
    () => `/api/corrections/${correctionId}`,
    () => contributor,
    () => ({ values: { min: 1, max: 2, unit: spec.unit, testPoints: bad } }),
  ],
  [
    'rejection note',
    'note',
    'post',
    () => `/api/corrections/${correctionId}/reject`,
    () => editor,
    () => ({ note: `Not so ${bad}` }),
  ],
  ['job notes', 'notes', 'post', () => '/api/jobs', () => contributor, () => ({ machineLabel: 'Quad', notes: bad })],
  ['job edit', 'customerRef', 'patch', () => `/api/jobs/${jobId}`, () => contributor, () => ({ customerRef: bad })],
  [
    'reading label',
    'label',
    'post',
    () => `/api/jobs/${jobId}/readings`,
    () => contributor,
    () => ({ label: bad, spec: { min: 1, max: 2, unit: 'ohm' }, reading: { value: 1.5, unit: 'ohm' } }),
  ],
  [
    'import commit reason',
    'reason',
    'post',
    () => `/api/imports/${batchId}/commit`,
    () => editor,
    () => ({ reason: `Loading ${bad}` }),
  ],
];

const send = ([, , method, url, who, body]: Case) => request(app)[method](url()).set(who()).send(body());

describe.each([
  ['a lone surrogate', LONE],
  ['a lone low surrogate', 'x\udc00y'],
  ['NUL', 'a\u0000b'],
  ['an escape character', 'a\u001b[31mb'],
  ['a right-to-left override', 'abc\u202edcba'],
  ['a right-to-left isolate', 'abc\u2067x\u2069'],
  ['a C1 control', 'a\u0085b'],
])('free text with %s', (_what, bad) => {
  it.each(textFields(bad))('in the %s answers 400 naming %s', async (...c) => {
    const res = await send(c);
    const path = c[1];
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });
});

describe('free text that is fine', () => {
  it('keeps tabs and line breaks where a field may span lines, and paired surrogates anywhere', async () => {
    const res = await request(app)
      .post('/api/specs')
      .set(editor)
      .send(newSpec({ notes: 'Step 1:\tdisconnect\nStep 2: measure 🔧', testPoints: 'black 🔌 to ground' }))
      .expect(201);
    expect(res.body.notes).toBe('Step 1:\tdisconnect\nStep 2: measure 🔧');
  });

  it('refuses a line break in a single-line field', async () => {
    const res = await request(app).post('/api/jobs').set(contributor).send({ machineLabel: 'Quad\nbike' });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors[0].path).toBe('machineLabel');
  });
});

describe('POST /api/verdicts with absurd numbers', () => {
  const base = { spec: { min: 1, max: 2, unit: 'ohm' }, reading: { value: 1.5, unit: 'ohm' } };
  const meter = { percent: 1, counts: 2, countValue: 0.01, unit: 'ohm' };
  it.each([
    ['meter.percent', { ...base, meter: { ...meter, percent: 1e308 } }],
    ['meter.counts', { ...base, meter: { ...meter, counts: 1e308 } }],
    ['meter.countValue', { ...base, meter: { ...meter, countValue: 1e308 } }],
    ['meter.percent', { ...base, meter: { ...meter, percent: -5 } }],
    ['reading.value', { ...base, reading: { value: 1e308, unit: 'ohm' } }],
    ['reading.value', { ...base, reading: { value: -1e308, unit: 'ohm' } }],
    ['spec.max', { ...base, spec: { min: 1, max: 1e308, unit: 'ohm' } }],
    ['leadResistance.value', { ...base, leadResistance: { value: 1e308, unit: 'ohm' } }],
    ['seriesResistance.tolerancePct', { ...base, seriesResistance: { value: 1, unit: 'ohm', tolerancePct: 1e308 } }],
    ['temperatureC', { ...base, spec: { ...base.spec, material: 'copper' }, temperatureC: 1e308 }],
    ['spec.nearLimitPct', { ...base, spec: { ...base.spec, nearLimitPct: 1e308 } }],
  ])('%s out of range answers 422 naming it', async (path, body) => {
    const res = await request(app).post('/api/verdicts').send(body);
    expectProblem(res, 422);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });

  it('the same absurd number in a reading on a job answers 422 and stores nothing', async () => {
    const res = await request(app)
      .post(`/api/jobs/${jobId}/readings`)
      .set(contributor)
      .send({ ...base, label: 'coil', meter: { ...meter, percent: 1e308 } });
    expectProblem(res, 422);
    const [{ n }] = await AppDataSource.query('SELECT COUNT(*) AS n FROM readings WHERE job_id = ?', [jobId]);
    expect(Number(n)).toBe(0);
  });
});

const deadlocks = async () =>
  Number((await AppDataSource.query("SHOW GLOBAL STATUS LIKE 'Innodb_deadlocks'"))[0].Value);
/** Statements of this database inserting makes right now (the app's account sees its own threads). */
const makeInserts = async () =>
  Number(
    (
      await AppDataSource.query(
        "SELECT COUNT(*) AS n FROM information_schema.PROCESSLIST WHERE DB = DATABASE() AND INFO LIKE 'INSERT INTO makes%'",
      )
    )[0].n,
  );
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const previewOf = async (file: string) =>
  (
    await request(app)
      .post('/api/imports')
      .set(editor)
      .attach('file', Buffer.from(file, 'utf8'), { filename: 'same.csv', contentType: 'text/csv' })
      .expect(201)
  ).body.id as number;

describe('two previews that create the same new specs, committed at once', () => {
  /*
   * Seen here (SHOW ENGINE INNODB STATUS): both commits' INSERT … SELECT … LEFT JOIN makes
   * take a shared lock on the gap the new make goes into, then each waits for the other's
   * to insert; the victim got ER_AUTOINC_READ_FAILED or ER_LOCK_DEADLOCK. A third
   * transaction holding a shared lock on that gap until both commits wait makes it happen every time.
   */
  it('one commit lands, the other answers 409, never 500: the deadlock is retried', async () => {
    const make = uniqueMake();
    const file = validFile(make, 3);
    const ids = [await previewOf(file), await previewOf(file)];
    const [{ key }] = await AppDataSource.query(
      'SELECT make_key AS `key` FROM import_batch_rows WHERE batch_id = ? LIMIT 1',
      [ids[0]],
    );
    const blocker = AppDataSource.createQueryRunner();
    await blocker.connect();
    try {
      await blocker.startTransaction();
      await blocker.query('SELECT id FROM makes WHERE name_key = ? LOCK IN SHARE MODE', [key]);
      const before = await deadlocks();
      const commits = Promise.all(ids.map((id) => request(app).post(`/api/imports/${id}/commit`).set(editor).send({})));
      // Both wait: one for the blocker's gap lock, the other behind it; once the blocker ends, they deadlock.
      for (let waited = 0; waited < 10_000 && (await makeInserts()) < 2; waited += 10) await sleep(10);
      expect(await makeInserts()).toBe(2);
      await sleep(50);
      await blocker.commitTransaction();
      const results = await commits;
      expect(await deadlocks()).toBeGreaterThan(before);
      expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
      expectProblem(
        results.find((r) => r.status === 409)!,
        409,
        'conflict',
      );
    } finally {
      if (blocker.isTransactionActive) await blocker.rollbackTransaction();
      await blocker.release();
    }
    const [{ n }] = await AppDataSource.query(
      'SELECT COUNT(*) AS n FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id WHERE mk.name = ?',
      [make],
    );
    expect(Number(n)).toBe(3);
  });
});

describe('retryDeadlocks', () => {
  const failure = (code: string) => Object.assign(new Error(code), { driverError: { code } });

  it.each(['ER_LOCK_DEADLOCK', 'ER_AUTOINC_READ_FAILED'])('runs the work again after %s', async (code) => {
    let calls = 0;
    const result = await retryDeadlocks(async () => {
      calls += 1;
      if (calls < 3) throw failure(code);
      return 'done';
    });
    expect(result).toBe('done');
    expect(calls).toBe(3);
  });

  it(`gives up after ${DEADLOCK_ATTEMPTS} tries and throws the deadlock`, async () => {
    let calls = 0;
    const work = async () => {
      calls += 1;
      throw failure('ER_LOCK_DEADLOCK');
    };
    await expect(retryDeadlocks(work)).rejects.toThrow('ER_LOCK_DEADLOCK');
    expect(calls).toBe(DEADLOCK_ATTEMPTS);
  });

  it.each(['ER_LOCK_WAIT_TIMEOUT', 'ER_DUP_ENTRY', 'ECONNREFUSED'])(
    'does not run the work again after %s',
    async (code) => {
      let calls = 0;
      const work = async () => {
        calls += 1;
        throw failure(code);
      };
      await expect(retryDeadlocks(work)).rejects.toThrow(code);
      expect(calls).toBe(1);
    },
  );
});

describe('lock contention that outlasts the retries', () => {
  it.each(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT'])(
    '%s answers 503 write_conflict with Retry-After, not 500',
    async (code) => {
      const failing = express();
      failing.get('/', () => {
        throw Object.assign(new Error('lock'), { driverError: { code } });
      });
      failing.use(errorHandler);
      const res = await request(failing).get('/');
      expectProblem(res, 503, 'write_conflict');
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    },
  );
});
