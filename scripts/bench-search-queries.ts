/**
 * The search benchmark's fixed query mix, drawn with a seeded generator from the invented
 * library (bench-library.ts): typo queries (make, model, parameter, each long word with one
 * slip: a letter dropped, doubled, swapped or replaced), trade synonyms (lib/specs/synonyms.ts),
 * model years, and short queries of one to six words. Typo queries name the spec they
 * mean, for recall. Plus the adversarial set of issue 14.
 */
import { SYNONYM_GROUPS } from '@/lib/specs/synonyms';
import { docAt, type BenchSpec } from './bench-library';

export type BenchQuery = { q: string; kind: 'typo' | 'synonym' | 'year' | 'short'; target: string | null };

/** mulberry32: a small seeded generator, so every run draws the same mix. */
function random(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const words = (s: string) =>
  s
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((w) => w.length > 0);
export const targetKey = (d: Pick<BenchSpec, 'make' | 'name' | 'parameter'>) => `${d.make}|${d.name}|${d.parameter}`;

function typo(word: string, rnd: () => number): string {
  if (word.length < 5 || /\d/.test(word)) return word;
  const i = 1 + Math.floor(rnd() * (word.length - 2));
  switch (Math.floor(rnd() * 4)) {
    case 0:
      return word.slice(0, i) + word.slice(i + 1);
    case 1:
      return word.slice(0, i) + word[i] + word.slice(i);
    case 2:
      return word.slice(0, i) + word[i + 1] + word[i] + word.slice(i + 2);
    default:
      return word.slice(0, i) + 'eaiour'[Math.floor(rnd() * 6)] + word.slice(i + 1);
  }
}

const pick = <T>(list: T[], rnd: () => number) => list[Math.floor(rnd() * list.length)];

function synonymQuery(d: BenchSpec, rnd: () => number): string | null {
  const text = ` ${words(`${d.component} ${d.parameter}`).join(' ')} `;
  const group = SYNONYM_GROUPS.find((g) => g.some((p) => text.includes(` ${words(p).join(' ')} `)));
  if (!group) return null;
  return `${pick(group, rnd)} ${words(d.name)[0]}`;
}

export function makeQueries(n: number, maxSpec: number, seed = 14): BenchQuery[] {
  const rnd = random(seed);
  const out: BenchQuery[] = [];
  while (out.length < n) {
    const d = docAt(1 + Math.floor(rnd() * maxSpec));
    const model = words(d.name);
    const r = rnd();
    if (r < 0.4) {
      const param = words(d.parameter).filter((w) => w.length > 3);
      const q = [words(d.make)[0], ...model.slice(0, 2), ...param.slice(0, 2)].map((w) =>
        rnd() < 0.7 ? typo(w, rnd) : w,
      );
      out.push({ q: q.slice(0, 6).join(' '), kind: 'typo', target: targetKey(d) });
    } else if (r < 0.55) {
      const q = synonymQuery(d, rnd);
      if (q) out.push({ q, kind: 'synonym', target: null });
    } else if (r < 0.7) {
      const year = d.yearFrom + Math.floor(rnd() * (1 + (d.yearTo ?? d.yearFrom + 3) - d.yearFrom));
      out.push({ q: `${model[0]} ${model[1]} ${year} ${words(d.component)[0]}`, kind: 'year', target: null });
    } else {
      const all = [...words(d.make), ...model, ...words(d.component), ...words(d.parameter)];
      const count = 1 + Math.floor(rnd() * 6);
      const start = Math.floor(rnd() * Math.max(1, all.length - count));
      out.push({ q: all.slice(start, start + count).join(' '), kind: 'short', target: null });
    }
  }
  return out;
}

/** Issue 14's adversarial queries: long, many one-letter words, stop words only, very common words. */
export const ADVERSARIAL: [string, string][] = [
  ['200 characters', 'resistance '.repeat(18) + 'voltage'],
  [
    '200 characters of mixed words',
    'ignition coil primary secondary winding resistance voltage gap sensor '.repeat(3).slice(0, 200),
  ],
  ['30 one-letter words', 'a b c d e f g h i j k l m n o p q r s t u v w x y z a b c d'],
  ['only stop words', 'the of for and a an to on at in spec specs'],
  ['very common words', 'resistance voltage coil sensor supply'],
  ['12 two-letter prefixes', 're co pr se vo su in ou mo st ba sp'],
  ['12 years', '1990 1995 2000 2005 2010 2015 2020 1988 1999 2003 2011 2019'],
  ['12 fuzzy words', 'resistanse voltege primery secundary windng sensr suply currant coill ignitoin stater batery'],
];
