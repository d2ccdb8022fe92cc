#!/usr/bin/env node
/**
 * The web build's last steps, after `expo export --platform web` wrote dist/:
 * 1. the web app manifest and its icons (installable app);
 * 2. a Workbox service worker (workbox-build generateSW): the app shell, every route's page
 *    and code and the fonts precached; the library's public GET API cached at run time
 *    (network first, a few seconds' patience, bounded), never an answer sent with a token or
 *    marked no-store/private — the user's own data stays in the app's device storage;
 * 3. the fonts (scripts/web-fonts.js): a cut-down WOFF2 of each weight, preloaded by every
 *    page with its @font-face rules, the full font as a fallback face;
 * 4. brotli and gzip twins of every text file and font, for server/http/static.ts.
 * Usage: node scripts/build-web.js [distDir]
 */
const fs = require('node:fs');
const path = require('node:path');
const zlib = require('node:zlib');
const { generateSW } = require('workbox-build');
const { writeWebFonts } = require('./web-fonts');

const ROOT = path.resolve(__dirname, '..');
const dist = path.resolve(process.argv[2] ?? path.join(ROOT, 'dist'));
const COMPRESS = /\.(js|css|html|json|webmanifest|svg|ttf|ico|txt|map)$/;

function writeManifest() {
  const { expo } = JSON.parse(fs.readFileSync(path.join(ROOT, 'app.json'), 'utf8'));
  fs.mkdirSync(path.join(dist, 'icons'), { recursive: true });
  for (const size of [192, 512])
    fs.copyFileSync(path.join(ROOT, `assets/images/icon-${size}.png`), path.join(dist, `icons/icon-${size}.png`));
  const manifest = {
    name: expo.web.name,
    short_name: expo.web.shortName,
    description: 'Component specs and tolerance calculators for electrical fault finding.',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    theme_color: expo.web.themeColor,
    background_color: expo.web.backgroundColor,
    icons: [192, 512].map((s) => ({ src: `/icons/icon-${s}.png`, sizes: `${s}x${s}`, type: 'image/png' })),
  };
  fs.writeFileSync(path.join(dist, 'manifest.webmanifest'), JSON.stringify(manifest, null, 2));
}

const HYDRATE_FLAG = /<script type="module">globalThis\.__EXPO_ROUTER_HYDRATE__=true;<\/script>/;

/**
 * Pages rendered without their parameters (specs/[specId].html) and the offline shell do not
 * match the screen the router will show, so they must not be hydrated (React would throw away
 * the tree after a mismatch): without Expo Router's hydration flag the app renders afresh
 * over the page. Exact pages (/, /calculator) keep it and hydrate.
 */
const htmlFiles = (dir) =>
  fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const f = path.join(dir, e.name);
    return e.isDirectory() ? htmlFiles(f) : e.name.endsWith('.html') ? [f] : [];
  });

/** Every page's <head> gets the fonts' preloads and @font-face rules. */
function addToHeads(markup) {
  for (const file of htmlFiles(dist)) {
    const html = fs.readFileSync(file, 'utf8');
    if (!html.includes('</head>')) throw new Error(`${file} has no </head>`);
    fs.writeFileSync(file, html.replace('</head>', `${markup}</head>`));
  }
}

function writeShells() {
  // Pages that read their query string (/verify?token=…, /reset?token=…) differ from their static render too.
  const byQuery = /[\\/](verify|reset)\.html$/;
  for (const file of htmlFiles(dist).filter((f) => f.includes('[') || byQuery.test(f))) {
    fs.writeFileSync(file, fs.readFileSync(file, 'utf8').replace(HYDRATE_FLAG, ''));
  }
  const index = fs.readFileSync(path.join(dist, 'index.html'), 'utf8');
  if (!HYDRATE_FLAG.test(index)) throw new Error('index.html has no hydration flag: did Expo Router change it?');
  fs.writeFileSync(path.join(dist, 'shell.html'), index.replace(HYDRATE_FLAG, ''));
}

/** Library reads anyone may make: search, models and spec cards (not the editors' or users' routes). */
function isPublicLibraryRead({ url, request }) {
  return (
    request.method === 'GET' &&
    url.origin === self.location.origin &&
    /^\/api\/(search|models|specs)(\/|$|\?)/.test(url.pathname) &&
    !request.headers.has('Authorization')
  );
}

/** Workbox plugin: only plain 200 answers that do not forbid keeping them go into the shared cache. */
const onlyShareable = {
  cacheWillUpdate: async ({ response }) => {
    const cc = response.headers.get('Cache-Control') || '';
    return response.status === 200 && !/no-store|private/i.test(cc) ? response : null;
  },
};

async function writeServiceWorker() {
  const { count, size, warnings } = await generateSW({
    globDirectory: dist,
    globPatterns: ['**/*.{js,html,css,ttf,woff2,png,ico,webmanifest}'],
    // Editors' and admins' pages are opened online; the sitemap is a development aid; the
    // full fonts are fetched (and then cached) only when a page shows a rare character.
    globIgnores: ['**/*.map', '_sitemap.html', '(auth)/**', 'sw.js', 'workbox-*.js', 'fonts/*.ttf'],
    swDest: path.join(dist, 'sw.js'),
    maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
    // Metro names bundles and assets by content hash: the browser's HTTP cache may answer them.
    dontCacheBustURLsMatching: /[.-][0-9a-f]{32}\./,
    // Pages are precached under their clean address (/calculator → calculator.html); dynamic
    // ones (/specs/12) fall back to the shell (no hydration) and the router renders them.
    navigateFallback: '/shell.html',
    navigateFallbackDenylist: [/^\/api\//, /^\/dev\//],
    cleanupOutdatedCaches: true,
    clientsClaim: true, // the first visit's page is served offline-ready at once
    skipWaiting: false, // the app asks before it swaps (the "update available" notice)
    sourcemap: false,
    runtimeCaching: [
      {
        urlPattern: ({ url }) => url.origin === self.location.origin && url.pathname.startsWith('/fonts/'),
        handler: 'CacheFirst',
        options: { cacheName: 'fonts-v1', expiration: { maxEntries: 8 } },
      },
      {
        urlPattern: isPublicLibraryRead,
        handler: 'NetworkFirst',
        options: {
          cacheName: 'library-api-v1',
          networkTimeoutSeconds: 4,
          expiration: { maxEntries: 400, maxAgeSeconds: 30 * 24 * 3600, purgeOnQuotaError: true },
          plugins: [onlyShareable],
        },
      },
    ],
  });
  for (const w of warnings) console.warn(`service worker: ${w}`);
  console.log(`service worker: ${count} files precached, ${(size / 1024).toFixed(0)} KB`);
}

function compressAll(dir) {
  let raw = 0;
  let br = 0;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const file = path.join(dir, entry.name);
    if (entry.isDirectory()) {
      const sub = compressAll(file);
      raw += sub.raw;
      br += sub.br;
    } else if (COMPRESS.test(entry.name)) {
      const data = fs.readFileSync(file);
      const b = zlib.brotliCompressSync(data, {
        params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length },
      });
      fs.writeFileSync(`${file}.br`, b);
      fs.writeFileSync(`${file}.gz`, zlib.gzipSync(data, { level: 9 }));
      raw += data.length;
      br += b.length;
    }
  }
  return { raw, br };
}

async function main() {
  if (!fs.existsSync(path.join(dist, 'index.html')))
    throw new Error(`${dist} has no index.html: run expo export first`);
  writeManifest();
  addToHeads(await writeWebFonts(dist));
  writeShells();
  await writeServiceWorker();
  const { raw, br } = compressAll(dist);
  console.log(`compressed: ${(raw / 1024).toFixed(0)} KB of text and fonts → ${(br / 1024).toFixed(0)} KB brotli`);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
