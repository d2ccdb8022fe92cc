/**
 * The web build's fonts (scripts/web-fonts.js, issue 11): each weight cut down to the app's
 * characters, renamed, valid, and a fraction of the full font's size.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { faces } from '@/lib/theme/fonts.json';

type WebFonts = { writeWebFonts: (dist: string) => Promise<string> };
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { writeWebFonts } = require('../../scripts/web-fonts') as WebFonts;
// eslint-disable-next-line @typescript-eslint/no-require-imports
const fontverter = require('fontverter') as { convert: (b: Buffer, to: string, from: string) => Promise<Buffer> };

function tables(ttf: Buffer) {
  const out = new Map<string, { offset: number; length: number }>();
  for (let i = 0; i < ttf.readUInt16BE(4); i += 1) {
    const o = 12 + i * 16;
    out.set(ttf.toString('latin1', o, o + 4), { offset: ttf.readUInt32BE(o + 8), length: ttf.readUInt32BE(o + 12) });
  }
  return out;
}

/** The name table's Windows (3, 1) strings by name ID (OpenType specification, 'name' table, format 0). */
function names(ttf: Buffer): Map<number, string[]> {
  const { offset } = tables(ttf).get('name')!;
  const storage = offset + ttf.readUInt16BE(offset + 4);
  const out = new Map<number, string[]>();
  for (let i = 0; i < ttf.readUInt16BE(offset + 2); i += 1) {
    const r = offset + 6 + i * 12;
    const [platform, , , id, length, at] = [0, 2, 4, 6, 8, 10].map((k) => ttf.readUInt16BE(r + k));
    const raw = Buffer.from(ttf.subarray(storage + at, storage + at + length));
    const text = platform === 3 ? raw.swap16().toString('utf16le') : raw.toString('latin1');
    out.set(id, [...(out.get(id) ?? []), text]);
  }
  return out;
}

/** Whole-font checksum: with a right checkSumAdjustment it is 0xB1B0AFBA (OpenType specification, 'head' table). */
function fontChecksum(ttf: Buffer) {
  const padded = Buffer.concat([ttf, Buffer.alloc((4 - (ttf.length % 4)) % 4)]);
  let sum = 0;
  for (let i = 0; i < padded.length; i += 4) sum = (sum + padded.readUInt32BE(i)) >>> 0;
  return sum;
}

let dist: string;
let markup: string;
beforeAll(async () => {
  dist = fs.mkdtempSync(path.join(os.tmpdir(), 'specbench-fonts-'));
  markup = await writeWebFonts(dist);
});
afterAll(() => fs.rmSync(dist, { recursive: true, force: true }));

it.each(faces)('cuts down and renames $family', async (face) => {
  const files = fs.readdirSync(path.join(dist, 'fonts'));
  const woff2 = files.find((f) => f.startsWith(`${face.webFile}.`) && f.endsWith('.woff2'))!;
  expect(woff2).toMatch(/\.[0-9a-f]{32}\.woff2$/);
  const data = fs.readFileSync(path.join(dist, 'fonts', woff2));
  const full = fs.readFileSync(require.resolve(face.file));
  expect(data.length).toBeLessThan(full.length / 8);

  const ttf = await fontverter.convert(data, 'truetype', 'woff2');
  const n = names(ttf);
  expect(n.get(1)).toEqual([face.webFamily]);
  expect(n.get(4)).toEqual([face.webFamily]);
  // The licence reserves the name "Source" for the unmodified font; its own notice stays.
  for (const id of [1, 3, 4, 6, 16, 17]) for (const s of n.get(id) ?? []) expect(s).not.toMatch(/source/i);
  expect((n.get(0) ?? []).join(' ')).toMatch(/Adobe/);
  expect(fontChecksum(ttf)).toBe(0xb1b0afba);
  // GPOS (kerning) and GSUB survive the renaming.
  expect([...tables(ttf).keys()]).toEqual(expect.arrayContaining(['GPOS', 'GSUB', 'cmap', 'glyf']));

  // Preloaded, and declared for the characters it has: units and limits included.
  expect(markup).toContain(`<link rel="preload" href="/fonts/${woff2}" as="font" type="font/woff2" crossorigin>`);
  const rule = markup.split('@font-face').find((r) => r.includes(`"${face.webFamily}"`))!;
  const range = rule.match(/unicode-range:([^}]+)/)![1];
  for (const ch of ['A', 'é', 'Ω', '°', '±', '≤', '≥', '−', '×', '→']) {
    const code = ch.codePointAt(0)!;
    const covered = range.split(',').some((part) => {
      const [lo, hi = lo] = part.replace('U+', '').split('-');
      return parseInt(lo, 16) <= code && code <= parseInt(hi, 16);
    });
    expect({ ch, covered }).toEqual({ ch, covered: true });
  }
  // The full font stays behind it under the family React Native uses.
  expect(markup).toMatch(
    new RegExp(`font-family:"${face.family}";src:url\\(/fonts/${face.family}\\.[0-9a-f]{32}\\.ttf\\)`),
  );
});
