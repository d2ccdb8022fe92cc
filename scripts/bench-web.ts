/**
 * Benchmark (DESIGN §8): the web app's first screen. Prints the gzipped size of the
 * JavaScript the first screen loads, and the time until search home is usable (the
 * search field visible and accepting text) in Debian's Chromium at phone size with the
 * CPU slowed 4×, served from loopback by a server that bench.sh started (BENCH_URL).
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { chromium } from 'playwright-core';

const ROOT = path.resolve(__dirname, '..');
const base = process.env.BENCH_URL ?? 'http://127.0.0.1:8091';

function firstScreenScripts(): string[] {
  const html = fs.readFileSync(path.join(ROOT, 'dist', 'index.html'), 'utf8');
  return [...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => path.join(ROOT, 'dist', m[1]));
}

async function timeToUsable(): Promise<number[]> {
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  const times: number[] = [];
  for (let i = 0; i < 5; i += 1) {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    const start = Date.now();
    await page.goto(base);
    await page.getByTestId('search-input').fill('gap');
    times.push(Date.now() - start);
    await context.close();
  }
  await browser.close();
  return times.sort((a, b) => a - b);
}

async function main() {
  const scripts = firstScreenScripts();
  const raw = scripts.reduce((n, f) => n + fs.statSync(f).size, 0);
  const gz = scripts.reduce((n, f) => n + zlib.gzipSync(fs.readFileSync(f), { level: 9 }).length, 0);
  console.log(
    `web first screen JavaScript: ${scripts.length} file(s), ${(raw / 1024).toFixed(0)} KB raw, ${(gz / 1024).toFixed(0)} KB gzipped · target ≤ 600 KB → ${gz <= 600 * 1024 ? 'met' : 'MISSED'}`,
  );
  const times = await timeToUsable();
  const median = times[Math.floor(times.length / 2)];
  console.log(
    `search home usable (phone, CPU 4× slower, 5 cold loads): median ${median} ms, worst ${times[times.length - 1]} ms · target ≤ 2000 ms → ${median <= 2000 ? 'met' : 'MISSED'}`,
  );
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
