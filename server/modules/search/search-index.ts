/**
 * An in-memory, typo-tolerant index of the published specs, built for a million of them.
 * Each spec has a slot; each term (term-vocabulary.ts) a posting list of slots with the
 * field's weight, in growable typed arrays. A query word stands for a few terms (exact,
 * prefix, fuzzy), whose postings add into dense per-slot scores; every word must match
 * some field (make, model, years, variant, component, parameter or a synonym of theirs).
 * The work per query is bounded: at most MAX_QUERY_WORDS words and POSTING_BUDGET posting
 * entries, best terms first. Specs are added, replaced and removed one at a time (a removed
 * slot is skipped until the next full build), so an edit needs no rebuild.
 */
import { SEARCH_MAX_WORDS } from '@/lib/contracts/library';
import { FIELD_WEIGHT, STOP_WORDS, cachedSynonymTokens, cachedTokens, tokenize, yearOf } from './search-tokens';
import { TermVocabulary, type TermMatch } from './term-vocabulary';

export { tokenize } from './search-tokens';

export type SearchDoc = {
  specId: number;
  modelId: number;
  make: string;
  model: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
  component: string;
  parameter: string;
};

export type SearchMatch<D extends SearchDoc = SearchDoc> = { doc: D; score: number };

/** Words of a query that are looked up; the API refuses longer queries (lib/contracts/library.ts). */
export const MAX_QUERY_WORDS = SEARCH_MAX_WORDS;
/** Posting entries one query may visit, over all its words. */
const POSTING_BUDGET = 3_000_000;

class Posting {
  slots = new Int32Array(4);
  weights = new Uint8Array(4);
  length = 0;
  push(slot: number, weight: number) {
    if (this.length === this.slots.length) {
      const slots = new Int32Array(this.length * 2);
      slots.set(this.slots);
      this.slots = slots;
      const weights = new Uint8Array(this.length * 2);
      weights.set(this.weights);
      this.weights = weights;
    }
    this.slots[this.length] = slot;
    this.weights[this.length] = weight;
    this.length += 1;
  }
}

/** Per-slot working arrays, reused by every query (search is synchronous, so one set suffices). */
class Scratch {
  score = new Float32Array(0);
  best = new Float32Array(0);
  hits = new Uint8Array(0);
  touched = new Int32Array(0);
  wordTouched = new Int32Array(0);
  fit(n: number) {
    if (this.score.length >= n) return;
    const size = Math.max(1024, Math.ceil(n * 1.25));
    this.score = new Float32Array(size);
    this.best = new Float32Array(size);
    this.hits = new Uint8Array(size);
    this.touched = new Int32Array(size);
    this.wordTouched = new Int32Array(size);
  }
}

export class SearchIndex<D extends SearchDoc = SearchDoc> {
  private readonly vocabulary = new TermVocabulary();
  private readonly postings: Posting[] = [];
  private readonly slots: (D | null)[] = [];
  private readonly slotOf = new Map<number, number>();
  private yearFrom = new Int16Array(1024);
  private yearTo = new Int16Array(1024);
  private readonly scratch = new Scratch();
  private removed = 0;

  constructor(docs: Iterable<D> = []) {
    for (const d of docs) this.upsert(d);
  }

  /** Published specs in the index. */
  get size() {
    return this.slotOf.size;
  }

  /** Share of slots held by removed or replaced specs (a full build reclaims them). */
  get wasted() {
    return this.slots.length === 0 ? 0 : this.removed / this.slots.length;
  }

  get termCount() {
    return this.vocabulary.size;
  }

  has(specId: number) {
    return this.slotOf.has(specId);
  }

  /** Adds the spec, or replaces the one with its id. */
  upsert(doc: D) {
    this.remove(doc.specId);
    const slot = this.slots.length;
    this.slots.push(doc);
    this.slotOf.set(doc.specId, slot);
    if (slot >= this.yearFrom.length) {
      const grow = (a: Int16Array) => {
        const b = new Int16Array(a.length * 2);
        b.set(a);
        return b;
      };
      this.yearFrom = grow(this.yearFrom);
      this.yearTo = grow(this.yearTo);
    }
    this.yearFrom[slot] = doc.yearFrom;
    this.yearTo[slot] = doc.yearTo ?? 9999;
    const weights = new Map<number, number>();
    const add = (tokens: string[], weight: number) => {
      for (const t of tokens) {
        const id = this.vocabulary.intern(t);
        if ((weights.get(id) ?? 0) < weight) weights.set(id, weight);
      }
    };
    add(cachedTokens(doc.parameter), FIELD_WEIGHT.parameter);
    add(cachedTokens(doc.component), FIELD_WEIGHT.component);
    add(cachedTokens(doc.model), FIELD_WEIGHT.model);
    add(cachedTokens(doc.make), FIELD_WEIGHT.make);
    add(cachedTokens(doc.variant), FIELD_WEIGHT.variant);
    add(cachedSynonymTokens(doc.component, doc.parameter), FIELD_WEIGHT.synonym);
    for (const [id, weight] of weights) (this.postings[id] ??= new Posting()).push(slot, weight);
  }

  remove(specId: number) {
    const slot = this.slotOf.get(specId);
    if (slot === undefined) return;
    this.slots[slot] = null;
    this.slotOf.delete(specId);
    this.removed += 1;
  }

  /** The terms a query word may stand for, best first. */
  private termsFor(word: string): TermMatch[] {
    const terms = new Map<number, number>();
    const exact = this.vocabulary.id(word);
    if (exact !== undefined) terms.set(exact, 1);
    if (word.length >= 2) for (const id of this.vocabulary.prefixed(word)) terms.set(id, 0.85);
    for (const { term, quality } of this.vocabulary.fuzzy(word)) {
      if ((terms.get(term) ?? 0) < quality) terms.set(term, quality);
    }
    return [...terms].map(([term, quality]) => ({ term, quality })).sort((a, b) => b.quality - a.quality);
  }

  /** Adds one word's best match per slot into the scores; returns the posting entries it visited. */
  private scoreWord(word: string, budget: number, touchedCount: number): { visited: number; touched: number } {
    const { best, score, hits, touched, wordTouched } = this.scratch;
    let n = 0;
    let visited = 0;
    const offer = (slot: number, q: number) => {
      if (q > best[slot]) {
        if (best[slot] === 0) wordTouched[n++] = slot;
        best[slot] = q;
      }
    };
    for (const { term, quality } of this.termsFor(word)) {
      const p = this.postings[term];
      if (!p || visited >= budget) continue;
      const end = Math.min(p.length, budget - visited);
      visited += end;
      for (let i = 0; i < end; i += 1) {
        const slot = p.slots[i];
        if (this.slots[slot] !== null) offer(slot, (quality * p.weights[i]) / 10);
      }
    }
    const year = yearOf(word);
    if (year !== null) {
      visited += this.slots.length;
      for (let slot = 0; slot < this.slots.length; slot += 1) {
        if (this.slots[slot] !== null && this.yearFrom[slot] <= year && year <= this.yearTo[slot]) offer(slot, 1);
      }
    }
    for (let i = 0; i < n; i += 1) {
      const slot = wordTouched[i];
      if (hits[slot] === 0) touched[touchedCount++] = slot;
      score[slot] += best[slot];
      hits[slot] += 1;
      best[slot] = 0;
    }
    return { visited, touched: touchedCount };
  }

  search(query: string, limit: number): { matches: SearchMatch<D>[]; total: number } {
    const words = [...new Set(tokenize(query).filter((w) => !STOP_WORDS.has(w)))].slice(0, MAX_QUERY_WORDS);
    if (words.length === 0) return { matches: [], total: 0 };
    this.scratch.fit(this.slots.length);
    const { score, hits, touched } = this.scratch;
    let budget = POSTING_BUDGET;
    let count = 0;
    for (const word of words) {
      const r = this.scoreWord(word, budget, count);
      budget = Math.max(0, budget - r.visited);
      count = r.touched;
    }
    // Every word must match; when no spec matches them all, the best partial matches are shown.
    let most = 0;
    for (let i = 0; i < count; i += 1) most = Math.max(most, hits[touched[i]]);
    const needed = Math.min(words.length, most);
    const top: SearchMatch<D>[] = [];
    let total = 0;
    const better = (a: SearchMatch<D>, b: SearchMatch<D>) => b.score - a.score || a.doc.specId - b.doc.specId;
    for (let i = 0; i < count; i += 1) {
      const slot = touched[i];
      const enough = needed > 0 && hits[slot] >= needed;
      const s = score[slot];
      score[slot] = 0;
      hits[slot] = 0;
      if (!enough) continue;
      total += 1;
      const match = { doc: this.slots[slot]!, score: s / words.length };
      if (top.length === limit && better(match, top[top.length - 1]) >= 0) continue;
      let j = top.length;
      while (j > 0 && better(match, top[j - 1]) < 0) j -= 1;
      top.splice(j, 0, match);
      if (top.length > limit) top.pop();
    }
    return { matches: top, total };
  }
}
