/**
 * Hardening, item 9: someone else's proposal is invisible whatever its status. Editing or
 * withdrawing another contributor's decided proposal answers 404, as for a pending one,
 * never 409 with the decision and the editor's name.
 */
import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { useFakeMail } from '../helpers/mail';
import { authHeader } from '../helpers/auth';

useTestDatabase();
useFakeMail();
const app = createApp({ webDist: null });
const citation = { title: 'Invented Service Bulletin SB-31', edition: 'Rev. 4', page: '7' };

let owner: { Authorization: string };
let stranger: { Authorization: string };
let reviewer: { Authorization: string };
beforeAll(async () => {
  owner = await authHeader('contributor', 'proposal-owner');
  stranger = await authHeader('contributor', 'proposal-stranger');
  reviewer = await authHeader('editor', 'Reviewer Quill');
});

async function proposal(): Promise<number> {
  const [spec] = await AppDataSource.query(
    `SELECT id, version, unit, max_value AS max FROM specs
     WHERE status = 'published' AND quantity_kind = 'resistance' AND max_value IS NOT NULL ORDER BY id DESC LIMIT 1`,
  );
  const res = await request(app)
    .post('/api/corrections')
    .set(owner)
    .send({
      kind: 'change',
      specId: spec.id,
      version: spec.version,
      citation,
      rationale: 'A later bulletin raises the upper limit.',
      values: { max: Number((spec.max * 1.05).toFixed(3)), unit: spec.unit },
    })
    .expect(201);
  return res.body.id;
}

const edit = (id: number, who: { Authorization: string }) =>
  request(app).patch(`/api/corrections/${id}`).set(who).send({ rationale: 'Hijacked rationale text.' });
const withdraw = (id: number, who: { Authorization: string }) =>
  request(app).post(`/api/corrections/${id}/withdraw`).set(who).send({});

describe.each([
  ['rejected', (id: number) => request(app).post(`/api/corrections/${id}/reject`).set(reviewer).send({ note: 'No.' })],
  ['withdrawn', (id: number) => withdraw(id, owner)],
])('someone else’s %s proposal', (_status, decide) => {
  let id: number;
  beforeAll(async () => {
    id = await proposal();
    await decide(id).expect(200);
  });

  it.each([
    ['PATCH', () => edit(id, stranger)],
    ['POST /withdraw', () => withdraw(id, stranger)],
  ])('%s answers 404, naming neither the decision nor the editor', async (_what, send) => {
    const res = await send();
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('not_found');
    expect(JSON.stringify(res.body)).not.toMatch(/Reviewer Quill|rejected|withdrawn|currentStatus/);
  });

  it('answers its own proposer 409 already_decided (the control)', async () => {
    const res = await edit(id, owner);
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('already_decided');
  });
});

describe('someone else’s pending proposal', () => {
  it('answers 404 to PATCH and to withdraw, and stays pending', async () => {
    const id = await proposal();
    expect((await edit(id, stranger)).status).toBe(404);
    expect((await withdraw(id, stranger)).status).toBe(404);
    expect((await request(app).get(`/api/corrections/${id}`).set(owner).expect(200)).body.status).toBe('pending');
  });
});
