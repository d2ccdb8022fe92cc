import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';
import { toCsv, uniqueMake, validFile, validRow } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
let editor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor');
});

const upload = (text: string, fileName = 'specs.csv') =>
  request(app)
    .post('/api/imports')
    .set(editor)
    .attach('file', Buffer.from(text, 'utf8'), { filename: fileName, contentType: 'text/csv' });
const preview = async (text: string) => (await upload(text).expect(201)).body;
const commit = (id: number, body: object = {}) => request(app).post(`/api/imports/${id}/commit`).set(editor).send(body);

async function revisionsOfMake(make: string) {
  return AppDataSource.query(
    `SELECT r.spec_id AS specId, r.version, r.origin, r.origin_ref AS originRef, r.reason, r.author_name AS author,
      r.changed_fields AS changedFields FROM spec_revisions r JOIN specs s ON s.id = r.spec_id JOIN components c ON c.id = s.component_id
      JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id WHERE mk.name = ? ORDER BY r.id`,
    [make],
  );
}

describe('POST /api/imports/:id/commit', () => {
  it('writes every accepted row and exactly one revision per changed spec, in one go', async () => {
    const make = uniqueMake();
    const batch = await preview(validFile(make, 3));
    const res = await commit(batch.id, { reason: 'Loading the invented 640 table' }).expect(200);
    expect(res.body).toMatchObject({
      id: batch.id,
      status: 'committed',
      committedByName: expect.any(String),
      counts: { created: 3 },
    });
    const created = await revisionsOfMake(make);
    expect(created).toHaveLength(3);
    expect(created[0]).toMatchObject({
      version: 1,
      origin: 'import',
      originRef: `batch #${batch.id}`,
      reason: 'Loading the invented 640 table',
    });

    const changed = toCsv([
      validRow(make, { component: 'ignition coil 1', min: '2.5' }),
      validRow(make, { component: 'ignition coil 2' }),
      validRow(make, { component: 'ignition coil 3', nominal: '2.9', notes: 'Later manual' }),
    ]);
    const second = await preview(changed);
    await commit(second.id).expect(200);
    const all = await revisionsOfMake(make);
    expect(all.slice(3)).toEqual([
      expect.objectContaining({
        version: 2,
        originRef: `batch #${second.id}`,
        changedFields: ['min'],
        reason: 'CSV import of specs.csv',
      }),
      expect.objectContaining({ version: 2, changedFields: ['nominal', 'notes'] }),
    ]);
  });

  it('records in each revision the full snapshot with the cited source as the library spells it', async () => {
    const make = uniqueMake();
    await commit((await preview(validFile(make, 1))).id).expect(200);
    const notes = 'Ω "quoted", then a\nsecond line with a \\ backslash';
    const batch = await preview(
      toCsv([
        validRow(make, { component: 'ignition coil 1', source_title: 'INVENTED  workshop manual', max: '3.3', notes }),
      ]),
    );
    expect(batch.counts).toMatchObject({ updated: 1 });
    await commit(batch.id).expect(200);
    const specId = batch.updated[0].specId;
    const history = (await request(app).get(`/api/specs/${specId}/revisions`).expect(200)).body;
    expect(history.revisions[0].snapshot).toEqual({
      parameter: 'primary winding resistance',
      min: 2.4,
      nominal: 2.8,
      max: 3.3,
      unit: 'Ω',
      mode: null,
      nearLimit: null,
      engineRpm: null,
      refTempC: 20,
      material: 'copper',
      testPoints: 'black/yellow (+) to ground',
      conditions: 'engine cold',
      notes,
      sourcePage: '5-12',
      sourceId: expect.any(Number),
      sourceTitle: 'Invented Workshop Manual',
      sourceEdition: '2nd edition',
      status: 'published',
    });
    expect(history.revisions[0].changes).toEqual([
      { field: 'max', before: 3.2, after: 3.3 },
      { field: 'notes', before: null, after: notes },
    ]);
  });

  it('when rows were rejected, writes only the accepted ones', async () => {
    const make = uniqueMake();
    const text = toCsv([
      validRow(make),
      validRow(make, { component: 'stator', unit: 'ohmz' }),
      validRow(make, { component: 'pickup coil', min: 'x' }),
    ]);
    const batch = await preview(text);
    expect(batch.counts).toMatchObject({ created: 1, rejected: 2 });
    await commit(batch.id).expect(200);
    expect(await revisionsOfMake(make)).toHaveLength(1);
  });

  it('when the same file is imported again, finds every row unchanged and changes nothing', async () => {
    const make = uniqueMake();
    const text = validFile(make, 4);
    await commit((await preview(text)).id).expect(200);
    const [{ n: before }] = await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions');
    const again = await preview(text);
    expect(again.counts).toMatchObject({ created: 0, updated: 0, unchanged: 4, rejected: 0 });
    await commit(again.id).expect(200);
    const [{ n: after }] = await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions');
    expect(Number(after)).toBe(Number(before));
    expect((await revisionsOfMake(make)).every((r: { version: number }) => r.version === 1)).toBe(true);
  });

  it('commits a batch once: a second commit responds 409, in sequence or in parallel', async () => {
    const batch = await preview(validFile(uniqueMake(), 2));
    await commit(batch.id).expect(200);
    const res = await commit(batch.id);
    expectProblem(res, 409, 'conflict');
    expect(res.body.detail).toMatch(/already committed/);

    const make = uniqueMake();
    const racing = await preview(validFile(make, 2));
    const results = await Promise.all([commit(racing.id), commit(racing.id)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect(await revisionsOfMake(make)).toHaveLength(2);
  });

  it('when a spec was edited after the preview, responds 409 and writes nothing', async () => {
    const make = uniqueMake();
    await commit((await preview(validFile(make, 2))).id).expect(200);
    const stale = await preview(
      toCsv([
        validRow(make, { component: 'ignition coil 1', max: '3.3' }),
        validRow(make, { component: 'ignition coil 2', max: '3.3' }),
        validRow(make, { component: 'new coil' }),
      ]),
    );
    const specId = stale.updated[1].specId;
    await AppDataSource.query('UPDATE specs SET notes = ?, version = version + 1 WHERE id = ?', [
      'edited meanwhile',
      specId,
    ]);
    const before = await revisionsOfMake(make);
    const res = await commit(stale.id);
    expectProblem(res, 409, 'conflict');
    expect(res.body).toMatchObject({ line: 3, specId });
    expect(await revisionsOfMake(make)).toEqual(before);
    const [{ n }] = await AppDataSource.query(
      "SELECT COUNT(*) AS n FROM components c JOIN vehicle_models vm ON vm.id = c.model_id JOIN makes mk ON mk.id = vm.make_id WHERE mk.name = ? AND c.name = 'new coil'",
      [make],
    );
    expect(Number(n)).toBe(0);
  });

  it('when the batch failed validation, responds 422', async () => {
    const failed = await upload('');
    expect(failed.status).toBe(422);
    expectProblem(await commit(failed.body.batchId), 422, 'unprocessable');
  });

  it.each([
    ['an unknown batch', 404, 999999, {}],
    ['an id that is not a number', 400, 'abc', {}],
    ['a reason that is too short', 400, 1, { reason: 'x' }],
    ['an unknown body field', 400, 1, { force: true }],
  ] as const)('for %s, responds %d', async (_name, status, id, body) => {
    expectProblem(await request(app).post(`/api/imports/${id}/commit`).set(editor).send(body), status);
  });

  it('when the body is not JSON, responds 415', async () => {
    expectProblem(
      await request(app).post('/api/imports/1/commit').set(editor).set('Content-Type', 'text/plain').send('reason'),
      415,
      'unsupported_media_type',
    );
  });

  it('when not signed in, responds 401; a contributor gets 403', async () => {
    expectProblem(await request(app).post('/api/imports/1/commit'), 401);
    expectProblem(
      await request(app)
        .post('/api/imports/1/commit')
        .set(await authHeader('contributor')),
      403,
    );
  });
});

describe('GET /api/imports/:id and GET /api/imports', () => {
  it('returns the stored preview, and after the commit the created spec ids', async () => {
    const batch = await preview(validFile(uniqueMake(), 2));
    const stored = await request(app).get(`/api/imports/${batch.id}`).set(editor).expect(200);
    expect(stored.body).toEqual(batch);
    await commit(batch.id).expect(200);
    const after = await request(app).get(`/api/imports/${batch.id}`).set(editor).expect(200);
    expect(after.body.status).toBe('committed');
    expect(after.body.created.every((r: { specId: number | null }) => typeof r.specId === 'number')).toBe(true);
  });

  it('returns a failed batch with its file errors', async () => {
    const failed = await upload('make;model\r\n');
    const res = await request(app).get(`/api/imports/${failed.body.batchId}`).set(editor).expect(200);
    expect(res.body).toMatchObject({
      status: 'failed',
      fileErrors: [{ line: 1, reason: expect.stringMatching(/semicolons/) }],
    });
  });

  it('lists recent batches, newest first, up to the limit', async () => {
    const a = await preview(validFile(uniqueMake(), 1));
    const b = await preview(validFile(uniqueMake(), 1));
    const res = await request(app).get('/api/imports').query({ limit: 2 }).set(editor).expect(200);
    expect(res.body.map((x: { id: number }) => x.id)).toEqual([b.id, a.id]);
    expect(res.body[0]).not.toHaveProperty('created');
  });

  it.each([
    ['/api/imports/999999', 404],
    ['/api/imports/abc', 400],
    ['/api/imports?limit=500', 400],
    ['/api/imports/1?offset=-1', 400],
  ])('GET %s responds %d', async (url, status) => {
    expectProblem(await request(app).get(url).set(editor), status);
  });

  it('is for editors: 401 without a session, 403 for a contributor', async () => {
    expectProblem(await request(app).get('/api/imports'), 401);
    expectProblem(
      await request(app)
        .get('/api/imports/1')
        .set(await authHeader('contributor')),
      403,
    );
  });
});
