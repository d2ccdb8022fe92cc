import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { fakeSmtp } from '@/server/modules/mail/fake-smtp';
import { useTestDatabase } from '../helpers/test-db';
import { drainOutbox, useFakeMail } from '../helpers/mail';
import { authHeader, testUser } from '../helpers/auth';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });

type SpecRow = {
  id: number;
  version: number;
  unit: string;
  min: number;
  max: number;
  componentId: number;
  modelId: number;
};
let pick = 0;
/** A different resistance spec for each test, so tests do not see each other's revisions. */
async function freshSpec(): Promise<SpecRow> {
  const rows: SpecRow[] =
    await AppDataSource.query(`SELECT s.id, s.version, s.unit, s.min_value AS min, s.max_value AS max, s.component_id AS componentId, c.model_id AS modelId
    FROM specs s JOIN components c ON c.id = s.component_id WHERE s.quantity_kind = 'resistance' AND s.min_value IS NOT NULL AND s.max_value IS NOT NULL ORDER BY s.id`);
  return rows[(pick += 1) % rows.length];
}
const citation = { title: 'Invented Service Bulletin SB-12', edition: 'Rev. 2', page: '4' };
const revisions = async (specId: number) =>
  Number((await AppDataSource.query('SELECT COUNT(*) AS n FROM spec_revisions WHERE spec_id = ?', [specId]))[0].n);

async function proposeChange(spec: SpecRow, who = 'proposer-1', values: Record<string, unknown> = {}) {
  const res = await request(app)
    .post('/api/corrections')
    .set(await authHeader('contributor', who))
    .send({
      kind: 'change',
      specId: spec.id,
      version: spec.version,
      citation,
      rationale: 'Later bulletin raises the upper limit.',
      values: { min: spec.min, max: Number((spec.max * 1.1).toFixed(3)), unit: spec.unit, ...values },
    });
  expect(res.status).toBe(201);
  return res.body as { id: number };
}

describe('POST /api/corrections', () => {
  it('refuses a gap proposed in ohms, with a clear message', async () => {
    const [gap] = await AppDataSource.query(
      "SELECT id, version FROM specs WHERE parameter LIKE '%gap%' AND quantity_kind = 'length' LIMIT 1",
    );
    const res = await request(app)
      .post('/api/corrections')
      .set(await authHeader('contributor'))
      .send({
        kind: 'change',
        specId: gap.id,
        version: gap.version,
        citation,
        rationale: 'Typo in the manual table.',
        values: { min: 0.6, max: 0.7, unit: 'ohm' },
      });
    expect(res.status).toBe(422);
    expect(res.body.errors[0]).toMatchObject({ path: 'values.unit', message: expect.stringMatching(/length unit/) });
  });

  it.each([
    [{ citation: { title: '', page: '4' } }, 'citation.title'],
    [{ citation: { title: 'x', page: '' } }, 'citation.page'],
    [{ rationale: 'short' }, 'rationale'],
  ])('refuses %j', async (patch, field) => {
    const spec = await freshSpec();
    const res = await request(app)
      .post('/api/corrections')
      .set(await authHeader('contributor'))
      .send({
        kind: 'change',
        specId: spec.id,
        version: spec.version,
        citation,
        rationale: 'A good long reason.',
        values: { min: 1, max: 2, unit: spec.unit },
        ...patch,
      });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
  });

  it('anonymous → 401', async () => {
    expect((await request(app).post('/api/corrections').send({})).status).toBe(401);
  });

  it('e-mails every editor about the new proposal', async () => {
    await testUser('editor', 'mail-editor');
    await proposeChange(await freshSpec());
    await drainOutbox();
    expect(
      fakeSmtp.messages.some((m) => m.to.includes('mail-editor@') && /Correction #\d+ to review/.test(m.subject)),
    ).toBe(true);
  });
});

describe('accept and reject', () => {
  it('accept creates exactly one revision, origin correction, crediting the proposer, and mails the decision', async () => {
    const spec = await freshSpec();
    const proposer = await testUser('contributor', 'credited');
    const c = await proposeChange(spec, 'credited');
    const before = await revisions(spec.id);
    const res = await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await authHeader('editor'))
      .send({ note: 'Matches bulletin.' })
      .expect(200);
    expect(res.body.status).toBe('accepted');
    expect(await revisions(spec.id)).toBe(before + 1);
    const card = (await request(app).get(`/api/specs/${spec.id}`).expect(200)).body;
    expect(card.max).toBeCloseTo(Number((spec.max * 1.1).toFixed(3)), 9);
    expect(card.revisions[0]).toMatchObject({
      origin: 'correction',
      originRef: `correction #${c.id}`,
      authorName: expect.stringContaining('Test credited'),
    });
    expect(card.source.title).toBe(citation.title);
    await drainOutbox();
    expect(fakeSmtp.messages.some((m) => m.to.includes(proposer.email) && /accepted/.test(m.subject))).toBe(true);
  });

  it('reject stores the note and changes nothing', async () => {
    const spec = await freshSpec();
    const c = await proposeChange(spec);
    const before = await revisions(spec.id);
    const res = await request(app)
      .post(`/api/corrections/${c.id}/reject`)
      .set(await authHeader('editor'))
      .send({ note: 'The bulletin covers the later frame only.' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'rejected', decisionNote: 'The bulletin covers the later frame only.' });
    expect(await revisions(spec.id)).toBe(before);
    expect(
      (
        await request(app)
          .post(`/api/corrections/${c.id}/reject`)
          .set(await authHeader('editor'))
          .send({})
      ).status,
    ).toBe(400);
  });

  it('a stale proposal needs confirmation; the editor sees all three versions', async () => {
    const spec = await freshSpec();
    const c = await proposeChange(spec);
    await request(app)
      .patch(`/api/specs/${spec.id}`)
      .set(await authHeader('editor'))
      .send({ version: spec.version, reason: 'Manual reprint', conditions: 'engine cold (reprint)' })
      .expect(200);
    const res = await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await authHeader('editor'))
      .send({});
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('stale_proposal');
    const conditions = res.body.review.fields.find((f: { field: string }) => f.field === 'conditions');
    expect(conditions.current).toBe('engine cold (reprint)');
    expect(conditions.proposedAgainst).not.toBe('engine cold (reprint)');
    await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await authHeader('editor'))
      .send({ confirmStale: true })
      .expect(200);
  });

  it('a withdrawn proposal cannot be accepted', async () => {
    const c = await proposeChange(await freshSpec(), 'withdrawer');
    await request(app)
      .post(`/api/corrections/${c.id}/withdraw`)
      .set(await authHeader('contributor', 'withdrawer'))
      .expect(200);
    const res = await request(app)
      .post(`/api/corrections/${c.id}/accept`)
      .set(await authHeader('editor'))
      .send({});
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('already_decided');
  });

  it('a contributor cannot accept', async () => {
    const c = await proposeChange(await freshSpec());
    expect(
      (
        await request(app)
          .post(`/api/corrections/${c.id}/accept`)
          .set(await authHeader('contributor'))
          .send({})
      ).status,
    ).toBe(403);
  });

  it('two editors deciding at once: one wins, the other is told', async () => {
    const spec = await freshSpec();
    const c = await proposeChange(spec);
    const before = await revisions(spec.id);
    const [a, b] = await Promise.all([
      request(app)
        .post(`/api/corrections/${c.id}/accept`)
        .set(await authHeader('editor', 'editor-a'))
        .send({}),
      request(app)
        .post(`/api/corrections/${c.id}/reject`)
        .set(await authHeader('editor', 'editor-b'))
        .send({ note: 'Not convinced.' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect(await revisions(spec.id)).toBe(before + (a.status === 200 ? 1 : 0));
  });
});

describe('proposer actions and visibility', () => {
  it('the proposer can edit while pending; others cannot see it; editors can', async () => {
    const spec = await freshSpec();
    const c = await proposeChange(spec, 'owner-x');
    await request(app)
      .patch(`/api/corrections/${c.id}`)
      .set(await authHeader('contributor', 'owner-x'))
      .send({ rationale: 'Updated: bulletin SB-12 rev 2, table 3.' })
      .expect(200);
    expect(
      (
        await request(app)
          .get(`/api/corrections/${c.id}`)
          .set(await authHeader('contributor', 'stranger'))
      ).status,
    ).toBe(404);
    const seen = await request(app)
      .get(`/api/corrections/${c.id}`)
      .set(await authHeader('editor'))
      .expect(200);
    expect(seen.body.rationale).toMatch(/table 3/);
    expect(seen.body.proposer.name).toBe('Test owner-x');
  });

  it('lists my proposals, and pending ones oldest first for editors', async () => {
    const c1 = await proposeChange(await freshSpec(), 'lister-1');
    const c2 = await proposeChange(await freshSpec(), 'lister-1');
    const mine = await request(app)
      .get('/api/corrections')
      .set(await authHeader('contributor', 'lister-1'))
      .expect(200);
    expect(mine.body.map((c: { id: number }) => c.id)).toEqual([c2.id, c1.id]);
    const queue = await request(app)
      .get('/api/corrections')
      .query({ status: 'pending' })
      .set(await authHeader('editor'))
      .expect(200);
    const ids = queue.body.map((c: { id: number }) => c.id);
    expect(ids.indexOf(c1.id)).toBeLessThan(ids.indexOf(c2.id));
    const summary = await request(app)
      .get('/api/corrections/summary')
      .set(await authHeader('editor'))
      .expect(200);
    expect(summary.body.pendingForReview).toBeGreaterThanOrEqual(2);
  });

  it('a proposed missing spec becomes a new spec on acceptance', async () => {
    const spec = await freshSpec();
    const res = await request(app)
      .post('/api/corrections')
      .set(await authHeader('contributor'))
      .send({
        kind: 'new_spec',
        componentId: spec.componentId,
        parameter: `insulation resistance to ground ${Date.now()}`,
        citation,
        rationale: 'Bulletin adds an insulation check.',
        values: { min: 1, unit: 'Mohm' },
      })
      .expect(201);
    const accepted = await request(app)
      .post(`/api/corrections/${res.body.id}/accept`)
      .set(await authHeader('editor'))
      .send({})
      .expect(200);
    const card = (await request(app).get(`/api/specs/${accepted.body.specId}`).expect(200)).body;
    expect(card).toMatchObject({ min: 1, unit: 'MΩ' });
    expect(card.revisions[0]).toMatchObject({ origin: 'correction', changedFields: ['created'] });
  });

  it('text is kept as text (no HTML interpretation) and length-limited', async () => {
    const spec = await freshSpec();
    const res = await request(app)
      .post('/api/corrections')
      .set(await authHeader('contributor'))
      .send({
        kind: 'change',
        specId: spec.id,
        version: spec.version,
        citation,
        rationale: '<img src=x onerror=alert(1)> is what the page says',
        values: { min: spec.min, max: spec.max, unit: spec.unit },
      })
      .expect(201);
    expect(res.body.rationale).toBe('<img src=x onerror=alert(1)> is what the page says');
    const long = await request(app)
      .post('/api/corrections')
      .set(await authHeader('contributor'))
      .send({
        kind: 'change',
        specId: spec.id,
        version: spec.version,
        citation,
        rationale: 'x'.repeat(2001),
        values: { min: 1, max: 2, unit: spec.unit },
      });
    expect(long.status).toBe(400);
  });
});
