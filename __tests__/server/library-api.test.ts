import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { loadDemoLibrary } from '@/server/db/seeds/demo-library';

useTestDatabase();
const app = createApp({ webDist: null });

/** The first model of a demo make: other files in this worker add makes of their own. */
async function firstModelId(): Promise<number> {
  const res = await request(app).get('/api/models').query({ make: 'Kestrel Moto' }).expect(200);
  return res.body[0].id;
}

describe('GET /api/health', () => {
  it('when the database answers, responds 200 with the published spec count', async () => {
    const res = await request(app).get('/api/health').expect(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' });
    expect(res.body.specs).toBeGreaterThanOrEqual(120);
  });
});

describe('GET /api/models', () => {
  it('lists every demo model with its make and counts', async () => {
    const res = await request(app).get('/api/models').expect(200);
    expect(res.body.length).toBeGreaterThanOrEqual(10);
    expect(new Set(res.body.map((m: { make: { name: string } }) => m.make.name)).size).toBeGreaterThanOrEqual(4);
    for (const m of res.body) expect(m.specCount).toBeGreaterThan(0);
  });

  it('filters by make, case-insensitively', async () => {
    const all = (await request(app).get('/api/models').expect(200)).body;
    const make = all[0].make.name as string;
    const res = await request(app).get('/api/models').query({ make: make.toUpperCase() }).expect(200);
    expect(res.body.length).toBeGreaterThan(0);
    expect(res.body.every((m: { make: { name: string } }) => m.make.name === make)).toBe(true);
  });
});

describe('GET /api/models/:id', () => {
  it('returns the components with their specs and inline values', async () => {
    const id = await firstModelId();
    const res = await request(app).get(`/api/models/${id}`).expect(200);
    expect(res.body.components.length).toBeGreaterThan(0);
    const spec = res.body.components[0].specs[0];
    expect(spec).toMatchObject({ id: expect.any(Number), parameter: expect.any(String), display: expect.any(String) });
    expect(res.body.specCount).toBe(
      res.body.components.reduce((n: number, c: { specs: unknown[] }) => n + c.specs.length, 0),
    );
  });

  it('when the id is unknown, responds 404 problem details', async () => {
    expectProblem(await request(app).get('/api/models/999999'), 404, 'not_found');
  });

  it.each(['abc', '-1', '0', '1.5', '99999999999'])('when the id is %s, responds 400 validation_failed', async (id) => {
    const res = await request(app).get(`/api/models/${id}`);
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors[0].path).toBe('id');
  });
});

describe('GET /api/specs/:id', () => {
  it('returns the spec with its source citation and revision history', async () => {
    const model = (await request(app).get(`/api/models/${await firstModelId()}`)).body;
    const specId = model.components[0].specs[0].id;
    const res = await request(app).get(`/api/specs/${specId}`).expect(200);
    expect(res.body.source).toMatchObject({ title: expect.any(String) });
    expect(res.body.sourcePage).toEqual(expect.any(String));
    expect(res.body.model.id).toBe(model.id);
    expect(res.body.revisions.length).toBeGreaterThanOrEqual(1);
    expect(res.body.revisions[0]).toMatchObject({ origin: 'import', version: res.body.version });
  });

  it('when the id is unknown, responds 404 problem details', async () => {
    expectProblem(await request(app).get('/api/specs/987654'), 404, 'not_found');
  });
});

describe('GET /api/search', () => {
  it('finds the primary winding of the Kestrel 900 despite typos in model and parameter', async () => {
    const res = await request(app).get('/api/search').query({ q: 'kestrl 900 primry' }).expect(200);
    const top = res.body.groups[0];
    expect(`${top.model.make.name} ${top.model.name}`).toMatch(/kestrel.*900/i);
    expect(top.hits[0].parameter).toMatch(/primary/i);
    expect(top.hits[0].display).toMatch(/Ω/);
  });

  it.each([
    ['pulser', /pickup|pulse/i],
    ['pulse generator resistance', /pickup|pulse/i],
    ['plug gap', /gap/i],
    ['open-circuit voltage', /rest voltage|open-circuit/i],
    ['spark plug wire', /lead|wire/i],
  ])('finds specs through the trade synonym "%s"', async (q, expected) => {
    const res = await request(app).get('/api/search').query({ q }).expect(200);
    expect(res.body.total).toBeGreaterThan(0);
    const hit = res.body.groups[0].hits[0];
    expect(`${hit.component} ${hit.parameter}`).toMatch(expected);
  });

  it('groups hits by model and returns at most `limit` hits', async () => {
    const res = await request(app).get('/api/search').query({ q: 'fuse', limit: 5 }).expect(200);
    const hits = res.body.groups.flatMap((g: { hits: unknown[] }) => g.hits);
    expect(hits.length).toBeLessThanOrEqual(5);
    expect(res.body.total).toBeGreaterThanOrEqual(hits.length);
    const ids = res.body.groups.map((g: { model: { id: number } }) => g.model.id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('when nothing matches, responds 200 with no groups', async () => {
    const res = await request(app).get('/api/search').query({ q: 'zzzxqv' }).expect(200);
    expect(res.body).toMatchObject({ total: 0, groups: [] });
  });

  it.each([
    [{}, 'q'],
    [{ q: '   ' }, 'q'],
    [{ q: 'x'.repeat(201) }, 'q'],
    [{ q: 'coil', limit: '0' }, 'limit'],
    [{ q: 'coil', limit: 'many' }, 'limit'],
  ])('when the query is %j, responds 400 naming %s', async (query, field) => {
    const res = await request(app).get('/api/search').query(query);
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
  });
});

describe('unknown routes and bodies', () => {
  it('an unknown API route answers 404 problem details', async () => {
    expectProblem(await request(app).get('/api/nothing-here'), 404, 'not_found');
  });
});

describe('demo library loader', () => {
  it('loading it again keeps an editor’s change to a demo spec', async () => {
    const [spec] = await AppDataSource.query(
      'SELECT id, max_value AS max, version FROM specs WHERE max_value IS NOT NULL ORDER BY id DESC LIMIT 1',
    );
    await AppDataSource.query('UPDATE specs SET max_value = ?, version = version + 1 WHERE id = ?', [
      spec.max + 1,
      spec.id,
    ]);
    try {
      const [summary] = await loadDemoLibrary();
      expect(summary.counts.updated).toBe(0);
      const [after] = await AppDataSource.query('SELECT max_value AS max FROM specs WHERE id = ?', [spec.id]);
      expect(after.max).toBeCloseTo(spec.max + 1, 9);
    } finally {
      await AppDataSource.query('UPDATE specs SET max_value = ?, version = version - 1 WHERE id = ?', [
        spec.max,
        spec.id,
      ]);
    }
  });

  it('loading the demo library again changes nothing', async () => {
    const before = await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions');
    const [summary] = await loadDemoLibrary();
    expect(summary.counts.created + summary.counts.updated).toBe(0);
    expect(summary.batchId).toBeNull();
    const after = await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions');
    expect(Number(after[0].n)).toBe(Number(before[0].n));
  });
});
