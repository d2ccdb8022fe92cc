/**
 * The index's distinct terms, and the bounded ways a query word finds them: exactly, by
 * prefix (binary search in the sorted terms, at most PREFIX_LIMIT), or fuzzily. The fuzzy
 * step never scores the whole vocabulary: character bigrams pick at most FUZZY_CANDIDATES
 * terms of a similar length that share enough bigrams with the word, and fuse.js scores
 * only those. The work per word is therefore bounded whatever the library's size.
 */
import Fuse from 'fuse.js';
import { isNumber } from './search-tokens';

const PREFIX_LIMIT = 40;
const FUZZY_CANDIDATES = 48;
/** A bigram shared by more terms than this says little and costs much: it is skipped. */
const COMMON_BIGRAM = 4000;
const FUSE_OPTIONS = { includeScore: true, threshold: 0.4, ignoreLocation: true, minMatchCharLength: 2 };

export type TermMatch = { term: number; quality: number };

const bigramsOf = (word: string) => {
  const padded = `^${word}$`;
  const out = new Set<string>();
  for (let i = 0; i < padded.length - 1; i += 1) out.add(padded.slice(i, i + 2));
  return [...out];
};

export class TermVocabulary {
  readonly terms: string[] = [];
  private readonly ids = new Map<string, number>();
  /** Term ids in the terms' order, for prefix look-ups; `unsorted` are the ids added since. */
  private readonly sorted: number[] = [];
  private unsorted: number[] = [];
  private readonly bigrams = new Map<string, number[]>();

  id(term: string): number | undefined {
    return this.ids.get(term);
  }

  /** The term's id, adding it when new. */
  intern(term: string): number {
    let id = this.ids.get(term);
    if (id !== undefined) return id;
    id = this.terms.length;
    this.terms.push(term);
    this.ids.set(term, id);
    this.unsorted.push(id);
    if (term.length >= 3 && !isNumber(term)) {
      for (const g of bigramsOf(term)) {
        const list = this.bigrams.get(g);
        if (list) list.push(id);
        else this.bigrams.set(g, [id]);
      }
    }
    return id;
  }

  get size() {
    return this.terms.length;
  }

  /** First position in `sorted` whose term is not before `word`. */
  private lowerBound(word: string) {
    const t = this.terms;
    let lo = 0;
    let hi = this.sorted.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (t[this.sorted[mid]] < word) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }

  /** Sorts the terms added since the last look-up in: one by one after an edit, all at once after a build. */
  private ensureSorted() {
    if (this.unsorted.length === 0) return;
    const t = this.terms;
    if (this.unsorted.length <= 256) {
      for (const id of this.unsorted) this.sorted.splice(this.lowerBound(t[id]), 0, id);
    } else {
      for (const id of this.unsorted) this.sorted.push(id);
      this.sorted.sort((a, b) => (t[a] < t[b] ? -1 : t[a] > t[b] ? 1 : 0));
    }
    this.unsorted = [];
  }

  /** Terms that start with `word` (not `word` itself), at most PREFIX_LIMIT, shortest names first in order. */
  prefixed(word: string): number[] {
    this.ensureSorted();
    const t = this.terms;
    const lo = this.lowerBound(word);
    const out: number[] = [];
    for (let i = lo; i < this.sorted.length && out.length < PREFIX_LIMIT; i += 1) {
      const term = t[this.sorted[i]];
      if (!term.startsWith(word)) break;
      if (term !== word) out.push(this.sorted[i]);
    }
    return out;
  }

  /** Up to FUZZY_CANDIDATES terms sharing the most bigrams with `word`, of a length within 2. */
  private candidates(word: string): number[] {
    const grams = bigramsOf(word);
    const shared = new Map<number, number>();
    for (const g of grams) {
      const list = this.bigrams.get(g);
      if (!list || list.length > COMMON_BIGRAM) continue;
      for (const id of list) shared.set(id, (shared.get(id) ?? 0) + 1);
    }
    const needed = Math.max(2, Math.ceil(grams.length * 0.35));
    const found: [number, number][] = [];
    for (const [id, n] of shared) {
      if (n >= needed && Math.abs(this.terms[id].length - word.length) <= 2) found.push([id, n]);
    }
    found.sort((a, b) => b[1] - a[1] || a[0] - b[0]);
    return found.slice(0, FUZZY_CANDIDATES).map(([id]) => id);
  }

  /** Fuzzy matches of a word of three or more letters, scored by fuse.js on the candidates only. */
  fuzzy(word: string): TermMatch[] {
    if (word.length < 3 || isNumber(word)) return [];
    const ids = this.candidates(word);
    if (ids.length === 0) return [];
    const fuse = new Fuse(
      ids.map((id) => this.terms[id]),
      FUSE_OPTIONS,
    );
    return fuse
      .search(word, { limit: 12 })
      .map((r) => ({ term: ids[r.refIndex], quality: 0.75 * (1 - (r.score ?? 1)) }));
  }
}
