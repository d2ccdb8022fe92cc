/**
 * Resilience check (DESIGN §9): MariaDB restarts while technicians keep saving readings.
 * Against a server started by bench.sh (BENCH_URL), 10 writers post readings with their
 * own Idempotency-Keys for BENCH_RESTART_SECONDS (12); after 3 s the database is stopped
 * and started again. Prints how many writes were acknowledged, answered 503, or failed
 * otherwise, whether the server recovered by itself, and how many acknowledged writes
 * are missing afterwards (must be 0).
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { randomUUID } from 'node:crypto';

const base = process.env.BENCH_URL ?? 'http://127.0.0.1:8091';
const seconds = Number(process.env.BENCH_RESTART_SECONDS ?? 12);
const db = (cmd: string) => execFileSync('bash', [path.join(__dirname, 'db.sh'), cmd], { stdio: 'ignore' });

async function call(method: string, url: string, token?: string, body?: unknown, key?: string) {
  const headers: Record<string, string> = { 'Content-Type': 'application/json' };
  if (token) headers.Authorization = `Bearer ${token}`;
  if (key) headers['Idempotency-Key'] = key;
  const res = await fetch(`${base}${url}`, {
    method,
    headers,
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return { status: res.status, body: (await res.json().catch(() => null)) as Record<string, unknown> | null };
}

async function main() {
  const signIn = await call('POST', '/api/auth/sign-in', undefined, {
    email: 'contributor@specbench.example',
    password: process.env.DEMO_PASSWORD ?? 'bench-demo-2026',
  });
  if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
  const token = String(signIn.body!.accessToken);
  const job = await call('POST', '/api/jobs', token, { machineLabel: 'Restart check bench machine' });
  const jobId = Number(job.body!.id);
  const acked = new Set<string>();
  const counts = { sent: 0, acked: 0, unavailable: 0, other: 0 };
  let lastOkAt = 0;
  let restartedAt = 0;
  const end = Date.now() + seconds * 1000;
  const writer = async () => {
    while (Date.now() < end) {
      const key = `restart-${randomUUID()}`;
      counts.sent += 1;
      try {
        const res = await call(
          'POST',
          `/api/jobs/${jobId}/readings`,
          token,
          { spec: { min: 1, max: 2, unit: 'ohm' }, label: 'Restart check', reading: { value: 1.5, unit: 'ohm' } },
          key,
        );
        if (res.status === 201 || res.status === 200) {
          counts.acked += 1;
          acked.add(key);
          lastOkAt = Date.now();
        } else if (res.status === 503) counts.unavailable += 1;
        else counts.other += 1;
      } catch {
        counts.other += 1;
      }
      if (counts.unavailable > 0 && Date.now() < end) await new Promise((r) => setTimeout(r, 100));
    }
  };
  const restart = (async () => {
    await new Promise((r) => setTimeout(r, 3000));
    db('stop');
    await new Promise((r) => setTimeout(r, 2000));
    db('start');
    restartedAt = Date.now();
  })();
  await Promise.all([...Array.from({ length: 10 }, writer), restart]);
  const sheet = await call('GET', `/api/jobs/${jobId}`, token);
  const stored = new Set(((sheet.body?.readings ?? []) as { idempotencyKey: string }[]).map((r) => r.idempotencyKey));
  const lost = [...acked].filter((k) => !stored.has(k)).length;
  const recovered = lastOkAt > restartedAt && sheet.status === 200;
  console.log(
    `database restart under writes: ${counts.sent} sent · ${counts.acked} acknowledged · ${counts.unavailable} answered 503 · ${counts.other} other errors`,
  );
  console.log(
    `after the restart: ${recovered ? 'recovered without restarting the server' : 'did NOT recover'} · acknowledged writes missing: ${lost} → ${recovered && lost === 0 && counts.other === 0 ? 'met' : 'MISSED'}`,
  );
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
