import request from 'supertest';
import { createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { SpecRevision } from '@/server/modules/specs/spec-revision.entity';
import { useTestDatabase } from '../helpers/test-db';
import { expectProblem } from '../helpers/problems';
import { authHeader } from '../helpers/auth';
import { uniqueMake } from '../fixtures/csv/rows';

useTestDatabase();
const app = createApp({ webDist: null });
let editor: { Authorization: string };
beforeAll(async () => {
  editor = await authHeader('editor');
});

const newSpec = (make: string, over: Record<string, unknown> = {}) => ({
  make,
  model: 'Vireo 250',
  yearFrom: 2015,
  yearTo: 2019,
  variant: 'EU',
  component: 'pickup coil',
  parameter: 'pickup coil resistance',
  min: 400,
  nominal: 480,
  max: 560,
  unit: 'ohm',
  refTempC: 20,
  testPoints: 'blue/yellow to green/white',
  conditions: 'engine cold',
  source: {
    title: 'Invented Vireo Workshop Manual',
    edition: '1st edition',
    page: '4-7',
    url: 'https://manuals.example/vireo',
  },
  reason: 'New model sheet',
  ...over,
});
const create = (body: object) => request(app).post('/api/specs').set(editor).send(body);
const patch = (id: number, body: object) => request(app).patch(`/api/specs/${id}`).set(editor).send(body);
const revisionsOf = (specId: number) =>
  AppDataSource.getRepository(SpecRevision).find({ where: { specId }, order: { version: 'ASC' } });

describe('POST /api/specs', () => {
  it('creates the spec with its make, model, component and source, and a first revision', async () => {
    const make = uniqueMake();
    const res = await create(newSpec(make)).expect(201);
    expect(res.headers.location).toBe(`/api/specs/${res.body.id}`);
    expect(res.body).toMatchObject({
      parameter: 'pickup coil resistance',
      unit: 'Ω',
      min: 400,
      nominal: 480,
      max: 560,
      material: 'copper',
      version: 1,
      quantityKind: 'resistance',
      status: 'published',
      sourcePage: '4-7',
      source: { title: 'Invented Vireo Workshop Manual' },
      model: { name: 'Vireo 250', make: { name: make } },
      component: { name: 'pickup coil' },
    });
    expect(res.body.revisions).toEqual([
      expect.objectContaining({
        version: 1,
        origin: 'edit',
        changedFields: ['created'],
        reason: 'New model sheet',
        authorName: 'Test editor-tester',
      }),
    ]);
  });

  it('finds an existing make, model, component and source by natural key', async () => {
    const make = uniqueMake();
    const first = (await create(newSpec(make)).expect(201)).body;
    const second = (
      await create(
        newSpec(`  ${make.toUpperCase()} `, {
          parameter: 'pickup coil air gap',
          min: 0.5,
          nominal: null,
          max: 0.9,
          unit: 'mm',
          source: { title: 'invented vireo  workshop manual', edition: '1st Edition', page: '4-9' },
        }),
      ).expect(201)
    ).body;
    expect(second.model.id).toBe(first.model.id);
    expect(second.component.id).toBe(first.component.id);
    expect(second.source.id).toBe(first.source.id);
  });

  it('when the spec already exists, responds 409 with the current spec', async () => {
    const make = uniqueMake();
    const first = (await create(newSpec(make)).expect(201)).body;
    const res = await create(newSpec(make, { parameter: 'Pickup  Coil Resistance' }));
    expectProblem(res, 409, 'conflict');
    expect(res.body.current).toMatchObject({ id: first.id, version: 1 });
  });

  it.each([
    ['no unit', 'unit', { unit: undefined }],
    ['an unknown unit', 'unit', { unit: 'ohmz' }],
    ['a unit that does not fit the parameter', 'unit', { unit: 'V' }],
    ['min above max', 'min', { min: 600 }],
    ['nominal outside the limits', 'nominal', { nominal: 700 }],
    ['no limit at all', 'min', { min: null, nominal: null, max: null }],
    ['a negative resistance', 'min', { min: -1 }],
    ['yearTo before yearFrom', 'yearTo', { yearTo: 2001 }],
    ['a missing source page', 'source.page', { source: { title: 'T' } }],
    ['a reason that is too short', 'reason', { reason: 'ok' }],
    ['an unknown field', '(root)', { colour: 'red' }],
    ['a number given as text', 'min', { min: '400' }],
  ])('when the body has %s, responds 400 naming %s', async (_name, path, over) => {
    const res = await create(newSpec(uniqueMake(), over));
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });

  it('when the body is not JSON, responds 415; over 100 kB, 413', async () => {
    expectProblem(
      await request(app).post('/api/specs').set(editor).type('form').send({ make: 'x' }),
      415,
      'unsupported_media_type',
    );
    expectProblem(await create(newSpec(uniqueMake(), { notes: 'n'.repeat(200_000) })), 413);
  });

  it('when not signed in, responds 401; a contributor gets 403', async () => {
    expectProblem(await request(app).post('/api/specs').send(newSpec(uniqueMake())), 401);
    expectProblem(
      await request(app)
        .post('/api/specs')
        .set(await authHeader('contributor'))
        .send(newSpec(uniqueMake())),
      403,
    );
  });
});

describe('PATCH /api/specs/:id', () => {
  let spec: { id: number; version: number };
  beforeEach(async () => {
    spec = (await create(newSpec(uniqueMake())).expect(201)).body;
  });

  it('saves the change as version + 1 with one revision: author, reason, changed fields, snapshot', async () => {
    const res = await patch(spec.id, {
      version: 1,
      reason: 'Manual rev. C lowers the maximum',
      max: 540,
      notes: 'Rev. C',
    }).expect(200);
    expect(res.body).toMatchObject({ version: 2, max: 540, notes: 'Rev. C', min: 400 });
    expect(res.body.revisions[0]).toMatchObject({
      version: 2,
      origin: 'edit',
      changedFields: ['max', 'notes'],
      reason: 'Manual rev. C lowers the maximum',
      authorName: 'Test editor-tester',
    });
    expect(res.body.revisions[0].snapshot).toMatchObject({
      max: 540,
      min: 400,
      notes: 'Rev. C',
      sourceTitle: 'Invented Vireo Workshop Manual',
    });
  });

  it('changes the source and page, finding or creating the source', async () => {
    const res = await patch(spec.id, {
      version: 1,
      reason: 'Cite the bulletin',
      source: { title: 'Invented Bulletin 12', page: '2' },
    }).expect(200);
    expect(res.body).toMatchObject({ source: { title: 'Invented Bulletin 12' }, sourcePage: '2', version: 2 });
    expect(res.body.revisions[0].changedFields).toEqual(['sourceTitle', 'sourceEdition', 'sourcePage']);
  });

  it('when the body changes nothing, responds 200 without a new revision', async () => {
    const res = await patch(spec.id, { version: 1, reason: 'Same again', max: 560 }).expect(200);
    expect(res.body.version).toBe(1);
    expect(await revisionsOf(spec.id)).toHaveLength(1);
  });

  it('when the edit is based on an old version, responds 409 with the current spec and saves nothing', async () => {
    await patch(spec.id, { version: 1, reason: 'First edit', max: 550 }).expect(200);
    const res = await patch(spec.id, { version: 1, reason: 'Edit from a stale screen', max: 530 });
    expectProblem(res, 409, 'conflict');
    expect(res.body.current).toMatchObject({ id: spec.id, version: 2, max: 550 });
    expect((await revisionsOf(spec.id)).map((r) => r.snapshot.max)).toEqual([560, 550]);
  });

  it('when two edits from one version race, one saves, the other gets 409, and the history loses no value', async () => {
    const [a, b] = await Promise.all([
      patch(spec.id, { version: 1, reason: 'Editor A', max: 545 }),
      patch(spec.id, { version: 1, reason: 'Editor B', max: 535 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const [won, lost] = a.status === 200 ? [a, b] : [b, a];
    expect(lost.body.current).toMatchObject({ version: 2, max: won.body.max });
    const retried = await patch(spec.id, {
      version: lost.body.current.version,
      reason: 'Retry on the new version',
      max: won.body.max === 545 ? 535 : 545,
    }).expect(200);
    const history = await revisionsOf(spec.id);
    expect(history.map((r) => r.version)).toEqual([1, 2, 3]);
    expect(history.map((r) => r.snapshot.max)).toEqual([560, won.body.max, retried.body.max]);
  });

  it('when the result would break the rules, responds 422 naming the field', async () => {
    const res = await patch(spec.id, { version: 1, reason: 'Typo', max: 300 });
    expectProblem(res, 422, 'unprocessable');
    expect(res.body.errors).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'min' })]));
  });

  it('when another spec of the component has the new parameter, responds 409', async () => {
    const other = (await create(newSpec(uniqueMake())).expect(201)).body;
    await create({
      ...newSpec(other.model.make.name),
      parameter: 'pickup coil peak voltage',
      unit: 'V',
      min: 2,
      nominal: null,
      max: null,
      refTempC: null,
    }).expect(201);
    expectProblem(
      await patch(other.id, {
        version: 1,
        reason: 'Rename',
        parameter: 'pickup coil peak voltage',
        unit: 'V',
        min: 2,
        nominal: null,
        max: null,
      }),
      409,
      'conflict',
    );
  });

  it.each([
    ['no reason', 'reason', { version: 1, max: 550 }],
    ['no version', 'version', { reason: 'Lower max', max: 550 }],
    ['no field to change', '(root)', { version: 1, reason: 'Nothing' }],
    ['a field that cannot change here', '(root)', { version: 1, reason: 'Move', make: 'Other' }],
    ['a reason over 500 characters', 'reason', { version: 1, reason: 'x'.repeat(501), max: 550 }],
  ])('when the body has %s, responds 400 naming %s', async (_name, path, body) => {
    const res = await patch(spec.id, body);
    expectProblem(res, 400, 'validation_failed');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });

  it('when the body is over 100 kB, responds 413; when it is not JSON, 415', async () => {
    expectProblem(await patch(spec.id, { version: 1, reason: 'Long', notes: 'n'.repeat(200_000) }), 413);
    expectProblem(
      await request(app).patch(`/api/specs/${spec.id}`).set(editor).set('Content-Type', 'text/plain').send('max=550'),
      415,
    );
  });

  it('when the spec does not exist, responds 404; a bad id 400', async () => {
    expectProblem(await patch(999999, { version: 1, reason: 'Lower max', max: 550 }), 404, 'not_found');
    expectProblem(await patch(0, { version: 1, reason: 'Lower max', max: 550 }), 400);
  });

  it('when not signed in, responds 401; a contributor gets 403', async () => {
    expectProblem(await request(app).patch(`/api/specs/${spec.id}`).send({ version: 1, reason: 'x y z', max: 1 }), 401);
    expectProblem(
      await request(app)
        .patch(`/api/specs/${spec.id}`)
        .set(await authHeader('contributor'))
        .send({ version: 1, reason: 'x y z', max: 1 }),
      403,
    );
  });
});
