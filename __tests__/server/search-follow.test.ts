/**
 * Search follows the library through library_changes: two app instances, each with its own
 * search engine (as two server processes would have), against one database. An edit through
 * A shows in B's search by an incremental update, with no rebuild of B's index.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { SearchEngine } from '@/server/modules/search/search-engine';
import { LibraryFollower } from '@/server/modules/library/library-follower';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';

useTestDatabase();
const engineA = new SearchEngine({ pollMs: 50 });
const engineB = new SearchEngine({ pollMs: 50 });
const appA = createApp({ webDist: null, searchEngine: engineA });
const appB = createApp({ webDist: null, searchEngine: engineB });
let editor: { Authorization: string };

beforeAll(async () => {
  editor = await authHeader('editor');
  await request(appA).get('/api/search').query({ q: 'coil' }).expect(200);
  await request(appB).get('/api/search').query({ q: 'coil' }).expect(200);
});
afterAll(() => {
  engineA.stop();
  engineB.stop();
});

/** A word no other spec has, so a hit can only be the spec under test. */
const word = () => `zq${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;

type Hit = { specId: number; parameter: string };
async function hitsOn(app: ReturnType<typeof createApp>, q: string): Promise<Hit[]> {
  const res = await request(app).get('/api/search').query({ q }).expect(200);
  return res.body.groups.flatMap((g: { hits: Hit[] }) => g.hits);
}

/** Polls B's search until `check` holds (a bounded wait; the speed goal is in the bench). */
async function eventually(q: string, check: (hits: Hit[]) => boolean): Promise<Hit[]> {
  const deadline = Date.now() + 5000;
  for (;;) {
    const hits = await hitsOn(appB, q);
    if (check(hits) || Date.now() > deadline) return hits;
    await new Promise((r) => setTimeout(r, 25));
  }
}

const newSpec = (make: string, parameter: string) => ({
  make,
  model: 'Vireo 250',
  yearFrom: 2015,
  yearTo: 2019,
  variant: 'EU',
  component: 'pickup coil',
  parameter,
  min: 400,
  nominal: 480,
  max: 560,
  unit: 'ohm',
  refTempC: 20,
  source: { title: 'Invented Vireo Workshop Manual', edition: '1st edition', page: '4-7' },
  reason: 'New model sheet',
});

describe('search across two app instances', () => {
  it('when A creates, edits and reverts a spec, B finds each state without rebuilding its index', async () => {
    const built = engineB.stats().builtAt;
    const make = `Quorlane ${word()}`;
    const first = `${word()} resistance`;
    const created = await request(appA).post('/api/specs').set(editor).send(newSpec(make, first)).expect(201);
    const id = created.body.id as number;
    expect((await eventually(first, (h) => h.some((x) => x.specId === id))).map((h) => h.specId)).toContain(id);

    const renamed = `${word()} resistance`;
    await request(appA)
      .patch(`/api/specs/${id}`)
      .set(editor)
      .send({ version: 1, parameter: renamed, reason: 'Renamed after bulletin 4' })
      .expect(200);
    expect((await eventually(renamed, (h) => h.some((x) => x.specId === id))).map((h) => h.specId)).toContain(id);
    expect((await hitsOn(appB, first)).filter((h) => h.parameter === first)).toEqual([]);

    const revisions = await request(appA).get(`/api/specs/${id}/revisions`).set(editor).expect(200);
    const firstRevision = revisions.body.revisions.find((r: { version: number }) => r.version === 1);
    await request(appA)
      .post(`/api/specs/${id}/revert`)
      .set(editor)
      .send({ revisionId: firstRevision.id, version: 2, reason: 'Bulletin 4 was withdrawn' })
      .expect(200);
    const back = await eventually(first, (h) => h.some((x) => x.specId === id && x.parameter === first));
    expect(back.find((h) => h.specId === id)?.parameter).toBe(first);
    expect(engineB.stats().builtAt).toBe(built);
  });

  it('a follower of the change log is handed the id of every spec written', async () => {
    const follower = new LibraryFollower(50);
    const seen: number[] = [];
    follower.subscribe((ids) => {
      seen.push(...ids);
    });
    follower.start();
    await follower.poll();
    const created = await request(appA)
      .post('/api/specs')
      .set(editor)
      .send(newSpec(`Quorlane ${word()}`, `${word()} resistance`))
      .expect(201);
    await follower.poll();
    follower.stop();
    expect(seen).toContain(created.body.id);
  });
});

describe('GET /api/search limits', () => {
  it.each([
    ['121 characters', 'coil '.repeat(24) + 'x', /120 characters/],
    ['13 words', 'a b c d e f g h i j k l m', /12 words/],
  ])('when the query has %s, responds 400 validation_failed with the limit', async (_what, q, message) => {
    const res = await request(appA).get('/api/search').query({ q });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ code: 'validation_failed' });
    expect(res.body.errors[0]).toMatchObject({ path: 'q', message: expect.stringMatching(message) });
  });

  it('a query of 12 one-letter words at the limit answers 200', async () => {
    const res = await request(appA).get('/api/search').query({ q: 'a b c d e f g h i j k l' }).expect(200);
    expect(res.body).toMatchObject({ total: expect.any(Number), groups: expect.any(Array) });
  });

  it('search answers carry the per-client rate limit policy', async () => {
    const res = await request(appA).get('/api/search').query({ q: 'coil' }).expect(200);
    expect(res.headers['ratelimit-policy']).toMatch(/q=600/);
  });

  it('the index age (for /metrics) is null before a build, near 0 while the follower keeps up, and grows when it does not', async () => {
    const fresh = new SearchEngine({ pollMs: 50 });
    expect(fresh.ageSeconds()).toBeNull();
    await fresh.settle();
    const now = Date.now();
    expect(fresh.ageSeconds(now)).toBeLessThan(2);
    // Ten seconds on with no poll in between (the follower stopped): the index is ten seconds old.
    fresh.stop();
    await fresh.follower.poll(); // nothing left in flight when the test ends
    expect(fresh.ageSeconds(now + 10_000)).toBeGreaterThanOrEqual(10);
    expect(fresh.ageSeconds(now + 10_000)).toBeLessThan(12);
  });
});
