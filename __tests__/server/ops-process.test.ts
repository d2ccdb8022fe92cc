/**
 * The real server process (server/index.ts under tsx) on a MariaDB of this test's own:
 *  - a frozen database (kill -STOP) gives 503 with Retry-After within 2 s, bounded spec
 *    reads, and recovery once it thaws (issue 13 item 10);
 *  - SIGTERM stops accepting, finishes the request in flight and exits 0 (issue 15).
 */
import { execFile, spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import net from 'node:net';
import path from 'node:path';
import { promisify } from 'node:util';
import { freePort, startThrowawayMariadb, type Throwaway } from '../helpers/throwaway-mariadb';

const ROOT = path.resolve(__dirname, '../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');
const QUERY_TIMEOUT_MS = 2000;

let db: Throwaway;
let server: ChildProcess;
let port: number;
let exited: Promise<number | null>;
let output = '';

function env(): NodeJS.ProcessEnv {
  return {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    DATA_DIR: process.env.DATA_DIR,
    NODE_ENV: 'test',
    DB_PORT: String(db.port),
    DB_NAME: 'specbench_proc',
    PORT: String(port),
    FAKE_SMTP_PORT: '0',
    DB_QUERY_TIMEOUT_MS: String(QUERY_TIMEOUT_MS),
    SHUTDOWN_TIMEOUT_MS: '8000',
  };
}

type Answer = { status: number; headers: http.IncomingHttpHeaders; body: { code?: string }; ms: number };

/** One GET on a fresh connection, given up after `ms`. */
function get(urlPath: string, ms = 5000): Promise<Answer> {
  const started = Date.now();
  return new Promise((resolve, reject) => {
    const req = http.get({ host: '127.0.0.1', port, path: urlPath, agent: false, timeout: ms }, (res) => {
      let text = '';
      res.on('data', (c: Buffer) => (text += c.toString()));
      res.on('end', () =>
        resolve({
          status: res.statusCode ?? 0,
          headers: res.headers,
          body: JSON.parse(text),
          ms: Date.now() - started,
        }),
      );
    });
    req.on('timeout', () => req.destroy(new Error(`no answer within ${ms} ms`)));
    req.on('error', reject);
  });
}

beforeAll(async () => {
  db = await startThrowawayMariadb('specbench', 'specbench-local');
  port = await freePort();
  await promisify(execFile)(TSX, ['--tsconfig', 'server/tsconfig.json', 'server/cli/setup.ts'], {
    cwd: ROOT,
    env: env(),
  });
  server = spawn(TSX, ['--tsconfig', 'server/tsconfig.json', 'server/index.ts'], { cwd: ROOT, env: env() });
  server.stdout?.on('data', (c: Buffer) => (output += c.toString()));
  server.stderr?.on('data', (c: Buffer) => (output += c.toString()));
  exited = new Promise((resolve) => server.once('exit', (code) => resolve(code)));
  for (let i = 0; ; i += 1) {
    const up = await get('/api/health/ready', 1000).catch(() => null);
    if (up?.status === 200) break;
    if (i > 150) throw new Error(`server did not become ready:\n${output}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}, 120_000);

afterAll(async () => {
  if (server && server.exitCode === null) server.kill('SIGKILL');
  await db?.stop();
});

describe('a frozen database', () => {
  afterEach(() => process.kill(db.pid, 'SIGCONT'));

  it('health and readiness answer 503 with Retry-After within 2 s, spec reads are bounded, and it recovers', async () => {
    expect((await get('/api/specs/1')).status).toBe(200);
    process.kill(db.pid, 'SIGSTOP');

    const [health, ready, spec] = await Promise.all([
      get('/api/health'),
      get('/api/health/ready'),
      get('/api/specs/2', QUERY_TIMEOUT_MS + 8000),
    ]);
    expect(health).toMatchObject({ status: 503, body: { code: 'unavailable' } });
    expect(health.ms).toBeLessThan(2000);
    expect(health.headers['retry-after']).toBe('2');
    expect(ready.status).toBe(503);
    expect(ready.ms).toBeLessThan(2000);
    // Not a hang: the query's own bound answers (plus at most one connect timeout).
    expect(spec.status).toBe(503);
    expect(spec.headers['retry-after']).toBe('2');
    expect(spec.ms).toBeLessThan(QUERY_TIMEOUT_MS + 6000);
    // The process itself is fine all along.
    expect((await get('/api/health/live')).status).toBe(200);

    process.kill(db.pid, 'SIGCONT');
    let back = await get('/api/health/ready').catch(() => null);
    for (let i = 0; i < 40 && back?.status !== 200; i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 250));
      back = await get('/api/health/ready').catch(() => null);
    }
    expect(back?.status).toBe(200);
    expect((await get('/api/specs/2')).status).toBe(200);
  }, 60_000);
});

describe('SIGTERM', () => {
  it('refuses new connections, finishes the request in flight, closes the pool and exits 0', async () => {
    const body = JSON.stringify({ spec: { min: 3.57, max: 4.83, unit: 'ohm' }, reading: { value: 4.1, unit: 'Ω' } });
    const socket = net.connect(port, '127.0.0.1');
    await new Promise((resolve) => socket.once('connect', resolve));
    let answer = '';
    socket.on('data', (c: Buffer) => (answer += c.toString()));
    // Half a request: the server is now in the middle of it.
    socket.write(
      `POST /api/verdicts HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\nContent-Length: ${Buffer.byteLength(body)}\r\n\r\n${body.slice(0, 10)}`,
    );
    await new Promise((resolve) => setTimeout(resolve, 300));
    server.kill('SIGTERM');
    await new Promise((resolve) => setTimeout(resolve, 500));

    await expect(get('/api/health/live', 1000)).rejects.toThrow();
    expect(server.exitCode).toBeNull();

    socket.write(body.slice(10));
    const closed = new Promise((resolve) => socket.once('close', resolve));
    expect(await exited).toBe(0);
    await closed;
    expect(answer).toMatch(/^HTTP\/1\.1 200 OK/);
    expect(answer).toContain('"verdict":"pass"');
  }, 30_000);
});
