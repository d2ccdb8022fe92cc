/**
 * The web build's fonts (scripts/build-web.js). Each weight in lib/theme/fonts.json is cut
 * down with harfbuzz (subset-font) to the characters the app's own text uses: Latin-1, the
 * usual punctuation, the signs of units and limits (Ω µ ° ± ≤ ≥ − × →) and every other
 * character found in app/, components/, lib/ and data/. The cut-down font is renamed (the
 * typeface's licence, the SIL OFL, reserves its name for the unmodified font) and written
 * as WOFF2 under a content-hashed name, preloaded by every page. The full font stays as a
 * second face, fetched by the browser only for a character the first one lacks (a name in
 * another script, say).
 */
const { Buffer } = require('node:buffer');
const crypto = require('node:crypto');
const fs = require('node:fs');
const path = require('node:path');
const subsetFont = require('subset-font');
const fontverter = require('fontverter');

const ROOT = path.resolve(__dirname, '..');
const { faces } = require('../lib/theme/fonts.json');

/** Characters every page may show whatever the sources say: printable ASCII, Latin-1, typographic punctuation. */
const BASE_RANGES = [
  [0x20, 0x7e],
  [0xa0, 0xff],
  [0x2010, 0x2027],
  [0x2030, 0x203a],
];
const SOURCE_DIRS = ['app', 'components', 'lib', 'data'];
const SOURCE_FILE = /\.(tsx?|json|csv)$/;

function sourceCharacters() {
  const chars = new Set();
  for (const [from, to] of BASE_RANGES) for (let c = from; c <= to; c += 1) chars.add(c);
  const walk = (dir) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      const f = path.join(dir, e.name);
      if (e.isDirectory()) walk(f);
      else if (SOURCE_FILE.test(e.name)) for (const ch of fs.readFileSync(f, 'utf8')) chars.add(ch.codePointAt(0));
    }
  };
  for (const d of SOURCE_DIRS) if (fs.existsSync(path.join(ROOT, d))) walk(path.join(ROOT, d));
  // Controls and the private use area are never drawn.
  return [...chars].filter((c) => c >= 0x20 && !(c >= 0xe000 && c <= 0xf8ff)).sort((a, b) => a - b);
}

/** The code points a TrueType font maps (its cmap: formats 4 and 12). */
function mappedCodePoints(ttf) {
  const tables = tableDirectory(ttf);
  const cmap = tables.get('cmap');
  const out = new Set();
  const count = ttf.readUInt16BE(cmap.offset + 2);
  for (let i = 0; i < count; i += 1) {
    const sub = cmap.offset + ttf.readUInt32BE(cmap.offset + 4 + i * 8 + 4);
    const format = ttf.readUInt16BE(sub);
    if (format === 4) {
      const segs = ttf.readUInt16BE(sub + 6) / 2;
      for (let s = 0; s < segs; s += 1) {
        const end = ttf.readUInt16BE(sub + 14 + s * 2);
        const start = ttf.readUInt16BE(sub + 16 + segs * 2 + s * 2);
        for (let c = start; c <= end && c !== 0xffff; c += 1) out.add(c);
      }
    } else if (format === 12) {
      const groups = ttf.readUInt32BE(sub + 12);
      for (let g = 0; g < groups; g += 1) {
        const start = ttf.readUInt32BE(sub + 16 + g * 12);
        const end = ttf.readUInt32BE(sub + 20 + g * 12);
        for (let c = start; c <= end; c += 1) out.add(c);
      }
    }
  }
  return [...out].sort((a, b) => a - b);
}

/** A CSS unicode-range for sorted code points, runs merged. */
function unicodeRange(codes) {
  const parts = [];
  for (let i = 0; i < codes.length;) {
    let j = i;
    while (j + 1 < codes.length && codes[j + 1] === codes[j] + 1) j += 1;
    const hex = (c) => c.toString(16).toUpperCase();
    parts.push(i === j ? `U+${hex(codes[i])}` : `U+${hex(codes[i])}-${hex(codes[j])}`);
    i = j + 1;
  }
  return parts.join(',');
}

function tableDirectory(ttf) {
  const tables = new Map();
  const n = ttf.readUInt16BE(4);
  for (let i = 0; i < n; i += 1) {
    const o = 12 + i * 16;
    tables.set(ttf.toString('latin1', o, o + 4), { offset: ttf.readUInt32BE(o + 8), length: ttf.readUInt32BE(o + 12) });
  }
  return tables;
}

function checksum(buf) {
  let sum = 0;
  const padded = Buffer.concat([buf, Buffer.alloc((4 - (buf.length % 4)) % 4)]);
  for (let i = 0; i < padded.length; i += 4) sum = (sum + padded.readUInt32BE(i)) >>> 0;
  return sum;
}

/**
 * The font with its family names replaced (name IDs 1, 3, 4, 6 in Windows records; the
 * typographic names 16 and 17 and any Macintosh records of those IDs dropped), the table
 * directory and checksums rewritten. No npm package edits the name table while keeping
 * every other table as it is, so this is done here, by the OpenType specification's layout.
 */
function renamed(ttf, family) {
  const tables = tableDirectory(ttf);
  const name = tables.get('name');
  const base = name.offset;
  const count = ttf.readUInt16BE(base + 2);
  const storage = base + ttf.readUInt16BE(base + 4);
  const RENAMED = new Set([1, 3, 4, 6, 16, 17, 21, 22, 25]);
  const records = [];
  for (let i = 0; i < count; i += 1) {
    const r = base + 6 + i * 12;
    const [platform, encoding, language, id, length, offset] = [0, 2, 4, 6, 8, 10].map((k) => ttf.readUInt16BE(r + k));
    if (RENAMED.has(id)) continue;
    records.push({ platform, encoding, language, id, data: ttf.subarray(storage + offset, storage + offset + length) });
  }
  const postScript = family.replace(/[^A-Za-z0-9]/g, '');
  const utf16be = (s) => Buffer.from(s, 'utf16le').swap16();
  for (const [id, text] of [
    [1, family],
    [3, `${postScript}-Regular`],
    [4, family],
    [6, `${postScript}-Regular`],
  ])
    records.push({ platform: 3, encoding: 1, language: 0x409, id, data: utf16be(text) });
  records.sort((a, b) => a.platform - b.platform || a.encoding - b.encoding || a.language - b.language || a.id - b.id);
  const head = Buffer.alloc(6 + records.length * 12);
  head.writeUInt16BE(0, 0);
  head.writeUInt16BE(records.length, 2);
  head.writeUInt16BE(head.length, 4);
  let at = 0;
  records.forEach((r, i) => {
    [r.platform, r.encoding, r.language, r.id, r.data.length, at].forEach((v, k) =>
      head.writeUInt16BE(v, 6 + i * 12 + k * 2),
    );
    at += r.data.length;
  });
  const newName = Buffer.concat([head, ...records.map((r) => r.data)]);

  const tags = [...tables.keys()].sort();
  const bodies = new Map(
    tags.map((t) => [
      t,
      t === 'name' ? newName : ttf.subarray(tables.get(t).offset, tables.get(t).offset + tables.get(t).length),
    ]),
  );
  const headTable = Buffer.from(bodies.get('head'));
  headTable.writeUInt32BE(0, 8); // checkSumAdjustment, set below
  bodies.set('head', headTable);
  const dirSize = 12 + tags.length * 16;
  const out = [Buffer.from(ttf.subarray(0, 12))];
  const dir = Buffer.alloc(tags.length * 16);
  let offset = dirSize;
  tags.forEach((t, i) => {
    const body = bodies.get(t);
    dir.write(t, i * 16, 'latin1');
    dir.writeUInt32BE(checksum(body), i * 16 + 4);
    dir.writeUInt32BE(offset, i * 16 + 8);
    dir.writeUInt32BE(body.length, i * 16 + 12);
    offset += body.length + ((4 - (body.length % 4)) % 4);
  });
  out.push(dir);
  for (const t of tags) {
    const body = bodies.get(t);
    out.push(body, Buffer.alloc((4 - (body.length % 4)) % 4));
  }
  const font = Buffer.concat(out);
  const headAt = 12 + tags.indexOf('head') * 16;
  font.writeUInt32BE((0xb1b0afba - checksum(font)) >>> 0, font.readUInt32BE(headAt + 8) + 8);
  return font;
}

const hashed = (data) => crypto.createHash('md5').update(data).digest('hex');

/**
 * Writes dist/fonts/ and returns the markup every page's <head> gets: a preload of each
 * cut-down font and the @font-face rules (cut-down first; the full font for the rest).
 */
async function writeWebFonts(dist) {
  const wanted = String.fromCodePoint(...sourceCharacters());
  fs.mkdirSync(path.join(dist, 'fonts'), { recursive: true });
  const links = [];
  const rules = [];
  const report = [];
  for (const face of faces) {
    const full = fs.readFileSync(require.resolve(face.file));
    // The licence's own records (copyright, licence text and address) stay in the font.
    const cut = await subsetFont(full, wanted, { targetFormat: 'truetype', preserveNameIds: [0, 13, 14] });
    const woff2 = await fontverter.convert(renamed(cut, face.webFamily), 'woff2', 'truetype');
    const small = `/fonts/${face.webFile}.${hashed(woff2)}.woff2`;
    const large = `/fonts/${path.basename(face.file, '.ttf')}.${hashed(full)}.ttf`;
    fs.writeFileSync(path.join(dist, small), woff2);
    fs.writeFileSync(path.join(dist, large), full);
    links.push(`<link rel="preload" href="${small}" as="font" type="font/woff2" crossorigin>`);
    rules.push(
      `@font-face{font-family:"${face.webFamily}";src:url(${small}) format("woff2");font-weight:${face.weight};font-display:swap;unicode-range:${unicodeRange(mappedCodePoints(cut))}}`,
      `@font-face{font-family:"${face.family}";src:url(${large}) format("truetype");font-weight:${face.weight};font-display:swap}`,
    );
    report.push(
      `${face.webFamily} ${(woff2.length / 1024).toFixed(0)} KB (full font ${(full.length / 1024).toFixed(0)} KB)`,
    );
  }
  console.log(`fonts: ${report.join(', ')}`);
  return `${links.join('')}<style id="specbench-fonts">${rules.join('')}</style>`;
}

module.exports = { writeWebFonts, renamed, mappedCodePoints, unicodeRange, tableDirectory };
