/**
 * `npm run cluster -- --check [--galera]`: what two replicas behind nginx must show (issue 15),
 * run by scripts/cluster.sh once the replicas are ready. Prints one line per check and ends
 * with `N passed, N failed` (non-zero exit on a failure).
 */
import { execFileSync, spawn } from 'node:child_process';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';

const DIR = process.env.CLUSTER_DIR as string;
const LB = Number(process.env.LB_PORT);
const A = Number(process.env.A_PORT);
const B = Number(process.env.B_PORT);
const GALERA = process.env.GALERA === '1';
const PASSWORD = process.env.DEMO_PASSWORD ?? 'bench-demo-2026';
/** nginx's fail_timeout in scripts/cluster.sh. */
const BALANCER_FAIL_TIMEOUT_MS = 2000;

/** Waits until the balancer hands requests to the replica on `port` again (its X-Upstream header). */
async function backInRotation(port: number) {
  for (const t0 = Date.now(); Date.now() - t0 < BALANCER_FAIL_TIMEOUT_MS * 10; await sleep(100)) {
    const res = await call(LB, 'GET', '/api/health/live');
    if (String(res.headers['x-upstream'] ?? '').endsWith(`:${port}`)) return;
  }
  throw new Error(`the balancer did not route to :${port} again`);
}

type Answer = { status: number; headers: http.IncomingHttpHeaders; body: any; ms: number }; // eslint-disable-line @typescript-eslint/no-explicit-any -- answers of many shapes

/** One request on a fresh connection; a network failure answers status 0. */
function call(port: number, method: string, urlPath: string, body?: unknown, headers: Record<string, string> = {}) {
  const started = Date.now();
  const data = body === undefined ? undefined : JSON.stringify(body);
  return new Promise<Answer>((resolve) => {
    const req = http.request(
      {
        host: '127.0.0.1',
        port,
        method,
        path: urlPath,
        agent: false,
        timeout: 15_000,
        headers: { ...(data ? { 'Content-Type': 'application/json' } : {}), ...headers },
      },
      (res) => {
        let text = '';
        res.on('data', (c: Buffer) => (text += c.toString()));
        res.on('end', () => {
          let parsed: unknown = text;
          try {
            parsed = JSON.parse(text);
          } catch {
            // not JSON: keep the text
          }
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: parsed, ms: Date.now() - started });
        });
      },
    );
    req.on('timeout', () => req.destroy(new Error('timeout')));
    req.on('error', () => resolve({ status: 0, headers: {}, body: null, ms: Date.now() - started }));
    req.end(data);
  });
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const results: { name: string; ok: boolean; note: string }[] = [];
async function check(name: string, fn: () => Promise<string>) {
  try {
    const note = await fn();
    results.push({ name, ok: true, note });
    console.log(`ok    ${name}: ${note}`);
  } catch (err) {
    results.push({ name, ok: false, note: (err as Error).message });
    console.log(`FAIL  ${name}: ${(err as Error).message}`);
  }
}
function expect(cond: unknown, message: string): asserts cond {
  if (!cond) throw new Error(message);
}

let auth: Record<string, string> = {};
let specId = 0;

async function signIn() {
  const res = await call(LB, 'POST', '/api/auth/sign-in', { email: 'editor@specbench.example', password: PASSWORD });
  expect(res.status === 200, `sign-in through the balancer answered ${res.status}`);
  auth = { Authorization: `Bearer ${res.body.accessToken}` };
  const [a, b] = await Promise.all([
    call(A, 'GET', '/api/auth/me', undefined, auth),
    call(B, 'GET', '/api/auth/me', undefined, auth),
  ]);
  expect(a.status === 200 && b.status === 200, `the token answered ${a.status} on A and ${b.status} on B`);
  return 'signed in through the balancer; the token works on replica A and on replica B';
}

async function rateLimitShared() {
  const email = `cluster-limit-${Date.now()}@shop.specbench.example`;
  const served = { A: 0, B: 0 };
  for (let i = 1; i <= 25; i += 1) {
    const port = i % 2 ? A : B;
    const res = await call(port, 'POST', '/api/auth/sign-in', { email, password: 'wrong-password-123' });
    if (res.status === 429) {
      expect(served.A >= 3 && served.B >= 3, `limited before both replicas served (${JSON.stringify(served)})`);
      expect(i <= 12, `first 429 only at attempt ${i}: each replica counts on its own`);
      return `attempt ${i} refused (429) after ${served.A} attempts on A and ${served.B} on B`;
    }
    served[port === A ? 'A' : 'B'] += 1;
  }
  throw new Error('25 wrong passwords across the two replicas and no 429');
}

async function firstSpec(): Promise<{ id: number; version: number }> {
  const models = await call(LB, 'GET', '/api/models');
  const model = await call(LB, 'GET', `/api/models/${models.body[0].id}`);
  const id = model.body.components.flatMap((c: { specs: { id: number }[] }) => c.specs)[0].id as number;
  const spec = await call(A, 'GET', `/api/specs/${id}`);
  return { id, version: spec.body.version };
}

async function editVisible() {
  const spec = await firstSpec();
  specId = spec.id;
  const word = `clusterzq${Date.now() % 100000}`;
  const notes = `Cluster check ${word}`;
  // B has the card and the search answer in its caches before the edit.
  const before = await call(B, 'GET', `/api/specs/${spec.id}`);
  await call(B, 'GET', `/api/search?q=${word}`);
  const changes = { notes, parameter: `${before.body.parameter} ${word}` };
  const edit = await call(
    A,
    'PATCH',
    `/api/specs/${spec.id}`,
    { version: spec.version, reason: 'cluster check', ...changes },
    auth,
  );
  expect(edit.status === 200, `edit on A answered ${edit.status}: ${JSON.stringify(edit.body)}`);
  const t0 = Date.now();
  const seen = { revision: -1, card: -1, search: -1 };
  while (Date.now() - t0 < 10_000 && Object.values(seen).some((ms) => ms < 0)) {
    const [revs, card, found] = await Promise.all([
      call(B, 'GET', `/api/specs/${spec.id}/revisions`),
      call(B, 'GET', `/api/specs/${spec.id}`),
      call(B, 'GET', `/api/search?q=${word}`),
    ]);
    const at = Date.now() - t0;
    if (seen.revision < 0 && JSON.stringify(revs.body).includes(word)) seen.revision = at;
    if (seen.card < 0 && card.body?.notes === notes) seen.card = at;
    if (seen.search < 0 && found.body?.total > 0) seen.search = at;
    await sleep(50);
  }
  expect(seen.revision >= 0 && seen.revision <= 1000, `the revision showed on B after ${seen.revision} ms`);
  expect(
    seen.card >= 0 && seen.search >= 0,
    `B's card (${seen.card} ms) or search (${seen.search} ms) never caught up`,
  );
  const late =
    seen.card > 1000 || seen.search > 1000 ? ' (over 1 s: the library_changes follower is what brings it under)' : '';
  return `on B after the edit on A: revision ${seen.revision} ms, spec card ${seen.card} ms, search ${seen.search} ms${late}`;
}

async function mailbox(port: number): Promise<{ to: string }[]> {
  return (await call(port, 'GET', '/dev/mailbox.json')).body;
}

async function outboxOnce() {
  const tag = Date.now();
  const emails = [1, 2, 3, 4].map((i) => `cluster-mail-${tag}-${i}@shop.specbench.example`);
  for (const email of emails) {
    const res = await call(LB, 'POST', '/api/auth/sign-up', {
      email,
      displayName: 'Cluster Check',
      password: 'plug-gap-feeler-0.7',
    });
    expect(res.status === 202, `sign-up answered ${res.status}`);
  }
  const count = async () => {
    const all = [...(await mailbox(A)), ...(await mailbox(B))];
    return emails.map((e) => all.filter((m) => m.to.includes(e)).length);
  };
  for (let i = 0; i < 40 && (await count()).some((n) => n === 0); i += 1) await sleep(250);
  await sleep(1500); // a second sender would show by now
  const counts = await count();
  expect(
    counts.every((n) => n === 1),
    `messages per address across both replicas: ${counts.join(', ')}`,
  );
  return `${emails.length} confirmation mails, each sent once by one of the two workers`;
}

/** Steady reads and readings through the balancer while `during` runs. */
async function underLoad(during: () => Promise<void>) {
  const job = await call(LB, 'POST', '/api/jobs', { machineLabel: 'Cluster check bench engine' }, auth);
  expect(job.status === 201, `job create answered ${job.status}`);
  let running = true;
  const stats = { reads: 0, readFailures: 0, writes: 0, writeFailures: 0, acknowledged: new Set<string>() };
  const reader = async () => {
    while (running) {
      const res = await call(LB, 'GET', `/api/specs/${specId}`);
      stats.reads += 1;
      if (res.status !== 200) stats.readFailures += 1;
    }
  };
  const writer = async (w: number) => {
    for (let i = 0; running; i += 1) {
      const key = `cluster-${w}-${i}-${Date.now()}`;
      const body = {
        spec: { min: 3.57, max: 4.83, unit: 'ohm' },
        reading: { value: 4.1, unit: 'Ω' },
        label: 'Cluster check coil',
      };
      // The offline queue's rule: resend with the same key until an answer comes.
      for (let attempt = 0; attempt < 20; attempt += 1) {
        const res = await call(LB, 'POST', `/api/jobs/${job.body.id}/readings`, body, {
          ...auth,
          'Idempotency-Key': key,
        });
        stats.writes += 1;
        if (res.status === 200 || res.status === 201) {
          stats.acknowledged.add(key);
          break;
        }
        stats.writeFailures += 1;
        await sleep(200);
      }
    }
  };
  const load = Promise.all([reader(), reader(), reader(), writer(1), writer(2)]);
  await sleep(1000);
  await during();
  await sleep(1000);
  running = false;
  await load;
  const sheet = await call(LB, 'GET', `/api/jobs/${job.body.id}`, undefined, auth);
  const keys: string[] = sheet.body.readings.map((r: { idempotencyKey: string }) => r.idempotencyKey);
  const missing = [...stats.acknowledged].filter((k) => !keys.includes(k));
  const twice = keys.length - new Set(keys).size;
  return {
    ...stats,
    jobId: job.body.id as number,
    acknowledged: stats.acknowledged.size,
    missing: missing.length,
    twice,
  };
}

const pidOf = (file: string) => Number(fs.readFileSync(path.join(DIR, file), 'utf8'));
async function waitFor(port: number, urlPath: string, ms = 60_000) {
  for (const t0 = Date.now(); Date.now() - t0 < ms; await sleep(200))
    if ((await call(port, 'GET', urlPath)).status === 200) return;
  throw new Error(`:${port}${urlPath} not ready after ${ms} ms`);
}
async function waitExit(pid: number) {
  for (let i = 0; i < 300; i += 1) {
    try {
      process.kill(pid, 0);
    } catch {
      return;
    }
    await sleep(100);
  }
  throw new Error(`process ${pid} did not exit`);
}
function launch(script: string) {
  spawn('bash', [path.join(DIR, script)], { detached: true, stdio: 'ignore' }).unref();
}
async function restartReplica(name: 'a' | 'b', signal: NodeJS.Signals) {
  const pid = pidOf(`replica-${name}.pid`);
  process.kill(pid, signal);
  await waitExit(pid);
  if (signal === 'SIGKILL') await sleep(1500); // traffic meets the dead replica for a while
  launch(`replica-${name}.sh`);
  await waitFor(name === 'a' ? A : B, '/api/health/ready');
}

async function rollingRestart() {
  const s = await underLoad(async () => {
    await restartReplica('a', 'SIGTERM');
    // nginx may count A out for its fail_timeout: stop B only once A answers through it again.
    await backInRotation(A);
    await restartReplica('b', 'SIGTERM');
  });
  expect(s.readFailures === 0, `failed reads: ${JSON.stringify(s)}`);
  expect(s.missing === 0 && s.twice === 0, `readings lost or doubled: ${JSON.stringify(s)}`);
  return `${s.reads} reads and ${s.acknowledged} readings while A then B restarted: 0 reads failed, no reading lost (${s.writeFailures} write attempts answered 5xx and were resent)`;
}

async function replicaKilled() {
  const s = await underLoad(() => restartReplica('b', 'SIGKILL'));
  expect(s.missing === 0 && s.twice === 0, `acknowledged readings lost or doubled: ${JSON.stringify(s)}`);
  return `replica B killed mid-traffic: ${s.acknowledged} acknowledged readings all kept (${s.readFailures} reads and ${s.writeFailures} writes failed and were retried)`;
}

async function concurrentEdits() {
  const rounds = 5;
  for (let round = 1; round <= rounds; round += 1) {
    const spec = await firstSpec();
    const edit = (port: number, n: number) =>
      call(
        port,
        'PATCH',
        `/api/specs/${spec.id}`,
        { version: spec.version, reason: 'two writers', notes: `Writer ${n} ${Date.now()}` },
        auth,
      );
    const statuses = (await Promise.all([edit(A, 1), edit(B, 2)])).map((r) => r.status).sort();
    expect(
      statuses.join() === '200,409',
      `round ${round}: two writers on two nodes answered ${statuses.join(' and ')}`,
    );
  }
  return `${rounds} rounds of two edits of one spec through node 1 and node 2: each one 200 and one 409`;
}

/** SQL on one Galera node over its socket (as the OS user, like the scripts). */
function nodeSql(n: number, sql: string): string {
  const socket = path.join(DIR, `node${n}/s`);
  return execFileSync('mariadb', ['--no-defaults', '--protocol=socket', '-S', socket, '-Nse', sql], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'ignore'],
  }).trim();
}
async function waitSynced(n: number, ms = 120_000) {
  for (const t0 = Date.now(); Date.now() - t0 < ms; await sleep(500)) {
    try {
      if (nodeSql(n, "SHOW STATUS LIKE 'wsrep_local_state_comment'").endsWith('Synced')) return Date.now() - t0;
    } catch {
      // still starting
    }
  }
  throw new Error(`node ${n} not Synced after ${ms} ms`);
}

async function nodeKilled() {
  const s = await underLoad(async () => {
    const pid = pidOf('node2/pid');
    process.kill(pid, 'SIGKILL');
    await waitExit(pid);
    await sleep(3000);
    launch('node2/start.sh'); // rejoins (state transfer) while traffic goes on through nodes 1 and 3
  });
  expect(s.missing === 0 && s.twice === 0, `acknowledged readings lost or doubled: ${JSON.stringify(s)}`);
  const rejoinMs = await waitSynced(2);
  const counts = [1, 2, 3].map((n) =>
    Number(nodeSql(n, `SELECT COUNT(*) FROM specbench_cluster.readings WHERE job_id = ${s.jobId}`)),
  );
  expect(
    counts.every((c) => c === counts[0] && c >= s.acknowledged),
    `readings per node: ${counts.join(', ')}`,
  );
  return `Galera node 2 killed mid-traffic: ${s.acknowledged} acknowledged readings all kept (${s.writeFailures} write attempts failed and were retried); node 2 rejoined ${rejoinMs} ms after the load and holds the same ${counts[0]} rows as nodes 1 and 3`;
}

/** A CSV upload as multipart/form-data (field `file`), through the balancer. */
function upload(csv: string) {
  const boundary = `----specbench${Date.now()}`;
  const body =
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="cluster-check.csv"\r\n` +
    `Content-Type: text/csv\r\n\r\n${csv}\r\n--${boundary}--\r\n`;
  return new Promise<Answer>((resolve, reject) => {
    const req = http.request(
      {
        host: '127.0.0.1',
        port: LB,
        method: 'POST',
        path: '/api/imports',
        agent: false,
        headers: { ...auth, 'Content-Type': `multipart/form-data; boundary=${boundary}` },
      },
      (res) => {
        let text = '';
        res.on('data', (c: Buffer) => (text += c.toString()));
        res.on('end', () =>
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: JSON.parse(text), ms: 0 }),
        );
      },
    );
    req.on('error', reject);
    req.end(body);
  });
}

async function importWhileNodeDown() {
  const header = fs.readFileSync(path.join(__dirname, '../data/demo-library.csv'), 'utf8').split('\n')[0];
  const make = `Clusterwerk ${Date.now()}`;
  const rows = Array.from({ length: 40 }, (_, i) =>
    [
      make,
      `C${i}`,
      2020,
      2022,
      'test rig',
      'Ignition coil',
      'Primary winding resistance',
      2.4,
      2.8,
      3.2,
      'Ω',
      20,
      'copper',
      'pins 1-2',
      'engine cold',
      'Clusterwerk bench notes',
      '1st edition',
      '4',
      '',
      '',
    ].join(','),
  );
  const preview = await upload([header, ...rows].join('\r\n') + '\r\n');
  expect(preview.status === 201, `upload answered ${preview.status}: ${JSON.stringify(preview.body).slice(0, 300)}`);
  const pid = pidOf('node3/pid');
  process.kill(pid, 'SIGTERM');
  await waitExit(pid);
  const commit = await call(LB, 'POST', `/api/imports/${preview.body.id}/commit`, {}, auth);
  expect(commit.status === 200, `commit with node 3 stopped answered ${commit.status}`);
  launch('node3/start.sh');
  const rejoinMs = await waitSynced(3);
  const q = `SELECT COUNT(*) FROM specbench_cluster.specs s JOIN specbench_cluster.components c ON c.id = s.component_id
    JOIN specbench_cluster.vehicle_models m ON m.id = c.model_id JOIN specbench_cluster.makes k ON k.id = m.make_id WHERE k.name = '${make}'`;
  const counts = [1, 2, 3].map((n) => Number(nodeSql(n, q)));
  expect(
    counts.every((c) => c === rows.length),
    `specs of the import per node: ${counts.join(', ')}`,
  );
  return `${rows.length} specs committed while node 3 was stopped; node 3 rejoined after ${rejoinMs} ms and all three nodes hold all ${rows.length}`;
}

async function main() {
  await check('sign in on one replica, use on the other', signIn);
  await check('sign-in rate limit holds across both replicas', rateLimitShared);
  await check('an edit through A is visible on B (revisions, card, search)', editVisible);
  await check('each outbox message sent once', outboxOnce);
  await check('rolling restart under load', rollingRestart);
  await check('a replica killed mid-traffic', replicaKilled);
  if (GALERA) {
    await check('concurrent edits through two Galera nodes', concurrentEdits);
    await check('a Galera node killed mid-traffic', nodeKilled);
    await check('an import commit while a node is stopped and started again', importWhileNodeDown);
  }
  const failed = results.filter((r) => !r.ok).length;
  console.log(`${results.length - failed} passed, ${failed} failed`);
  process.exit(failed ? 1 : 0);
}

void main();
