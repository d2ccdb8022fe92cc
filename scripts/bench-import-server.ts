/**
 * The import's memory as the server has it (issue 14's "peak server RSS"): the compiled
 * server (`node dist-server/server/index.js`, as npm start runs it) on the benchmark's
 * database, and 50 000-row files uploaded over HTTP by the demo editor, as the import screen
 * sends them. The figure is the kernel's high-water mark of the server process (VmHWM in
 * /proc/<pid>/status), read after each upload: the first upload on a fresh process, then
 * another on the same process; and, on another fresh process, the largest file accepted.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { config } from '@/server/config';
import { DEMO_ACCOUNTS, ensureDemoAccounts } from '@/server/db/seeds/demo-accounts';
import { makeBenchCsv, makeLargestCsv } from './bench-import-data';

const PORT = Number(process.env.BENCH_IMPORT_PORT ?? 8094);
const BASE = `http://127.0.0.1:${PORT}`;
const EDITOR = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!.email;

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

type Upload = { name: string; text: string; rows: number };

async function upload(token: string, file: Upload): Promise<number> {
  const form = new FormData();
  form.append('file', new Blob([file.text], { type: 'text/csv' }), `${file.name}.csv`);
  const t = performance.now();
  const res = await fetch(`${BASE}/api/imports`, {
    method: 'POST',
    headers: { authorization: `Bearer ${token}` },
    body: form,
  });
  const body = (await res.json()) as { counts?: { created: number } };
  if (res.status !== 201 || body.counts?.created !== file.rows)
    throw new Error(`upload ${file.name} answered ${res.status}, ${body.counts?.created ?? 'no'} rows to create`);
  return (performance.now() - t) / 1000;
}

type Measured = { idle: number; peaks: number[]; seconds: number[] };

/** A fresh server process, the files uploaded one after another, its high-water mark after each. */
async function onFreshServer(files: (() => Upload)[]): Promise<Measured> {
  const log = fs.openSync(path.join(config.dataDir, 'bench-import-server.log'), 'a');
  const server = spawn(process.execPath, ['dist-server/server/index.js'], {
    env: { ...process.env, PORT: String(PORT), FAKE_SMTP_PORT: '0', NODE_ENV: 'development' },
    stdio: ['ignore', log, log],
  });
  try {
    await waitUp();
    const token = await signIn();
    const pid = server.pid as number;
    const measured: Measured = { idle: procMb(pid, 'VmRSS'), peaks: [], seconds: [] };
    for (const make of files) {
      measured.seconds.push(await upload(token, make()));
      measured.peaks.push(procMb(pid, 'VmHWM'));
    }
    return measured;
  } finally {
    server.kill('SIGTERM');
    await new Promise((resolve) => server.once('exit', resolve));
    fs.closeSync(log);
  }
}

const mb = (n: number) => `${n.toFixed(0)} MB`;
const s = (n: number) => `${n.toFixed(2)} s`;

/**
 * Prints the server's peak RSS for two 50 000-row previews on one process, and for the largest
 * file accepted (the row limit, just under the upload limit) on another.
 */
export async function serverImportMemory(
  rows: number,
  goalMb: number,
  largest: { rows: number; bytes: number },
  largestGoalMb: number,
) {
  await ensureDemoAccounts();
  const fifty = (name: string) => () => ({ name, text: makeBenchCsv(rows, name), rows });
  const two = await onFreshServer([fifty('Srvmake a'), fifty('Srvmake b')]);
  console.log(
    `import, server process (node dist-server/server/index.js, ${rows.toLocaleString('en')}-row upload over HTTP): idle RSS ${mb(two.idle)} · peak ${mb(two.peaks[0])} after the first preview (${s(two.seconds[0])}), ${mb(two.peaks[1])} after a second (${s(two.seconds[1])}) · goal ≤ ${goalMb} MB → ${Math.max(...two.peaks) <= goalMb ? 'met' : 'MISSED'}`,
  );
  let size = 0;
  const big = await onFreshServer([
    () => {
      const text = makeLargestCsv(largest.rows, largest.bytes, 'Lg');
      size = Buffer.byteLength(text);
      return { name: 'Lg largest', text, rows: largest.rows };
    },
  ]);
  console.log(
    `import, server process, the largest file accepted (${largest.rows.toLocaleString('en')} rows, ${(size / 2 ** 20).toFixed(1)} MB): idle RSS ${mb(big.idle)} · peak ${mb(big.peaks[0])} (preview ${s(big.seconds[0])}) · goal ≤ ${largestGoalMb} MB → ${big.peaks[0] <= largestGoalMb ? 'met' : 'MISSED'}`,
  );
}
