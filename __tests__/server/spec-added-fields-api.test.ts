/**
 * The fields added to the spec field list later (mode, near_limit, engine_rpm): they reach
 * every place the list drives — CSV import and export, the staged rows, the spec card, the
 * editor's PATCH and the revision history — and a file made before they existed still
 * imports without clearing them. Invented makes and values.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { expectProblem } from '../helpers/problems';
import { toCsv, uniqueMake, validRow } from '../fixtures/csv/rows';
import { SPEC_CSV_COLUMNS } from '@/lib/csv';

useTestDatabase();
const app = createApp({ webDist: null });
let editor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor');
});

const OLD_COLUMNS = SPEC_CSV_COLUMNS.filter((c) => !['mode', 'near_limit', 'engine_rpm'].includes(c));
const stator = (make: string, over = {}) =>
  validRow(make, {
    component: 'stator',
    parameter: 'stator output voltage',
    min: '50',
    nominal: '',
    max: '70',
    unit: 'V',
    ref_temp_c: '',
    material: 'none',
    mode: 'ac_voltage',
    near_limit: '1.5',
    engine_rpm: '5000',
    ...over,
  });

async function importCsv(text: string) {
  const batch = (
    await request(app)
      .post('/api/imports')
      .set(editor)
      .attach('file', Buffer.from(text, 'utf8'), { filename: 'specs.csv', contentType: 'text/csv' })
      .expect(201)
  ).body;
  await request(app).post(`/api/imports/${batch.id}/commit`).set(editor).send({}).expect(200);
  return batch;
}

async function specOf(make: string) {
  const [{ specId }] = await AppDataSource.query(
    `SELECT s.id AS specId FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models vm ON vm.id = c.model_id
      JOIN makes mk ON mk.id = vm.make_id WHERE mk.name = ?`,
    [make],
  );
  return (await request(app).get(`/api/specs/${specId}`).expect(200)).body;
}

describe('mode, near_limit and engine_rpm', () => {
  it('are imported from CSV and shown on the spec card', async () => {
    const make = uniqueMake();
    await importCsv(toCsv([stator(make)]));
    const spec = await specOf(make);
    expect(spec).toMatchObject({ mode: 'ac_voltage', nearLimit: 1.5, engineRpm: 5000 });
  });

  it('when a file predates the columns, imports it and keeps the values the spec has', async () => {
    const make = uniqueMake();
    await importCsv(toCsv([stator(make)]));
    const batch = await importCsv(toCsv([stator(make, { max: '72' })], { columns: [...OLD_COLUMNS] }));
    expect(batch.counts).toMatchObject({ updated: 1 });
    const spec = await specOf(make);
    expect(spec).toMatchObject({ max: 72, mode: 'ac_voltage', nearLimit: 1.5, engineRpm: 5000 });
  });

  it('when the cells are empty, clears them', async () => {
    const make = uniqueMake();
    await importCsv(toCsv([stator(make)]));
    await importCsv(toCsv([stator(make, { mode: '', near_limit: '', engine_rpm: '' })]));
    expect(await specOf(make)).toMatchObject({ mode: null, nearLimit: null, engineRpm: null });
  });

  it('refuses a mode the list does not know, naming the column', async () => {
    const make = uniqueMake();
    const res = await request(app)
      .post('/api/imports')
      .set(editor)
      .attach('file', Buffer.from(toCsv([stator(make, { mode: 'ohms' })]), 'utf8'), {
        filename: 'specs.csv',
        contentType: 'text/csv',
      });
    expect(res.status).toBe(201);
    expect(res.body.counts).toMatchObject({ created: 0, rejected: 1 });
    expect(res.body.rejected).toEqual([
      expect.objectContaining({ line: 2, column: 'mode', reason: expect.stringMatching(/mode "ohms" is not allowed/) }),
    ]);
  });

  it('are set by the editor, kept in the history and exported', async () => {
    const make = uniqueMake();
    await importCsv(toCsv([stator(make, { mode: '', near_limit: '', engine_rpm: '' })]));
    const before = await specOf(make);
    const patched = await request(app)
      .patch(`/api/specs/${before.id}`)
      .set(editor)
      .send({ version: before.version, reason: 'Manual states AC at 5000 rpm', mode: 'ac_voltage', engineRpm: 5000 })
      .expect(200);
    expect(patched.body).toMatchObject({ mode: 'ac_voltage', engineRpm: 5000, nearLimit: null });
    const history = (await request(app).get(`/api/specs/${before.id}/revisions`).set(editor).expect(200)).body;
    expect(history.revisions[0].changes).toEqual(
      expect.arrayContaining([
        { field: 'mode', before: null, after: 'ac_voltage' },
        { field: 'engineRpm', before: null, after: 5000 },
      ]),
    );
    const csv = await request(app).get('/api/exports/specs.csv').query({ make }).set(editor).expect(200);
    const [header, row] = csv.text.split('\r\n');
    const cells = header.split(',');
    const values = row.split(',');
    expect(values[cells.indexOf('mode')]).toBe('ac_voltage');
    expect(values[cells.indexOf('engine_rpm')]).toBe('5000');
  });

  it('refuses an engine speed outside 0–30000 rpm and an unknown mode in PATCH', async () => {
    const make = uniqueMake();
    await importCsv(toCsv([stator(make)]));
    const spec = await specOf(make);
    const res = await request(app)
      .patch(`/api/specs/${spec.id}`)
      .set(editor)
      .send({ version: spec.version, reason: 'typo check', engineRpm: 90000, mode: 'ohms' });
    expectProblem(res, 400);
    const paths = res.body.errors.map((e: { path: string }) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['engineRpm', 'mode']));
  });
});
