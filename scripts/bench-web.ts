/**
 * Benchmark (DESIGN §8, issue 11): the search home on a slow mobile connection, in Debian's
 * Chromium driven by playwright-core, served by the server bench.sh started (BENCH_URL,
 * the same server as `npm start`). Profile: Lighthouse's mobile "slow 4G" figures applied
 * as DevTools request-level throttling through CDP — latency 150 ms, 1.6 Mbit/s down
 * (204 800 B/s), 750 kbit/s up, CPU 4× slower — at 390×844.
 *
 * Figures (median of RUNS cold loads, each in a fresh browser context):
 * - first visit: largest contentful paint (ceiling: Core Web Vitals' "good", ≤ 2.5 s, web.dev/articles/lcp),
 *   and the search field typed into showing results (≤ 3.5 s); bytes on the wire until then;
 * - repeat visit (same context, service worker installed): the search field usable (≤ 1.0 s);
 * - each beside the same screen as a plain static HTML page with no JavaScript, measured the
 *   same way in the same run (the exported page with its scripts taken out).
 * It also prints the first screen's JavaScript raw and compressed (what was built, and sent).
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

const ROOT = path.resolve(__dirname, '..');
const DIST = path.join(ROOT, 'dist');
const base = process.env.BENCH_URL ?? 'http://127.0.0.1:8091';
const RUNS = Number(process.env.BENCH_WEB_RUNS ?? 3);
const QUERY = 'kestrel primary';
const CEILING_PAGE = 'bench-static-ceiling.html';
const SLOW_4G = { offline: false, latency: 150, downloadThroughput: 204_800, uploadThroughput: (750 * 1024) / 8 };

type Visit = { lcp: number; usable: number; results: number | null; bytes: number };

/** The first screen's scripts (from its exported page) and their size as built, gzip and brotli. */
function firstScreenJs() {
  const html = fs.readFileSync(path.join(DIST, 'index.html'), 'utf8');
  const files = [...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => path.join(DIST, m[1]));
  const size = (f: string, ext: string) => (fs.existsSync(f + ext) ? fs.statSync(f + ext).size : NaN);
  const raw = files.reduce((n, f) => n + fs.statSync(f).size, 0);
  const br = files.reduce((n, f) => n + size(f, '.br'), 0);
  const gz = files.reduce(
    (n, f) => n + (fs.existsSync(f + '.gz') ? size(f, '.gz') : zlib.gzipSync(fs.readFileSync(f)).length),
    0,
  );
  return { count: files.length, raw, gz, br };
}

/** The same first screen as plain HTML: the exported page without a single script. */
function writeCeilingPage() {
  const html = fs.readFileSync(path.join(DIST, 'index.html'), 'utf8').replace(/<script[\s\S]*?<\/script>/g, '');
  const file = path.join(DIST, CEILING_PAGE);
  fs.writeFileSync(file, html);
  fs.writeFileSync(`${file}.br`, zlib.brotliCompressSync(Buffer.from(html)));
  return () => [file, `${file}.br`].forEach((f) => fs.rmSync(f, { force: true }));
}

const LCP_OBSERVER = `
  window.__lcp = 0;
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) window.__lcp = Math.max(window.__lcp, e.renderTime || e.loadTime || e.startTime);
  }).observe({ type: 'largest-contentful-paint', buffered: true });`;

async function throttled(context: BrowserContext, page: Page) {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', SLOW_4G);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
  let bytes = 0;
  cdp.on('Network.loadingFinished', (e: { encodedDataLength: number }) => {
    bytes += e.encodedDataLength;
  });
  return () => bytes;
}

/** Milliseconds since the navigation started, read in the page. */
const sinceStart = (page: Page) => page.evaluate('performance.now()') as Promise<number>;

/** Hydrated: React has attached its props to the search field, so typing reaches the app. */
const HYDRATED = `(() => { const el = document.querySelector('[data-testid="search-input"]');
  return !!el && Object.keys(el).some((k) => k.startsWith('__reactProps')); })()`;

async function visit(page: Page, bytesSoFar: () => number, url: string, app: boolean): Promise<Visit> {
  const before = bytesSoFar();
  await page.goto(url, { waitUntil: 'commit' });
  let usable = NaN;
  let results: number | null = null;
  if (app) {
    await page.waitForFunction(HYDRATED, undefined, { polling: 'raf', timeout: 60_000 });
    usable = await sinceStart(page);
    await page.getByTestId('search-input').fill(QUERY);
    await page.getByTestId('search-results').waitFor({ timeout: 60_000 });
    results = await sinceStart(page);
  } else {
    await page.waitForLoadState('load');
    await page.waitForTimeout(300);
  }
  const lcp = (await page.evaluate('window.__lcp')) as number;
  return { lcp, usable, results, bytes: bytesSoFar() - before };
}

async function measure(browser: Browser, url: string, app: boolean) {
  // bypassCSP: the bench's own probes are evaluated strings, which the app's CSP (rightly) refuses.
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, bypassCSP: true });
  await context.addInitScript(LCP_OBSERVER);
  const page = await context.newPage();
  const bytes = await throttled(context, page);
  const first = await visit(page, bytes, url, app);
  if (app) {
    // Let the service worker install and the cache settle, as a technician's phone would between visits.
    await page.evaluate('navigator.serviceWorker ? navigator.serviceWorker.ready.then(() => true) : true');
    await page.waitForTimeout(2000);
  }
  const repeat = await visit(page, bytes, url, app);
  await context.close();
  return { first, repeat };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ms = (n: number) => `${Math.round(n)} ms`;
const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
const verdict = (value: number, max: number) => (value <= max ? 'met' : 'MISSED');

async function main() {
  const js = firstScreenJs();
  console.log(
    `web first screen JavaScript: ${js.count} files, ${kb(js.raw)} raw → ${kb(js.gz)} gzip, ${kb(js.br)} brotli (sent)`,
  );
  const removeCeiling = writeCeilingPage();
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
      '--disable-dev-shm-usage',
    ],
  });
  try {
    type Run = Awaited<ReturnType<typeof measure>>;
    const app: Run[] = [];
    const ceiling: Run[] = [];
    for (let i = 0; i < RUNS; i += 1) {
      ceiling.push(await measure(browser, `${base}/${CEILING_PAGE}`, false));
      app.push(await measure(browser, `${base}/`, true));
    }
    const m = (rows: Run[], pick: (r: Run) => number) => median(rows.map(pick));
    const lcp = m(app, (r) => r.first.lcp);
    const results = m(app, (r) => r.first.results ?? NaN);
    const repeat = m(app, (r) => r.repeat.usable);
    const cLcp = m(ceiling, (r) => r.first.lcp);
    const cRepeat = m(ceiling, (r) => r.repeat.lcp);
    const ratio = (a: number, b: number) => `${(a / b).toFixed(2)}× the static-HTML ceiling (${ms(b)})`;
    console.log(`web slow 4G (150 ms, 1.6 Mbit/s, CPU 4×, 390×844), median of ${RUNS}:`);
    console.log(`  first visit LCP ${ms(lcp)} · ≤ 2500 ms → ${verdict(lcp, 2500)} · ${ratio(lcp, cLcp)}`);
    console.log(
      `  first visit search usable ${ms(m(app, (r) => r.first.usable))}, results shown ${ms(results)} · ≤ 3500 ms → ${verdict(results, 3500)} · ${ratio(results, cLcp)}`,
    );
    console.log(
      `  first visit bytes on the wire ${kb(m(app, (r) => r.first.bytes))} (static-HTML ceiling ${kb(m(ceiling, (r) => r.first.bytes))})`,
    );
    console.log(
      `  repeat visit search usable ${ms(repeat)} · ≤ 1000 ms → ${verdict(repeat, 1000)} · ${ratio(repeat, cRepeat)} · ${kb(m(app, (r) => r.repeat.bytes))} on the wire`,
    );
  } finally {
    await browser.close();
    removeCeiling();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
