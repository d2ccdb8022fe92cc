/**
 * Benchmark (issue 12): starting a plan run and answering its first step, under load, against
 * the server bench.sh starts (demo library and accounts loaded). The demo contributor's
 * session keeps jobs on the demo 650 Moorland; each pair starts the no-spark plan on a job and
 * answers its battery step with a fresh Idempotency-Key, for BENCH_RUN_SECONDS (15) per load:
 * - closed loop, one connection: what a request costs on an idle server;
 * - closed loop, BENCH_RUN_CONNECTIONS (10) connections back to back: the saturation rate of
 *   one server process (each waits for its answer and sends again at once, so latency there
 *   is queueing behind the others);
 * - open loop at BENCH_RUN_RATE (50) requests/s, paced whatever the answers do, each latency
 *   counted from its scheduled time (no coordinated omission): about 1 500 technicians each
 *   answering a step a minute and starting a run as often.
 * Prints p50 / p95 / p99 of each request against the API's p95 goal (25 ms, DESIGN §8), the
 * request rate and the error count.
 */
import { performance } from 'node:perf_hooks';

const base = process.env.BENCH_URL ?? 'http://127.0.0.1:8090';
const connections = Number(process.env.BENCH_RUN_CONNECTIONS ?? 10);
const seconds = Number(process.env.BENCH_RUN_SECONDS ?? 15);
const rate = Number(process.env.BENCH_RUN_RATE ?? 50);
const GOAL_MS = 25;

async function call(path: string, init: RequestInit & { token?: string } = {}) {
  const headers: Record<string, string> = {
    'Content-Type': 'application/json',
    ...(init.headers as Record<string, string>),
  };
  if (init.token) headers.Authorization = `Bearer ${init.token}`;
  const res = await fetch(`${base}${path}`, { ...init, headers });
  return { status: res.status, body: (await res.json().catch(() => null)) as Record<string, unknown> & unknown[] };
}

async function arrange() {
  const password = process.env.DEMO_PASSWORD ?? 'bench-demo-2026';
  const signIn = await call('/api/auth/sign-in', {
    method: 'POST',
    body: JSON.stringify({ email: 'contributor@specbench.example', password }),
  });
  const token = signIn.body.accessToken as string;
  const models = (await call('/api/models')).body as unknown as { id: number; name: string; yearFrom: number }[];
  const moorland = models.find((m) => m.name === '650 Moorland')!;
  const plan = ((await call('/api/plans?q=no%20spark')).body as unknown as { id: number }[])[0];
  const jobs: number[] = [];
  // One job per connection, and enough for the open loop never to queue two pairs on one job.
  for (let i = 0; i < Math.max(connections, 40); i++) {
    const job = await call('/api/jobs', {
      method: 'POST',
      token,
      body: JSON.stringify({ modelId: moorland.id, notes: 'bench' }),
    });
    jobs.push(job.body.id as number);
  }
  return { token, planId: plan.id, jobs };
}

const pct = (xs: number[], q: number) => xs[Math.min(xs.length - 1, Math.ceil((q / 100) * xs.length) - 1)];

function report(name: string, xs: number[]) {
  xs.sort((a, b) => a - b);
  const p95 = pct(xs, 95);
  console.log(
    `${name}: ${xs.length} requests · p50 ${pct(xs, 50).toFixed(2)} ms · p95 ${p95.toFixed(2)} ms · p99 ${pct(xs, 99).toFixed(2)} ms · target p95 ≤ ${GOAL_MS} ms → ${p95 <= GOAL_MS ? 'met' : 'MISSED'}`,
  );
}

/** `width` workers (each on its own job) for `seconds`: start a run, answer its first step, again. */
async function load(width: number, token: string, planId: number, jobs: number[]) {
  const starts: number[] = [];
  const answers: number[] = [];
  let errors = 0;
  const end = performance.now() + seconds * 1000;
  const worker = async (jobId: number, w: number) => {
    for (let n = 0; performance.now() < end; n++) {
      let t = performance.now();
      const run = await call(`/api/jobs/${jobId}/runs`, { method: 'POST', token, body: JSON.stringify({ planId }) });
      starts.push(performance.now() - t);
      if (run.status !== 201) {
        errors += 1;
        continue;
      }
      t = performance.now();
      const res = await call(`/api/jobs/${jobId}/runs/${run.body.id}/results`, {
        method: 'POST',
        token,
        headers: { 'Idempotency-Key': `bench-${w}-${n}-${Date.now()}` },
        body: JSON.stringify({ stepId: 'battery', reading: { value: 13.1, unit: 'V' } }),
      });
      answers.push(performance.now() - t);
      if (res.status !== 201) errors += 1;
    }
  };
  await Promise.all(jobs.slice(0, width).map(worker));
  const rate = (starts.length + answers.length) / seconds;
  console.log(
    `plan runs: ${width} connection${width === 1 ? '' : 's'} × ${seconds} s, ${rate.toFixed(0)} requests/s, ${errors} errors`,
  );
  report('  start a run', starts);
  report('  answer a step', answers);
}

/** One pair (start, answer) on `jobId`, both latencies counted from `from`, the pair's scheduled time. */
async function pair(jobId: number, token: string, planId: number, key: string, from: number) {
  const run = await call(`/api/jobs/${jobId}/runs`, { method: 'POST', token, body: JSON.stringify({ planId }) });
  const started = performance.now();
  if (run.status !== 201) return { start: started - from, answer: null, errors: 1 };
  const res = await call(`/api/jobs/${jobId}/runs/${run.body.id}/results`, {
    method: 'POST',
    token,
    headers: { 'Idempotency-Key': key },
    body: JSON.stringify({ stepId: 'battery', reading: { value: 13.1, unit: 'V' } }),
  });
  return { start: started - from, answer: performance.now() - started, errors: res.status === 201 ? 0 : 1 };
}

/** Pairs sent on a fixed schedule (rate / 2 a second, round the jobs), whatever the answers do. */
async function openLoop(token: string, planId: number, jobs: number[]) {
  const starts: number[] = [];
  const answers: number[] = [];
  let errors = 0;
  const gap = 2000 / rate;
  const t0 = performance.now() + 50;
  const count = Math.floor((seconds * 1000) / gap);
  const sent: Promise<void>[] = [];
  for (let i = 0; i < count; i++) {
    const at = t0 + i * gap;
    const wait = at - performance.now();
    if (wait > 0) await new Promise((r) => setTimeout(r, wait));
    sent.push(
      pair(jobs[i % jobs.length], token, planId, `bench-open-${i}-${Date.now()}`, at).then((p) => {
        starts.push(p.start);
        if (p.answer !== null) answers.push(p.answer);
        errors += p.errors;
      }),
    );
  }
  await Promise.all(sent);
  console.log(
    `plan runs: open loop at ${rate} requests/s (${(rate / 2).toFixed(0)} runs started and answered a second) × ${seconds} s, ${errors} errors`,
  );
  report('  start a run', starts);
  report('  answer a step', answers);
}

async function main() {
  const { token, planId, jobs } = await arrange();
  // One technician at a time (the latency a request costs), then many back to back (queueing on one process).
  for (const width of [...new Set([1, connections])]) await load(width, token, planId, jobs);
  // A steady load well under that saturation: the latency technicians get on a busy day.
  await openLoop(token, planId, jobs);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
