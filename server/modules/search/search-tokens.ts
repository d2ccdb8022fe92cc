/**
 * How text becomes index terms: lower-case letter/digit runs, the query's stop words, the
 * weight of each field, and the synonym terms a component + parameter brings with it
 * (lib/specs/synonyms.ts). Tokens of repeated texts are cached: a million specs hold only
 * a few thousand distinct component and parameter names.
 */
import { SYNONYM_GROUPS } from './synonyms';

export const STOP_WORDS = new Set(['the', 'of', 'for', 'and', 'a', 'an', 'to', 'on', 'at', 'in', 'spec', 'specs']);

/** Field weights, stored in postings as integers (weight × 10) to keep them one byte each. */
export const FIELD_WEIGHT = { parameter: 12, component: 11, model: 10, make: 9, variant: 8, synonym: 11 } as const;

export function tokenize(text: string): string[] {
  return text
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((t) => t.length > 0);
}

const GROUP_PHRASES = SYNONYM_GROUPS.map((g) => g.map((p) => ` ${tokenize(p).join(' ')} `));
const GROUP_TOKENS = SYNONYM_GROUPS.map((g) => [...new Set(g.flatMap(tokenize))]);

function synonymTokensOf(text: string): string[] {
  const padded = ` ${tokenize(text).join(' ')} `;
  return GROUP_PHRASES.flatMap((phrases, i) => (phrases.some((p) => padded.includes(p)) ? GROUP_TOKENS[i] : []));
}

/** A bounded memo: repeated names tokenise once; a stream of unique names cannot grow it forever. */
class Memo<T> {
  private readonly map = new Map<string, T>();
  constructor(
    private readonly compute: (key: string) => T,
    private readonly max = 200_000,
  ) {}
  get(key: string): T {
    let v = this.map.get(key);
    if (v === undefined) {
      if (this.map.size >= this.max) this.map.clear();
      this.map.set(key, (v = this.compute(key)));
    }
    return v;
  }
}

const tokenMemo = new Memo(tokenize);
const synonymMemo = new Memo(synonymTokensOf, 50_000);

export const cachedTokens = (text: string) => tokenMemo.get(text);
export const cachedSynonymTokens = (component: string, parameter: string) =>
  synonymMemo.get(`${component} ${parameter}`);

/** A year a query word may mean (1900–2100), or null. */
export function yearOf(word: string): number | null {
  if (!/^\d{4}$/.test(word)) return null;
  const year = Number(word);
  return year >= 1900 && year <= 2100 ? year : null;
}

export const isNumber = (word: string) => /^\d+$/.test(word);
