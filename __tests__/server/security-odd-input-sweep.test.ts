/**
 * Issue 13 item 7, the sweep: every POST and PATCH route the routers declare, with each
 * field of a plausible body replaced in turn by odd Unicode, a huge string, a wrong type,
 * an absurd number or deep nesting, and with whole bodies that are not what a client
 * sends. No answer may be a 5xx, and every refusal is problem details. A new write route
 * without a sample body here fails the sweep, so it cannot be left out.
 */
import request from 'supertest';
import { PLAN_FILE_FORMAT } from '@/lib/contracts/plans';
import { apiRouters, createApp } from '@/server/app';
import { AppDataSource } from '@/server/db/data-source';
import { useTestDatabase } from '../helpers/test-db';
import { authHeader, testUser } from '../helpers/auth';
import { uniqueMake, validFile } from '../fixtures/csv/rows';

useTestDatabase();

// The probes queue hundreds of messages (sign-ups, password changes); later files in this worker's database
// must not wait behind them, so the sweep leaves none queued.
let outboxBefore = 0;
beforeAll(async () => {
  const [row] = await AppDataSource.query('SELECT COALESCE(MAX(id), 0) AS id FROM outbox_messages');
  outboxBefore = Number(row.id);
});
afterEach(async () => {
  await AppDataSource.query('DELETE FROM outbox_messages WHERE id > ? AND sent_at IS NULL', [outboxBefore]);
});
jest.setTimeout(300_000);
const app = createApp({ webDist: null });

type Layer = { route?: { path: string; methods: Record<string, boolean> } };
/** 'METHOD /api/path' of every route with one of these methods, from the router stack. */
const routes = (...methods: string[]) =>
  apiRouters().flatMap(([prefix, router]) =>
    (router as unknown as { stack: Layer[] }).stack
      .filter((l) => l.route)
      .flatMap((l) =>
        Object.keys(l.route!.methods)
          .filter((m) => methods.includes(m))
          .map((m) => `${m.toUpperCase()} /api${prefix}${l.route!.path === '/' ? '' : l.route!.path}`),
      ),
  );

const ids: Record<string, number> = {};
let version = 1;
const quantity = { value: 1.5, unit: 'ohm' };
const limits = { min: 1, max: 2, unit: 'ohm' };
const citation = { title: 'Invented Service Bulletin SB-12', edition: 'Rev. 2', page: '4', url: 'https://x.example/a' };
const values = { min: 1, nominal: 1.5, max: 2, unit: 'ohm', refTempC: 20, testPoints: 'a to b', conditions: 'cold' };
const spec = () => ({
  make: uniqueMake('Fuzz'),
  model: 'Vireo 250',
  yearFrom: 2015,
  yearTo: 2019,
  variant: 'EU',
  component: 'pickup coil',
  parameter: 'pickup coil resistance',
  ...values,
  material: 'copper',
  notes: 'n',
  status: 'draft',
  source: { title: 'Invented Manual', edition: '1st', page: '4-7', url: 'https://m.example/v' },
  reason: 'Fuzzing',
});

const plan = () => ({
  title: 'Weak spark',
  symptom: 'Misfires when hot',
  system: 'ignition',
  modelId: null,
  status: 'draft',
  citation: { title: 'Invented Manual', edition: '1st', page: '4' },
  steps: [
    {
      id: 'coil',
      title: 'Coil primary',
      instructions: 'Measure\nthe primary.',
      preconditions: ['Ignition off'],
      testPoint: { text: 'black to ground' },
      check: { kind: 'spec', component: 'ignition coil', parameter: 'primary winding resistance', limits },
      next: {
        pass: { finding: { part: 'none', advice: 'fine' } },
        fail: { finding: { part: 'coil', advice: 'replace' } },
      },
    },
  ],
});

/** A plausible body for each write route (valid or nearly: the sweep varies one field at a time). */
const SAMPLES: Record<string, () => object> = {
  'POST /api/verdicts': () => ({
    spec: { ...limits, nominal: 1.5, refTempC: 20, material: 'copper', nearLimitPct: 10 },
    reading: quantity,
    leadResistance: { value: 0.1, unit: 'ohm' },
    seriesResistance: { value: 0.1, unit: 'ohm', tolerancePct: 5 },
    temperatureC: 25,
    meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'ohm' },
  }),
  'POST /api/specs': spec,
  'PATCH /api/specs/:id': () => ({ version, reason: 'Because', notes: 'x', min: 1, source: citation }),
  'POST /api/specs/:id/revert': () => ({ revisionId: 1, version, reason: 'Back' }),
  'POST /api/imports': () => ({}),
  'POST /api/imports/:id/commit': () => ({ reason: 'Loading' }),
  'POST /api/auth/sign-up': () => ({ email: 'f@x.example', displayName: 'Fuzz', password: 'long enough pass 1' }),
  'POST /api/auth/verify': () => ({ token: 'a'.repeat(40) }),
  'POST /api/auth/sign-in': () => ({ email: 'f@x.example', password: 'whatever' }),
  'POST /api/auth/refresh': () => ({}),
  'POST /api/auth/sign-out': () => ({}),
  'POST /api/auth/forgot': () => ({ email: 'f@x.example' }),
  'POST /api/auth/reset': () => ({ token: 'a'.repeat(40), password: 'long enough pass 1' }),
  'POST /api/auth/password': () => ({ currentPassword: 'wrong', newPassword: 'long enough pass 2' }),
  'POST /api/auth/sign-out-everywhere': () => ({}),
  'POST /api/jobs': () => ({ modelId: 1, machineLabel: 'Quad', machineId: 'A-1', customerRef: 'WO', notes: 'n' }),
  'PATCH /api/jobs/:id': () => ({
    machineLabel: 'Quad',
    machineId: 'A-1',
    customerRef: 'WO',
    notes: 'n',
    status: 'open',
  }),
  'POST /api/jobs/:id/readings': () => ({
    label: 'coil',
    spec: limits,
    reading: quantity,
    takenAt: '2026-11-30T10:00:00Z',
  }),
  'POST /api/corrections': () => ({
    kind: 'change',
    specId: ids.spec,
    version,
    citation,
    rationale: 'A later bulletin says so.',
    values,
  }),
  'PATCH /api/corrections/:id': () => ({ values, citation, rationale: 'A later bulletin says so.' }),
  'POST /api/corrections/:id/withdraw': () => ({}),
  'POST /api/corrections/:id/accept': () => ({ confirmStale: false, note: 'ok' }),
  'POST /api/corrections/:id/reject': () => ({ note: 'not so' }),
  'PATCH /api/users/:id': () => ({ role: 'contributor', disabled: false }),
  'POST /api/plans': plan,
  'POST /api/plans/import': () => ({ format: PLAN_FILE_FORMAT, plans: [plan()] }),
  'PATCH /api/plans/:id': () => ({ version: 1, reason: 'Because', title: 'Weak spark', steps: plan().steps }),
  'POST /api/jobs/:jobId/runs': () => ({ planId: 1 }),
  'POST /api/jobs/:jobId/runs/:runId/results': () => ({
    stepId: 'coil',
    reading: { value: 1.5, unit: 'ohm', limits, meter: { percent: 1, counts: 2, countValue: 0.01, unit: 'ohm' } },
  }),
  'POST /api/jobs/:jobId/runs/:runId/back': () => ({}),
};

let deep: unknown = [];
for (let i = 0; i < 3000; i += 1) deep = [deep];
const ODD: [string, unknown][] = [
  ['a lone surrogate', 'S\ud800'],
  ['NUL', 'a\u0000b'],
  ['a bidi override', '\u202eabc'],
  ['a huge string', 'ж'.repeat(30_000)],
  ['1e308', 1e308],
  ['-1', -1],
  ['an array', []],
  ['an object', { a: 'b' }],
  ['null', null],
  ['true', true],
  ['3000 nested arrays', deep],
];
/** Whole bodies no client should send, as raw JSON text. */
const RAW: [string, string | Buffer][] = [
  ['a JSON string', '"S\\ud800"'],
  ['a JSON array', '[1,2]'],
  ['JSON null', 'null'],
  ['an infinite number', '{"value":1e999}'],
  ['truncated JSON', '{"a":'],
  ['40 000 nested arrays', '['.repeat(40_000) + ']'.repeat(40_000)],
  ['40 000 nested objects', '{"a":'.repeat(15_000) + '1' + '}'.repeat(15_000)],
  ['prototype keys', '{"__proto__":{"role":"admin"},"constructor":{"prototype":{"role":"admin"}}}'],
  ['duplicate keys', '{"a":1,"a":2}'],
  ['invalid UTF-8', Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xed, 0xa0, 0x80, 0xff, 0x22, 0x7d])],
  ['a byte-order mark', '\ufeff{}'],
  ['a body over the limit', `{"a":"${'x'.repeat(200_000)}"}`],
];

/** Every leaf of `body` (arrays count as leaves), as a path. */
function leaves(body: unknown, path: string[] = []): string[][] {
  if (body === null || typeof body !== 'object' || Array.isArray(body)) return [path];
  return Object.entries(body).flatMap(([k, v]) => leaves(v, [...path, k]));
}
function withLeaf(body: object, path: string[], value: unknown): object {
  const copy = structuredClone(body) as Record<string, unknown>;
  let at = copy;
  for (const k of path.slice(0, -1)) at = at[k] as Record<string, unknown>;
  at[path[path.length - 1]] = value;
  return copy;
}

/** A 5xx other than a deliberate 503 with Retry-After (readiness, a database that is down). */
const refused = (res: request.Response) =>
  res.status >= 500 && !(res.status === 503 && res.headers['retry-after'] !== undefined);

let probes = 0;
const admins = new Map<string, { Authorization: string }>();
/** A different client address per probe (the app trusts X-Forwarded-For from loopback), so rate limits rarely answer first. */
const clientAddress = () => `10.${(probes >> 16) & 255}.${(probes >> 8) & 255}.${probes & 255}`;

beforeAll(async () => {
  const editor = await authHeader('editor', 'fuzz-editor');
  const created = await request(app)
    .post('/api/specs')
    .set(editor)
    .send({ ...spec(), status: 'published' })
    .expect(201);
  ids.spec = created.body.id;
  version = created.body.version;
  ids.job = (await request(app).post('/api/jobs').set(editor).send({ machineLabel: 'Quad' }).expect(201)).body.id;
  const contributor = await authHeader('contributor', 'fuzz-contributor');
  const proposal = await request(app)
    .post('/api/corrections')
    .set(contributor)
    .send(SAMPLES['POST /api/corrections']());
  ids.correction = proposal.body.id;
  const csv = Buffer.from(validFile(uniqueMake('Fuzz'), 1), 'utf8');
  ids.batch = (
    await request(app)
      .post('/api/imports')
      .set(editor)
      .attach('file', csv, { filename: 'f.csv', contentType: 'text/csv' })
  ).body.id;
  ids.user = (await testUser('contributor', 'fuzz-target')).id;
}, 60_000);

const ID_OF: Record<string, string> = {
  specs: 'spec',
  jobs: 'job',
  corrections: 'correction',
  imports: 'batch',
  users: 'user',
};
const urlOf = (path: string) =>
  path
    .replace(/\/api\/(\w+)\/:id/, (_m, area: string) => `/api/${area}/${ids[ID_OF[area]] ?? 1}`)
    .replace(':jobId', String(ids.job))
    .replace(':runId', '1');

/** Sends one probe as an admin of its own (sign-out-everywhere and password changes touch only that account). */
async function probe(key: string, send: (r: request.Test) => request.Test): Promise<string | null> {
  const [method, path] = key.split(' ');
  probes += 1;
  const name = `fuzz-admin-${Math.floor(probes / 15)}`;
  const who = admins.get(name) ?? admins.set(name, await authHeader('admin', name)).get(name)!;
  const res = await send(
    request(app)[method.toLowerCase() as 'post'](urlOf(path)).set(who).set('X-Forwarded-For', clientAddress()),
  );
  if (refused(res)) return `${res.status} ${res.body?.code ?? ''} ${res.body?.detail ?? res.text.slice(0, 120)}`;
  if (res.status >= 400 && !/application\/problem\+json/.test(String(res.headers['content-type'])))
    return `${res.status} without problem details`;
  return null;
}

describe('every POST and PATCH route with odd input', () => {
  it('has a sample body for every write route', () => {
    expect(routes('post', 'patch').sort()).toEqual(Object.keys(SAMPLES).sort());
  });

  it.each(Object.keys(SAMPLES))('%s never answers 5xx', async (key) => {
    const failures: string[] = [];
    const note = (what: string, failure: string | null) => failure && failures.push(`${what}: ${failure}`);
    const sample = SAMPLES[key]();
    for (const path of leaves(sample).filter((p) => p.length > 0))
      for (const [what, value] of ODD) {
        const body = withLeaf(sample, path, value);
        note(`${path.join('.')} = ${what}`, await probe(key, (r) => r.send(body)));
      }
    for (const [what, value] of ODD)
      note(`an extra field = ${what}`, await probe(key, (r) => r.send({ ...sample, extra: value })));
    for (const [what, raw] of RAW)
      note(what, await probe(key, (r) => r.set('Content-Type', 'application/json').send(raw)));
    if (key === 'POST /api/imports')
      for (const [what, raw] of RAW)
        note(
          `a file of ${what}`,
          await probe(key, (r) => r.attach('file', Buffer.from(raw), { filename: 'odd.csv', contentType: 'text/csv' })),
        );
    if (key.startsWith('POST /api/auth/'))
      for (const cookie of ['%ED%A0%80', '%00', 'x'.repeat(4000), '%E2%80%AE'])
        note(
          `refresh cookie ${cookie.slice(0, 12)}`,
          await probe(key, (r) => r.set('Cookie', `sb_refresh=${cookie}`).send({})),
        );
    expect(failures).toEqual([]);
  });
});

/** Odd path ids and query values, percent-encoded as a client would send them. */
const ODD_IDS = ['1e308', '-1', '0x10', '1.5', '%00', '%ED%A0%80', '%E2%80%AE', '9'.repeat(400), '%2F..%2F'];
const ODD_QUERY = ['%00', '%ED%A0%80', '%E2%80%AEx', 'x'.repeat(5000), '%FF%FE', 'a&q=b&q=c', '[]', '1e308'];

describe('every GET route with odd ids and query values', () => {
  it.each(routes('get'))('%s never answers 5xx', async (key) => {
    const failures: string[] = [];
    const [, path] = key.split(' ');
    const urls = [
      ...(path.includes(':id') ? ODD_IDS.map((id) => path.replace(':id', id)) : []),
      ...ODD_QUERY.flatMap((v) =>
        ['q', 'make', 'modelId', 'limit', 'offset', 'status', 'mine'].map((name) => `${urlOf(path)}?${name}=${v}`),
      ),
    ];
    for (const url of urls) {
      const res = await request(app)
        .get(url)
        .set(await authHeader('admin', 'fuzz-reader'))
        .set('X-Forwarded-For', clientAddress());
      probes += 1;
      if (refused(res)) failures.push(`${url.slice(0, 80)}: ${res.status} ${res.body?.code ?? ''}`);
    }
    expect(failures).toEqual([]);
  });
});
