/**
 * The import's memory as the server has it (issue 14's "peak server RSS"): the compiled
 * server (`node dist-server/server/index.js`, as npm start runs it) on the benchmark's
 * database, and 50 000-row files uploaded over HTTP by the demo editor, as the import screen
 * sends them. The figure is the kernel's high-water mark of the server process (VmHWM in
 * /proc/<pid>/status), read after each upload: the first upload on a fresh process, then
 * another on the same process.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { config } from '@/server/config';
import { ensureDemoAccounts } from '@/server/db/seeds/demo-accounts';
import { makeBenchCsv } from './bench-import-data';

const PORT = Number(process.env.BENCH_IMPORT_PORT ?? 8094);
const BASE = `http://127.0.0.1:${PORT}`;
const EDITOR = 'editor@specbench.example';

/** A field of /proc/<pid>/status, in MB. */
function procMb(pid: number, field: 'VmRSS' | 'VmHWM'): number {
  const status = fs.readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status);
  if (!kb) throw new Error(`no ${field} in /proc/${pid}/status`);
  return Number(kb[1]) / 1024;
}

async function waitUp() {
  for (let i = 0; i < 150; i++) {
    const up = await fetch(`${BASE}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return;
    await sleep(200);
  }
  throw new Error(`the server did not answer on ${BASE}`);
}

async function signIn(): Promise<string> {
  const res = await fetch(`${BASE}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: EDITOR, password: config.DEMO_PASSWORD }),
  });
  const body = (await res.json()) as { accessToken?: string };
  if (!res.ok || !body.accessToken) throw new Error(`sign-in as ${EDITOR} answered ${res.status}`);
  return body.accessToken;
}

async function upload(token: string, name: string, rows: number): Promise<number> {
  const form = new FormData();
  form.append('file', new Blob([makeBenchCsv(rows, name)], { type: 'text/csv' }), `${name}.csv`);
  const t = performance.now();
  const res = await fetch(`${BASE}/api/imports`, {
    method: 'POST',
    headers: { authorization: `Bearer ${token}` },
    body: form,
  });
  const body = (await res.json()) as { counts?: { created: number } };
  if (res.status !== 201 || body.counts?.created !== rows)
    throw new Error(`upload ${name} answered ${res.status}, ${body.counts?.created ?? 'no'} rows to create`);
  return (performance.now() - t) / 1000;
}

/** Prints the server's peak RSS for two 50 000-row previews; true when the goal is met. */
export async function serverImportMemory(rows: number, goalMb: number): Promise<boolean> {
  await ensureDemoAccounts();
  const log = fs.openSync(path.join(config.dataDir, 'bench-import-server.log'), 'w');
  const server = spawn(process.execPath, ['dist-server/server/index.js'], {
    env: { ...process.env, PORT: String(PORT), FAKE_SMTP_PORT: '0', NODE_ENV: 'development' },
    stdio: ['ignore', log, log],
  });
  try {
    await waitUp();
    const token = await signIn();
    const pid = server.pid as number;
    const idle = procMb(pid, 'VmRSS');
    const first = await upload(token, 'Srvmake a', rows);
    const peak1 = procMb(pid, 'VmHWM');
    const second = await upload(token, 'Srvmake b', rows);
    const peak2 = procMb(pid, 'VmHWM');
    const met = Math.max(peak1, peak2) <= goalMb;
    console.log(
      `import, server process (node dist-server/server/index.js, ${rows.toLocaleString('en')}-row upload over HTTP): idle RSS ${idle.toFixed(0)} MB · peak ${peak1.toFixed(0)} MB after the first preview (${first.toFixed(2)} s), ${peak2.toFixed(0)} MB after a second (${second.toFixed(2)} s) · goal ≤ ${goalMb} MB → ${met ? 'met' : 'MISSED'}`,
    );
    return met;
  } finally {
    server.kill('SIGTERM');
    await new Promise((resolve) => server.once('exit', resolve));
    fs.closeSync(log);
  }
}
