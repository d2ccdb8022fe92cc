import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { COLUMN_REFERENCE } from '@/lib/csv';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';
import { malformedCorpus } from '../fixtures/csv/corpus';
import { toCsv, uniqueMake, validFile, validRow } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
let editor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor');
});

const upload = (bytes: Buffer | string, fileName = 'specs.csv', contentType = 'text/csv') =>
  request(app)
    .post('/api/imports')
    .set(editor)
    .attach('file', Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes, 'utf8'), { filename: fileName, contentType });
const commit = (id: number, body: object = {}) => request(app).post(`/api/imports/${id}/commit`).set(editor).send(body);

async function tableCounts() {
  const [row] =
    await AppDataSource.query(`SELECT (SELECT COUNT(*) FROM specs) AS specs, (SELECT COUNT(*) FROM spec_revisions) AS revisions,
    (SELECT COUNT(*) FROM makes) AS makes, (SELECT COUNT(*) FROM sources) AS sources, (SELECT COUNT(*) FROM import_batch_rows) AS staged`);
  return Object.fromEntries(Object.entries(row).map(([k, v]) => [k, Number(v)]));
}

describe('POST /api/imports (preview)', () => {
  it('when the file is valid, responds 201 with the rows grouped and writes nothing but the batch', async () => {
    const make = uniqueMake();
    const before = await tableCounts();
    const res = await upload(validFile(make, 3)).expect(201);
    expect(res.headers.location).toBe(`/api/imports/${res.body.id}`);
    expect(res.body).toMatchObject({
      status: 'previewed',
      fileName: 'specs.csv',
      counts: { created: 3, updated: 0, unchanged: 0, rejected: 0 },
    });
    expect(res.body.created.map((r: { line: number }) => r.line)).toEqual([2, 3, 4]);
    expect(res.body.created[0]).toMatchObject({
      make,
      component: 'ignition coil 1',
      display: expect.stringMatching(/Ω/),
      specId: null,
    });
    const after = await tableCounts();
    expect({ ...after, staged: 0 }).toEqual({ ...before, staged: 0 });
  });

  it('when a row differs from the library, lists it as updated with each field before → after', async () => {
    const make = uniqueMake();
    await commit((await upload(validFile(make, 2)).expect(201)).body.id).expect(200);
    const changed = toCsv([
      validRow(make, { component: 'ignition coil 1', max: '3.4', notes: 'Re-measured' }),
      validRow(make, { component: 'ignition coil 2' }),
    ]);
    const res = await upload(changed).expect(201);
    expect(res.body.counts).toMatchObject({ created: 0, updated: 1, unchanged: 1 });
    expect(res.body.updated[0].changes).toEqual([
      { field: 'max', before: 3.2, after: 3.4 },
      { field: 'notes', before: null, after: 'Re-measured' },
    ]);
    expect(res.body.unchanged[0]).toMatchObject({ line: 3, specId: expect.any(Number) });
  });

  it('accepts a BOM, LF line endings and quoted newlines, with true line numbers', async () => {
    const make = uniqueMake();
    const text =
      '\uFEFF' +
      toCsv(
        [
          validRow(make, { notes: 'first line\nsecond line' }),
          validRow(make, {
            component: 'stator',
            parameter: 'stator winding resistance',
            min: '0.2',
            nominal: '',
            max: '9.5',
            unit: 'V',
          }),
        ],
        { eol: '\n' },
      );
    const res = await upload(text).expect(201);
    expect(res.body.counts).toMatchObject({ created: 1, rejected: 1 });
    expect(res.body.rejected).toEqual([
      { line: 4, column: 'unit', reason: expect.stringMatching(/needs a resistance unit/) },
    ]);
  });

  it('when a value is valid but implausible, accepts the row with a warning', async () => {
    const res = await upload(toCsv([validRow(uniqueMake(), { min: '', nominal: '45', max: '' })])).expect(201);
    expect(res.body.counts).toMatchObject({ created: 1, warnings: 1 });
    expect(res.body.created[0].warnings).toEqual([
      { line: 2, column: 'nominal', reason: expect.stringMatching(/unusual for an ignition primary winding/) },
    ]);
  });

  it('pages each group with offset and limit, keeping the totals', async () => {
    const res = await upload(validFile(uniqueMake(), 5)).query({ offset: 1, limit: 2 }).expect(201);
    expect(res.body.created.map((r: { line: number }) => r.line)).toEqual([3, 4]);
    expect(res.body).toMatchObject({ counts: { created: 5 }, page: { offset: 1, limit: 2 } });
  });
});

describe('POST /api/imports — the bad-input corpus', () => {
  const make = uniqueMake('Corpus');
  const corpus = malformedCorpus(make);

  it('holds at least 30 malformed files', () => {
    expect(corpus.length).toBeGreaterThanOrEqual(30);
  });

  it.each(corpus.map((c) => [c.name, c] as const))(
    '%s: answers with a located error and writes nothing',
    async (_name, c) => {
      const before = await tableCounts();
      const res = await upload(c.bytes, c.fileName);
      if (c.status === 422) {
        expectProblem(res, 422, 'unprocessable');
        expect(res.body.errors).toEqual(
          expect.arrayContaining([{ path: c.path, message: expect.stringMatching(c.message) }]),
        );
        const [batch] = await AppDataSource.query('SELECT status FROM import_batches WHERE id = ?', [res.body.batchId]);
        expect(batch.status).toBe('failed');
        expect(await tableCounts()).toEqual(before);
      } else {
        expect(res.status).toBe(201);
        expect(res.body.rejected).toEqual(
          expect.arrayContaining([{ line: c.line, column: c.column, reason: expect.stringMatching(c.reason) }]),
        );
        expect(res.body.rejected.every((p: { line: number }) => p.line === c.line)).toBe(true);
        expect((await tableCounts()).specs).toBe(before.specs);
      }
    },
  );

  it('when a file is over 10 MB, responds 413 problem details and keeps no batch', async () => {
    const [{ n }] = await AppDataSource.query('SELECT COUNT(*) AS n FROM import_batches');
    const big = Buffer.alloc(20 * 1024 * 1024, 'a');
    expectProblem(await upload(big, 'huge.csv'), 413, 'payload_too_large');
    expect(Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM import_batches'))[0].n)).toBe(Number(n));
  });

  it.each([
    ['specs.xlsx', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'],
    ['specs.txt', 'text/plain'],
  ])('when the file is %s (%s), responds 415', async (fileName, type) => {
    expectProblem(await upload(validFile(uniqueMake()), fileName, type), 415, 'unsupported_media_type');
  });

  it('when the body is JSON instead of a multipart form, responds 415', async () => {
    expectProblem(await request(app).post('/api/imports').set(editor).send({ file: 'make,model' }), 415);
  });

  it.each([
    ['the form has no file', (r: request.Test) => r.field('note', 'hello')],
    ['the file is in another field', (r: request.Test) => r.attach('upload', Buffer.from('x'), 'specs.csv')],
  ])('when %s, responds 400', async (_name, build) => {
    expectProblem(await build(request(app).post('/api/imports').set(editor)), 400, 'validation_failed');
  });

  it('when the query is not valid, responds 400 naming it', async () => {
    const res = await upload(validFile(uniqueMake())).query({ limit: '0' });
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors[0].path).toBe('limit');
  });

  it('when not signed in, responds 401; a contributor gets 403', async () => {
    expectProblem(await request(app).post('/api/imports').attach('file', Buffer.from('x'), 'a.csv'), 401);
    expectProblem(
      await request(app)
        .post('/api/imports')
        .set(await authHeader('contributor'))
        .attach('file', Buffer.from('x'), 'a.csv'),
      403,
    );
  });
});

describe('GET /api/imports/template.csv and /columns', () => {
  it('serves the template in the import format, to anyone', async () => {
    const res = await request(app).get('/api/imports/template.csv').expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?spec-template.csv"?/);
    expect(res.text.split(/\r?\n/)[0]).toBe(COLUMN_REFERENCE.map((c) => c.column).join(','));
  });

  it('serves the column reference as JSON', async () => {
    const res = await request(app).get('/api/imports/columns').expect(200);
    expect(res.body).toEqual(COLUMN_REFERENCE);
  });
});
