/**
 * The importer at scale (issue 14): the row limit, rejected rows capped in the preview,
 * the staged-row cleanup (safe when several processes run it at once), and an import
 * commit logged in library_changes for every process to follow.
 */
import { setTimeout as sleep } from 'node:timers/promises';
import request from 'supertest';
import { SPEC_CSV_COLUMNS } from '@/lib/csv';
import { MAX_CSV_ROWS } from '@/lib/csv/parse';
import { MAX_REJECTED_KEPT } from '@/lib/csv/validate';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { cleanUpImports } from '@/server/modules/imports/import-cleanup';
import { PREVIEWS_AT_ONCE } from '@/server/modules/imports/import.service';
import * as transactions from '@/server/db/deadlock-retry';
import { lastChangeId } from '@/server/modules/library/library-changes';
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

const upload = (text: string) =>
  request(app)
    .post('/api/imports')
    .set(editor)
    .attach('file', Buffer.from(text, 'utf8'), { filename: 'specs.csv', contentType: 'text/csv' });
const staged = async (batchId: number) =>
  Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM import_batch_rows WHERE batch_id = ?', [batchId]))[0].n);
const statusOf = async (batchId: number) =>
  (await AppDataSource.query('SELECT status FROM import_batches WHERE id = ?', [batchId]))[0].status;

describe('POST /api/imports limits', () => {
  it('when the file has more rows than the limit, responds 413 and stages nothing', async () => {
    const before = Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM import_batches'))[0].n);
    const text = `${SPEC_CSV_COLUMNS.join(',')}\n${'x\n'.repeat(MAX_CSV_ROWS + 1)}`;
    const res = await upload(text);
    expectProblem(res, 413, 'payload_too_large');
    expect(res.body.detail).toMatch(/more than 200,000 rows/);
    expect(Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM import_batches'))[0].n)).toBe(before);
  });

  it('rejected rows beyond the cap are counted but not listed', async () => {
    const make = uniqueMake();
    const bad = Array.from({ length: MAX_REJECTED_KEPT + 50 }, (_, i) =>
      validRow(make, { model: `M${i}`, unit: 'furlong' }),
    );
    const res = await upload(toCsv([validRow(make), ...bad])).expect(201);
    expect(res.body.counts).toMatchObject({ created: 1, rejected: MAX_REJECTED_KEPT + 50 });
    expect(await staged(res.body.id)).toBe(1 + MAX_REJECTED_KEPT);
  });

  it('previews a burst of uploads all, no more than PREVIEWS_AT_ONCE at a time', async () => {
    // Each preview holds its transaction's connection and reads through a second one: unbounded,
    // a burst as large as the pool would leave every transaction waiting for a connection.
    let running = 0;
    let most = 0;
    const real = transactions.writeTransaction;
    const spy = jest.spyOn(transactions, 'writeTransaction').mockImplementation(async (work) => {
      running += 1;
      most = Math.max(most, running);
      try {
        return await real(work);
      } finally {
        running -= 1;
      }
    });
    try {
      const makes = Array.from({ length: PREVIEWS_AT_ONCE + 3 }, () => uniqueMake('Burstmake'));
      const answers = await Promise.all(makes.map((make) => upload(validFile(make, 40))));
      expect(answers.map((a) => a.status)).toEqual(makes.map(() => 201));
      expect(answers.map((a) => a.body.counts.created)).toEqual(makes.map(() => 40));
      expect(most).toBeGreaterThan(0);
      expect(most).toBeLessThanOrEqual(PREVIEWS_AT_ONCE);
    } finally {
      spy.mockRestore();
    }
  });
});

describe('staged-row cleanup', () => {
  it('closes previews older than a day and superseded ones, and removes the staged rows of committed batches', async () => {
    const old = (await upload(validFile(uniqueMake(), 3)).expect(201)).body.id;
    await AppDataSource.query('UPDATE import_batches SET created_at = NOW(3) - INTERVAL 25 HOUR WHERE id = ?', [old]);
    const file = validFile(uniqueMake(), 2);
    const first = (await upload(file).expect(201)).body.id;
    const second = (await upload(file).expect(201)).body.id;
    const committed = (await upload(validFile(uniqueMake(), 2)).expect(201)).body.id;
    await request(app).post(`/api/imports/${committed}/commit`).set(editor).send({}).expect(200);
    const fresh = (await upload(validFile(uniqueMake(), 2)).expect(201)).body.id;

    // Two processes at once: each batch is closed once and nothing fails.
    await Promise.all([cleanUpImports(), cleanUpImports()]);

    expect(await statusOf(old)).toBe('failed');
    expect(await statusOf(first)).toBe('failed');
    expect(await statusOf(second)).toBe('previewed');
    expect(await statusOf(fresh)).toBe('previewed');
    for (const id of [old, first, committed]) expect(await staged(id)).toBe(0);
    expect(await staged(second)).toBe(2);
    expectProblem(await request(app).post(`/api/imports/${old}/commit`).set(editor).send({}), 422);
  });

  it('deletes dead rows without waiting on a preview that is still staging its own', async () => {
    const committed = (await upload(validFile(uniqueMake(), 2)).expect(201)).body.id;
    await request(app).post(`/api/imports/${committed}/commit`).set(editor).send({}).expect(200);
    // A preview halfway through: its batch and first rows written, its transaction still open.
    const staging = AppDataSource.createQueryRunner();
    await staging.connect();
    await staging.startTransaction();
    try {
      const { insertId } = await staging.query(
        `INSERT INTO import_batches (file_name, sha256, file_size, counts, row_errors, status, uploader_name)
         VALUES ('staging.csv', REPEAT('a', 64), 1, '{}', '[]', 'previewed', 'test')`,
      );
      await staging.query(
        `INSERT INTO import_batch_rows (batch_id, line, action) VALUES (?, 2, 'create'), (?, 3, 'create')`,
        [insertId, insertId],
      );
      const outcome = await Promise.race([cleanUpImports().then(() => 'done'), sleep(5000).then(() => 'waited')]);
      expect(outcome).toBe('done');
      expect(await staged(committed)).toBe(0);
    } finally {
      await staging.rollbackTransaction();
      await staging.release();
    }
  });
});

describe('import commit and library_changes', () => {
  it('logs every spec the commit wrote, in the same transaction', async () => {
    const before = await lastChangeId();
    const batch = (await upload(validFile(uniqueMake(), 4)).expect(201)).body.id;
    await request(app).post(`/api/imports/${batch}/commit`).set(editor).send({}).expect(200);
    const rows = await AppDataSource.query('SELECT spec_id AS specId FROM library_changes WHERE id > ?', [before]);
    const specs = await AppDataSource.query(
      'SELECT spec_id AS specId FROM spec_revisions WHERE origin_ref = ? ORDER BY spec_id',
      [`batch #${batch}`],
    );
    expect(rows.map((r: { specId: number }) => r.specId).sort()).toEqual(
      specs.map((r: { specId: number }) => r.specId).sort(),
    );
    expect(rows).toHaveLength(4);
  });
});
