/**
 * Serving the exported web app like a production web server:
 * - each route's pre-rendered HTML (`web.output: "static"`), dynamic URLs such as
 *   /specs/123 answered with their route's page (specs/[specId].html);
 * - the .br / .gz files written at build time (scripts/build-web.js) when the browser
 *   accepts them, with Content-Encoding and Vary: Accept-Encoding;
 * - hashed assets cached for a year (`immutable`), HTML, the service worker and the
 *   manifest revalidated on every use (`no-cache`).
 * The page's one inline script (Expo Router's hydration flag) is allowed by its hash.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type express from 'express';

export const IMMUTABLE = 'public, max-age=31536000, immutable';
const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.ttf': 'font/ttf',
  '.woff2': 'font/woff2',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.svg': 'image/svg+xml',
  '.txt': 'text/plain; charset=utf-8',
};
/** Files whose names carry a content hash (Metro's bundles and assets). */
const HASHED = /^\/(_expo\/static|assets)\/|[.-][0-9a-f]{20,}\.[a-z0-9]+$/;
const NO_CACHE = /\.html$|^\/sw\.js$|^\/manifest\.webmanifest$/;

type Page = { pattern: RegExp; file: string; specificity: number };

/** Every route page of the export, as a URL pattern: `specs/[specId].html` → /specs/<anything but a slash>. */
export function routePages(webDist: string): Page[] {
  const pages: Page[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(path.join(webDist, dir), { withFileTypes: true })) {
      const rel = path.posix.join(dir, entry.name);
      if (entry.isDirectory()) {
        if (!/^[(_]/.test(entry.name)) walk(rel); // groups are exported at the top level too
      } else if (entry.name.endsWith('.html') && !/^[+_]/.test(entry.name)) {
        const route = rel.replace(/\.html$/, '').replace(/(^|\/)index$/, '');
        const parts = route.split('/').filter(Boolean);
        const source = parts
          .map((p) => (/^\[\.\.\..+\]$/.test(p) ? '.+' : /^\[.+\]$/.test(p) ? '[^/]+' : escape(p)))
          .join('/');
        const specificity = parts.filter((p) => !p.startsWith('[')).length * 2 + parts.length;
        pages.push({ pattern: new RegExp(`^/${source}/?$`), file: rel, specificity });
      }
    }
  };
  walk('');
  return pages.sort((a, b) => b.specificity - a.specificity);
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The CSP source for each inline script in the pages (the same flag in all of them). */
export function inlineScriptHashes(webDist: string, pages: Page[]): string[] {
  const hashes = new Set<string>();
  for (const page of pages) {
    const html = fs.readFileSync(path.join(webDist, page.file), 'utf8');
    for (const m of html.matchAll(/<script(?![^>]*\ssrc=)[^>]*>([\s\S]*?)<\/script>/g))
      hashes.add(`'sha256-${crypto.createHash('sha256').update(m[1]).digest('base64')}'`);
  }
  return [...hashes];
}

function cacheControl(urlPath: string): string {
  if (NO_CACHE.test(urlPath)) return 'no-cache';
  if (HASHED.test(urlPath)) return IMMUTABLE;
  return 'public, max-age=86400';
}

/** Sends `file` (relative to webDist), choosing its pre-compressed twin when the browser accepts it. */
function sendFile(req: express.Request, res: express.Response, webDist: string, file: string, urlPath: string) {
  const full = path.join(webDist, file);
  const accepts = String(req.headers['accept-encoding'] ?? '');
  let sent = full;
  for (const [enc, ext] of [
    ['br', '.br'],
    ['gzip', '.gz'],
  ] as const) {
    if (new RegExp(`\\b${enc}\\b`).test(accepts) && fs.existsSync(full + ext)) {
      res.setHeader('Content-Encoding', enc);
      sent = full + ext;
      break;
    }
  }
  res.setHeader('Content-Type', TYPES[path.extname(file)] ?? 'application/octet-stream');
  res.setHeader('Vary', 'Accept-Encoding');
  res.setHeader('Cache-Control', cacheControl(urlPath));
  res.sendFile(sent, { headers: {}, cacheControl: false, lastModified: true, etag: true });
}

/** Mounts the web app on `app`: files, then route pages, then the not-found page (404). */
export function serveWeb(app: express.Express, webDist: string) {
  const pages = routePages(webDist);
  const scriptHashes = inlineScriptHashes(webDist, pages).join(' ');
  const allowInline = (res: express.Response) => {
    const csp = res.getHeader('Content-Security-Policy');
    if (typeof csp === 'string' && scriptHashes)
      res.setHeader('Content-Security-Policy', csp.replace(/script-src 'self'/, `script-src 'self' ${scriptHashes}`));
  };
  const root = path.resolve(webDist);
  app.get('/{*splat}', (req, res, next) => {
    let urlPath: string;
    try {
      urlPath = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    const file = path.resolve(root, '.' + urlPath);
    if (file.startsWith(root + path.sep) && fs.existsSync(file) && fs.statSync(file).isFile()) {
      if (file.endsWith('.html')) allowInline(res);
      return sendFile(req, res, webDist, path.relative(root, file), urlPath);
    }
    if (/\.[a-z0-9]+$/i.test(urlPath)) return next(); // a missing file is a JSON 404, not a page
    const page = pages.find((p) => p.pattern.test(urlPath));
    const notFound = fs.existsSync(path.join(root, '+not-found.html'));
    if (!page && !notFound) return next();
    allowInline(res);
    if (!page) res.status(404);
    sendFile(req, res, webDist, page ? page.file : '+not-found.html', '/page.html');
  });
}
