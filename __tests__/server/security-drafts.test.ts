/**
 * Hardening, item 2: drafts are private to editors. On every path that reads a spec by id
 * (the spec card, its revisions, a correction proposed against it, a reading on a job), a
 * draft answers 404 to anonymous visitors and contributors, exactly as a missing spec does;
 * editors and admins see it.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader } from '../helpers/auth';
import { uniqueMake } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
const SECRET_NOTE = 'draft note: supplier unconfirmed, do not publish';

let editor: { Authorization: string };
let contributor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor', 'draft-editor');
  contributor = await authHeader('contributor', 'draft-reader');
});

async function createSpec(status: 'draft' | 'published') {
  const res = await request(app)
    .post('/api/specs')
    .set(editor)
    .send({
      make: uniqueMake('Draftmake'),
      model: 'Vireo 250',
      yearFrom: 2015,
      yearTo: 2019,
      component: 'pickup coil',
      parameter: 'pickup coil resistance',
      min: 400,
      nominal: 480,
      max: 560,
      unit: 'ohm',
      refTempC: 20,
      notes: SECRET_NOTE,
      source: { title: 'Invented Vireo Workshop Manual', edition: '1st edition', page: '4-7' },
      status,
    })
    .expect(201);
  return res.body as { id: number; version: number };
}

/** The answer for a spec id that does not exist, to compare a draft's answer with. */
const MISSING_ID = 2_000_000_000;

describe.each([
  ['GET /api/specs/:id', (id: number) => `/api/specs/${id}`],
  ['GET /api/specs/:id/revisions', (id: number) => `/api/specs/${id}/revisions`],
])('%s of a draft', (_route, url) => {
  let draft: { id: number };
  beforeAll(async () => {
    draft = await createSpec('draft');
  });

  it.each([
    ['anonymous', () => ({})],
    ['a contributor', () => contributor],
  ])('answers 404 to %s, like a spec that does not exist, without the notes or the editor', async (_who, headers) => {
    const res = await request(app).get(url(draft.id)).set(headers());
    const missing = await request(app).get(url(MISSING_ID)).set(headers());
    expect(res.status).toBe(404);
    expect(res.body.code).toBe(missing.body.code);
    expect(res.body.detail.replace(String(draft.id), 'N')).toBe(missing.body.detail.replace(String(MISSING_ID), 'N'));
    expect(JSON.stringify(res.body)).not.toMatch(/supplier unconfirmed|draft-editor/);
  });

  it.each([
    ['an editor', () => editor],
    ['an admin', () => authHeader('admin', 'draft-admin')],
  ])('is shown to %s', async (_who, headers) => {
    const res = await request(app)
      .get(url(draft.id))
      .set(await headers());
    expect(res.status).toBe(200);
  });
});

describe('a published spec', () => {
  it('stays readable by anyone, with its revisions (the control)', async () => {
    const spec = await createSpec('published');
    await request(app).get(`/api/specs/${spec.id}`).expect(200);
    await request(app).get(`/api/specs/${spec.id}/revisions`).expect(200);
  });

  it('turned into a draft disappears for anonymous readers at once, though it was just read (and cached)', async () => {
    const spec = await createSpec('published');
    await request(app).get(`/api/specs/${spec.id}`).expect(200);
    await request(app)
      .patch(`/api/specs/${spec.id}`)
      .set(editor)
      .send({ version: spec.version, reason: 'Withdrawn for checking', status: 'draft' })
      .expect(200);
    expect((await request(app).get(`/api/specs/${spec.id}`)).status).toBe(404);
    expect((await request(app).get(`/api/specs/${spec.id}/revisions`)).status).toBe(404);
  });
});

/** A contributor's proposed change to the spec. */
const proposeOn = (spec: { id: number; version: number }) =>
  request(app)
    .post('/api/corrections')
    .set(contributor)
    .send({
      kind: 'change',
      specId: spec.id,
      version: spec.version,
      citation: { title: 'Invented Service Bulletin SB-9', edition: 'Rev. 1', page: '2' },
      rationale: 'A later bulletin.',
      values: { min: 410, max: 570, unit: 'ohm' },
    });

describe('other paths that take a spec id', () => {
  it('a contributor proposing a correction to a draft gets 404', async () => {
    const res = await proposeOn(await createSpec('draft'));
    expect(res.status).toBe(404);
  });

  it('a reading against a draft on a job sheet gets 404, and nothing of the draft is kept', async () => {
    const draft = await createSpec('draft');
    const job = (await request(app).post('/api/jobs').set(contributor).send({ machineLabel: 'Test bike' }).expect(201))
      .body;
    const res = await request(app)
      .post(`/api/jobs/${job.id}/readings`)
      .set(contributor)
      .send({ specId: draft.id, reading: { value: 450, unit: 'ohm' } });
    expect(res.status).toBe(404);
    const sheet = await request(app).get(`/api/jobs/${job.id}`).set(contributor).expect(200);
    expect(sheet.body.readings).toHaveLength(0);
  });

  it('a proposal on a spec turned draft since shows its proposer none of the draft’s values; an editor sees them', async () => {
    const spec = await createSpec('published');
    const proposal = (await proposeOn(spec).expect(201)).body;
    await request(app)
      .patch(`/api/specs/${spec.id}`)
      .set(editor)
      .send({ version: spec.version, reason: 'Being rechecked', status: 'draft', notes: SECRET_NOTE, max: 7777.5 })
      .expect(200);
    const mine = (await request(app).get(`/api/corrections/${proposal.id}`).set(contributor).expect(200)).body;
    expect(mine.fields.every((f: { current: unknown }) => f.current === null)).toBe(true);
    expect(mine.currentVersion).toBeNull();
    expect(JSON.stringify(mine)).not.toMatch(/7777\.5|supplier unconfirmed/);
    const theirs = (await request(app).get(`/api/corrections/${proposal.id}`).set(editor).expect(200)).body;
    expect(theirs.fields.find((f: { field: string }) => f.field === 'max').current).toBe(7777.5);
  });
});

describe('a model whose only spec is a draft', () => {
  it('is left out of the model list, so its make and model names stay private', async () => {
    const draft = await createSpec('draft');
    const card = await request(app).get(`/api/specs/${draft.id}`).set(editor).expect(200);
    const listed = await request(app).get('/api/models').query({ make: card.body.model.make.name }).expect(200);
    expect(listed.body).toEqual([]);
    await request(app)
      .patch(`/api/specs/${draft.id}`)
      .set(editor)
      .send({ version: card.body.version, reason: 'ready to publish', status: 'published' })
      .expect(200);
    const after = await request(app).get('/api/models').query({ make: card.body.model.make.name }).expect(200);
    expect(after.body).toEqual([expect.objectContaining({ name: 'Vireo 250', specCount: 1 })]);
  });
});
