/**
 * Benchmark (DESIGN §8): spec reads under load. Runs against a server started by
 * bench.sh (a separate process, so the load generator does not share its event loop):
 * BENCH_URL, BENCH_CONNECTIONS (50) keep-alive connections for BENCH_SECONDS (30) each
 * fetch GET /api/specs/:id for random published specs. Prints p50 / p95 / p99, the
 * request rate and the error count.
 */
import http from 'node:http';
import { performance } from 'node:perf_hooks';

const base = new URL(process.env.BENCH_URL ?? 'http://127.0.0.1:8090');
const connections = Number(process.env.BENCH_CONNECTIONS ?? 50);
const seconds = Number(process.env.BENCH_SECONDS ?? 30);
const agent = new http.Agent({ keepAlive: true, maxSockets: connections });

function get(path: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = http.get({ hostname: base.hostname, port: base.port, path, agent }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => {
        body += c;
      });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
  });
}

async function specIds(): Promise<number[]> {
  const models = JSON.parse((await get('/api/models')).body) as { id: number }[];
  const ids: number[] = [];
  for (const m of models) {
    const detail = JSON.parse((await get(`/api/models/${m.id}`)).body) as {
      components: { specs: { id: number }[] }[];
    };
    for (const c of detail.components) for (const s of c.specs) ids.push(s.id);
  }
  return ids;
}

async function main() {
  const ids = await specIds();
  if (ids.length === 0) throw new Error('no specs to read');
  const latencies: number[] = [];
  let errors = 0;
  const end = performance.now() + seconds * 1000;
  const worker = async () => {
    while (performance.now() < end) {
      const t = performance.now();
      try {
        const res = await get(`/api/specs/${ids[Math.floor(Math.random() * ids.length)]}`);
        if (res.status !== 200) errors += 1;
      } catch {
        errors += 1;
      }
      latencies.push(performance.now() - t);
    }
  };
  await Promise.all(Array.from({ length: connections }, worker));
  latencies.sort((a, b) => a - b);
  const p = (q: number) =>
    latencies[Math.min(latencies.length - 1, Math.ceil((q / 100) * latencies.length) - 1)].toFixed(2);
  const p95 = Number(p(95));
  console.log(
    `spec reads: ${connections} connections × ${seconds} s, ${latencies.length} requests (${(latencies.length / seconds).toFixed(0)}/s), ${errors} errors`,
  );
  console.log(
    `spec read latency: p50 ${p(50)} ms · p95 ${p(95)} ms · p99 ${p(99)} ms · target p95 ≤ 25 ms with zero errors → ${p95 <= 25 && errors === 0 ? 'met' : 'MISSED'}`,
  );
  agent.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
