import request from 'supertest';
import { createApp } from '@/server/app';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';
import { toCsv, uniqueMake, validRow } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
let editor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor');
});

const patch = (id: number, body: object) => request(app).patch(`/api/specs/${id}`).set(editor).send(body);
const revert = (id: number, body: object) => request(app).post(`/api/specs/${id}/revert`).set(editor).send(body);
const history = async (id: number) => (await request(app).get(`/api/specs/${id}/revisions`).expect(200)).body;

/** A spec imported from CSV (revision 1), then edited twice (revisions 2 and 3). */
async function specWithHistory(): Promise<number> {
  const make = uniqueMake();
  const text = toCsv([
    validRow(make, {
      component: 'stator',
      parameter: 'stator winding resistance',
      min: '0.2',
      nominal: '0.3',
      max: '0.4',
      material: 'copper',
    }),
  ]);
  const batch = (
    await request(app)
      .post('/api/imports')
      .set(editor)
      .attach('file', Buffer.from(text), { filename: 'stator.csv', contentType: 'text/csv' })
      .expect(201)
  ).body;
  await request(app).post(`/api/imports/${batch.id}/commit`).set(editor).expect(200);
  const id = (await request(app).get(`/api/imports/${batch.id}`).set(editor).expect(200)).body.created[0].specId;
  await patch(id, { version: 1, reason: 'Bulletin 7 raises the maximum', max: 0.5 }).expect(200);
  await patch(id, {
    version: 2,
    reason: 'Measured between yellow leads',
    testPoints: 'yellow to yellow',
    nominal: null,
  }).expect(200);
  return id;
}

describe('GET /api/specs/:id/revisions', () => {
  it('lists revisions newest first, each with its field diffs against the one before', async () => {
    const id = await specWithHistory();
    const res = await request(app).get(`/api/specs/${id}/revisions`).expect(200);
    expect(res.body).toMatchObject({ specId: id, version: 3 });
    const [third, second, first] = res.body.revisions;
    expect(res.body.revisions.map((r: { version: number }) => r.version)).toEqual([3, 2, 1]);
    expect(third).toMatchObject({
      origin: 'edit',
      reason: 'Measured between yellow leads',
      authorName: 'Test editor-tester',
    });
    expect(third.changes).toEqual([
      { field: 'nominal', before: 0.3, after: null },
      { field: 'testPoints', before: 'black/yellow (+) to ground', after: 'yellow to yellow' },
    ]);
    expect(second.changes).toEqual([{ field: 'max', before: 0.4, after: 0.5 }]);
    expect(first).toMatchObject({
      origin: 'import',
      originRef: expect.stringMatching(/^batch #\d+$/),
      changedFields: ['created'],
    });
    expect(first.changes).toEqual(
      expect.arrayContaining([
        { field: 'min', before: null, after: 0.2 },
        { field: 'sourceTitle', before: null, after: 'Invented Workshop Manual' },
      ]),
    );
  });

  it('is public: readable without signing in', async () => {
    const id = await specWithHistory();
    expect((await request(app).get(`/api/specs/${id}/revisions`)).status).toBe(200);
  });

  it.each([
    ['999999', 404],
    ['abc', 400],
    ['0', 400],
  ])('for spec id %s responds %d', async (id, status) => {
    expectProblem(await request(app).get(`/api/specs/${id}/revisions`), status);
  });
});

describe('POST /api/specs/:id/revert', () => {
  it("applies the revision's values as a new revision with origin revert", async () => {
    const id = await specWithHistory();
    const first = (await history(id)).revisions[2];
    const res = await revert(id, { revisionId: first.id, version: 3, reason: 'Bulletin 7 was withdrawn' }).expect(200);
    expect(res.body).toMatchObject({
      id,
      version: 4,
      min: 0.2,
      nominal: 0.3,
      max: 0.4,
      testPoints: 'black/yellow (+) to ground',
    });
    const latest = (await history(id)).revisions[0];
    expect(latest).toMatchObject({
      version: 4,
      origin: 'revert',
      originRef: `revision #${first.id}`,
      reason: 'Bulletin 7 was withdrawn',
      changedFields: ['nominal', 'max', 'testPoints'],
    });
    expect(latest.changes).toEqual([
      { field: 'nominal', before: null, after: 0.3 },
      { field: 'max', before: 0.5, after: 0.4 },
      { field: 'testPoints', before: 'yellow to yellow', after: 'black/yellow (+) to ground' },
    ]);
  });

  it('when the version is stale, responds 409 with the current spec and writes nothing', async () => {
    const id = await specWithHistory();
    const first = (await history(id)).revisions[2];
    const res = await revert(id, { revisionId: first.id, version: 2, reason: 'Revert from an old screen' });
    expectProblem(res, 409, 'conflict');
    expect(res.body.current).toMatchObject({ id, version: 3, max: 0.5 });
    expect((await history(id)).revisions).toHaveLength(3);
  });

  it('when the revision belongs to another spec or does not exist, responds 404', async () => {
    const a = await specWithHistory();
    const b = await specWithHistory();
    const ofB = (await history(b)).revisions[0];
    expectProblem(await revert(a, { revisionId: ofB.id, version: 3, reason: 'Wrong spec' }), 404, 'not_found');
    expectProblem(await revert(a, { revisionId: 99999999, version: 3, reason: 'No such revision' }), 404, 'not_found');
    expectProblem(await revert(99999999, { revisionId: ofB.id, version: 1, reason: 'No such spec' }), 404, 'not_found');
  });

  it.each([
    ['no reason', 'reason', { revisionId: 1, version: 1 }],
    ['no version', 'version', { revisionId: 1, reason: 'Put it back' }],
    ['no revision', 'revisionId', { version: 1, reason: 'Put it back' }],
    ['an extra field', '(root)', { revisionId: 1, version: 1, reason: 'Put it back', force: true }],
  ])('when the body has %s, responds 400 naming %s', async (_name, path, body) => {
    const res = await revert(1, body);
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });

  it('when the body is not JSON, responds 415', async () => {
    expectProblem(
      await request(app).post('/api/specs/1/revert').set(editor).type('form').send({ revisionId: '1' }),
      415,
      'unsupported_media_type',
    );
  });

  it('when not signed in, responds 401; a contributor gets 403', async () => {
    expectProblem(
      await request(app).post('/api/specs/1/revert').send({ revisionId: 1, version: 1, reason: 'Put it back' }),
      401,
    );
    expectProblem(
      await request(app)
        .post('/api/specs/1/revert')
        .set(await authHeader('contributor'))
        .send({ revisionId: 1, version: 1, reason: 'Put it back' }),
      403,
    );
  });
});
