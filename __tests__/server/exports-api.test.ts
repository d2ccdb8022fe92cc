import request from 'supertest';
import { createApp } from '@/server/app';
import { SPEC_CSV_COLUMNS } from '@/lib/csv';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { toCsv, uniqueMake, validRow } from '../fixtures/csv/rows';

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
const exportCsv = (query: Record<string, string | number> = {}) =>
  request(app)
    .get('/api/exports/specs.csv')
    .query(query)
    .set(editor)
    .buffer(true)
    .parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => {
        text += c;
      });
      res.on('end', () => done(null, text));
    });

/** Imports and commits; returns the created spec ids by line. */
async function importNow(text: string): Promise<number[]> {
  const batch = (await upload(text).expect(201)).body;
  await request(app).post(`/api/imports/${batch.id}/commit`).set(editor).expect(200);
  const stored = (await request(app).get(`/api/imports/${batch.id}`).set(editor).expect(200)).body;
  return stored.created.map((r: { specId: number }) => r.specId);
}

const FORMULAS = {
  test_points: '=HYPERLINK("http://attacker.example","click")',
  conditions: '+1 reading after 5 s',
  notes: '-5 V is normal here; @SUM(A1:A9) is not a formula',
  source_page: '@7-12',
};

describe('GET /api/exports/specs.csv', () => {
  it('exports in the import format: header, CRLF records, quoted cells (RFC 4180)', async () => {
    const make = uniqueMake();
    await importNow(toCsv([validRow(make, { variant: '640 cc, EU', notes: 'say "hello"\nthen wait' })]));
    const res = await exportCsv({ make }).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?specbench-specs-testmake-/);
    const text: string = res.body;
    expect(text.startsWith(`\uFEFF${SPEC_CSV_COLUMNS.join(',')}\r\n`)).toBe(true);
    // Source: RFC 4180 §2 — every record ends in CRLF (rule 1); a field holding a comma, quote or line break is quoted (rule 6) and inner quotes are doubled (rule 7).
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text).toContain(',"640 cc, EU",');
    expect(text).toContain('"say ""hello""\nthen wait"');
  });

  it('when exported and imported again, every row is unchanged (one make, one model, and the whole library)', async () => {
    const make = uniqueMake();
    await importNow(
      toCsv([
        validRow(make, FORMULAS),
        validRow(make, {
          component: 'spark plug',
          parameter: 'electrode gap',
          min: '0.7',
          nominal: '',
          max: '0.8',
          unit: 'mm',
          material: '',
          ref_temp_c: '',
          source_url: 'https://manuals.example/quillon',
        }),
      ]),
    );
    for (const query of [{ make }, {}] as Record<string, string>[]) {
      const exported: string = (await exportCsv(query).expect(200)).body;
      const again = (await upload(exported).expect(201)).body;
      expect(again.counts).toMatchObject({ created: 0, updated: 0, rejected: 0 });
      expect(again.counts.unchanged).toBe(exported.trim().split('\r\n').length - 1);
    }
  });

  it('keeps cells that start with = + - @ as text and neutralises them on export', async () => {
    const make = uniqueMake();
    const [specId] = await importNow(toCsv([validRow(make, FORMULAS)]));
    const spec = (await request(app).get(`/api/specs/${specId}`).expect(200)).body;
    // Stored and shown exactly as typed, never evaluated.
    expect(spec).toMatchObject({
      testPoints: FORMULAS.test_points,
      conditions: FORMULAS.conditions,
      notes: FORMULAS.notes,
      sourcePage: FORMULAS.source_page,
    });
    const text: string = (await exportCsv({ make }).expect(200)).body;
    // Source: OWASP CSV Injection; CWE-1236 — a cell starting with = + - @ is prefixed with ' and quoted.
    expect(text).toContain(`"'=HYPERLINK(""http://attacker.example"",""click"")"`);
    expect(text).toContain(`"'+1 reading after 5 s"`);
    expect(text).toContain(`"'-5 V is normal here; @SUM(A1:A9) is not a formula"`);
    expect(text).toContain(`"'@7-12"`);
    const cells = text.split('\r\n')[1];
    expect(cells).not.toMatch(/(^|,)[=+@]/);
  });

  it('exports one model with ?modelId=', async () => {
    const make = uniqueMake();
    const [specId] = await importNow(toCsv([validRow(make), validRow(make, { model: 'Quillon 800' })]));
    const modelId = (await request(app).get(`/api/specs/${specId}`).expect(200)).body.model.id;
    const lines = ((await exportCsv({ modelId }).expect(200)).body as string).trim().split('\r\n');
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(`${make},Quillon 640,`);
  });

  it.each([
    [{ make: 'No Such Make Anywhere' }, 404],
    [{ modelId: 999999 }, 404],
    [{ modelId: 'abc' }, 400],
    [{ make: 'Kestrel Moto', modelId: 1 }, 400],
  ])('for %j responds %d problem details', async (query, status) => {
    const res = await request(app).get('/api/exports/specs.csv').query(query).set(editor);
    expect(res.status).toBe(status);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  });

  it('is for editors: 401 without a session, 403 for a contributor', async () => {
    expect((await request(app).get('/api/exports/specs.csv')).status).toBe(401);
    expect(
      (
        await request(app)
          .get('/api/exports/specs.csv')
          .set(await authHeader('contributor'))
      ).status,
    ).toBe(403);
  });
});
