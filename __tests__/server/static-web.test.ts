/**
 * The web build served like a production web server (issue 11): pre-compressed files with
 * Content-Encoding and Vary, hashed assets immutable for a year, HTML revalidated, dynamic
 * URLs answered with their route's page, and the page's inline script allowed by hash.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import request from 'supertest';
import { createApp } from '@/server/app';

const HASH = '0123456789abcdef0123456789abcdef';
const FLAG = 'globalThis.__EXPO_ROUTER_HYDRATE__=true;';
let dist: string;

function write(rel: string, text: string) {
  const file = path.join(dist, rel);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, text);
  fs.writeFileSync(`${file}.br`, zlib.brotliCompressSync(Buffer.from(text)));
  fs.writeFileSync(`${file}.gz`, zlib.gzipSync(Buffer.from(text)));
}

beforeAll(() => {
  dist = fs.mkdtempSync(path.join(os.tmpdir(), 'specbench-web-'));
  write('index.html', `<html><script type="module">${FLAG}</script><body>home</body></html>`);
  write('specs/[specId].html', '<html><body>spec page</body></html>');
  write('+not-found.html', '<html><body>not found</body></html>');
  write(`_expo/static/js/web/entry-${HASH}.js`, 'console.log("entry");'.repeat(50));
  write(`_expo/static/css/web-${HASH}.css`, 'body{margin:0}'.repeat(50));
  write('sw.js', 'self.addEventListener("fetch", () => {});');
});
afterAll(() => fs.rmSync(dist, { recursive: true, force: true }));

const app = () => createApp({ webDist: dist });

describe('the web build', () => {
  it.each([
    ['br', `_expo/static/js/web/entry-${HASH}.js`],
    ['gzip', `_expo/static/js/web/entry-${HASH}.js`],
    ['br', `_expo/static/css/web-${HASH}.css`],
  ])('when the browser accepts %s, sends %s pre-compressed, immutable for a year', async (enc, file) => {
    const res = await request(app()).get(`/${file}`).set('Accept-Encoding', enc).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe(enc);
    expect(res.headers['vary']).toMatch(/Accept-Encoding/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-type']).toMatch(file.endsWith('.js') ? /javascript/ : /text\/css/);
  });

  it('when the browser accepts no compression, sends the plain file', async () => {
    const res = await request(app()).get(`/_expo/static/js/web/entry-${HASH}.js`).set('Accept-Encoding', 'identity');
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.text).toContain('console.log("entry")');
  });

  it('answers a dynamic URL with its route page, revalidated, its inline script allowed by hash', async () => {
    const res = await request(app()).get('/specs/123').set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.text).toContain('spec page');
    expect(res.headers['cache-control']).toBe('no-cache');
    const home = await request(app()).get('/');
    expect(home.text).toContain('home');
    expect(home.headers['content-security-policy']).toMatch(/script-src 'self' 'sha256-[A-Za-z0-9+/=]+'/);
  });

  it('revalidates the service worker; an unknown page is the not-found page with 404, a missing file JSON 404', async () => {
    expect((await request(app()).get('/sw.js')).headers['cache-control']).toBe('no-cache');
    const page = await request(app()).get('/no/such/page');
    expect(page.status).toBe(404);
    expect(page.text).toContain('not found');
    const file = await request(app()).get('/missing.js');
    expect(file.status).toBe(404);
    expect(file.headers['content-type']).toMatch(/problem\+json/);
  });
});
