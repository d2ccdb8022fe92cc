/**
 * An in-memory, typo-tolerant index of the published specs, built for a million of them.
 * Each spec has a slot; each term (term-vocabulary.ts) a posting list of slots with the
 * field's weight, in growable typed arrays (postings.ts). A query word stands for a few
 * terms (exact, prefix, fuzzy); every word must match some field (make, model, years,
 * variant, component, parameter or a synonym of theirs). Words are taken cheapest first and
 * each later one only scores the slots every earlier one matched, so a year or a very
 * common word costs no more than the candidates left; when no spec matches every word, the
 * best partial matches are scored instead. The work is bounded: at most MAX_QUERY_WORDS
 * words and POSTING_BUDGET posting entries per query. Specs are added, replaced and removed
 * one at a time (a removed slot is skipped until the next full build), so an edit needs no
 * rebuild.
 *
 * A query is a generator that pauses every PAUSE_EVERY loop iterations: `searchAsync` runs
 * it in slices of at most SLICE_MS and gives the event loop a turn between them, so a query
 * over a million slots never holds up other requests for long. Queries take turns (they
 * share one set of working arrays), and changes wait for the query in flight
 * (`exclusive`), so a query sees the index as it was when it started.
 */
import { performance } from 'node:perf_hooks';
import { setImmediate as yieldToLoop } from 'node:timers/promises';
import { Mutex } from 'async-mutex';
import { SEARCH_MAX_WORDS } from '@/lib/contracts/library';
import { FIELD_WEIGHT, STOP_WORDS, cachedSynonymTokens, isNumber, tokenize, yearOf } from './search-tokens';
import { TermVocabulary, type TermMatch } from './term-vocabulary';
import { inChunks, Posting, Scratch, SlotTable } from './postings';

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
/** Posting entries one query may visit, over all its words and both passes. */
const POSTING_BUDGET = 2_500_000;
/** Of those, what the second pass (no spec matched every word) may visit: partial matches are a fallback. */
const REST_BUDGET = 1_000_000;
/** What checking one candidate's own terms costs, in posting entries walked (measured roughly). */
const FORWARD_COST = 24;
/** The longest a query runs before it gives the event loop a turn. */
const SLICE_MS = 8;
/** Candidates checked between two pause points (each walks its own terms, FORWARD_COST entries). */
const CANDIDATE_CHUNK = 1024;

type Step<T> = Generator<void, T>;

type Word = { year: number | null; terms: TermMatch[]; cost: number };

export class SearchIndex<D extends SearchDoc = SearchDoc> {
  private readonly vocabulary = new TermVocabulary();
  private readonly postings: Posting[] = [];
  private readonly table = new SlotTable<D>();
  private readonly scratch = new Scratch();
  /** Term ids of a field's text, per distinct text (a million specs share a few thousand names). */
  private readonly textTerms = new Map<string, Int32Array>();
  private readonly turn = new Mutex();

  private readonly sliceMs: number;

  /** `sliceMs`: how long a query runs before giving the event loop a turn (tests use 0). */
  constructor(docs: Iterable<D> = [], options: { sliceMs?: number } = {}) {
    this.sliceMs = options.sliceMs ?? SLICE_MS;
    for (const d of docs) this.upsert(d);
  }

  get size() {
    return this.table.live;
  }

  /** Share of slots held by removed or replaced specs (a full build reclaims them). */
  get wasted() {
    return this.table.wasted;
  }

  get termCount() {
    return this.vocabulary.size;
  }

  has(specId: number) {
    return this.table.has(specId);
  }

  private termsOf(text: string): Int32Array {
    let ids = this.textTerms.get(text);
    if (!ids) {
      if (this.textTerms.size > 300_000) this.textTerms.clear();
      ids = Int32Array.from(tokenize(text), (t) => this.vocabulary.intern(t));
      this.textTerms.set(text, ids);
    }
    return ids;
  }

  /** Adds the spec, or replaces the one with its id. */
  upsert(doc: D) {
    const slot = this.table.add(doc);
    const mark = this.scratch.marks(this.vocabulary.size + 64);
    const post = (ids: Int32Array, weight: number) => {
      for (const id of ids) {
        if (mark.slot[id] === slot + 1 && mark.weight[id] >= weight) continue;
        if (mark.slot[id] !== slot + 1) {
          mark.slot[id] = slot + 1;
          (this.postings[id] ??= new Posting()).push(slot, weight);
        } else this.postings[id].raise(slot, weight);
        mark.weight[id] = weight;
      }
    };
    for (const [ids, weight] of this.fieldsOf(doc)) post(ids, weight);
  }

  remove(specId: number) {
    this.table.remove(specId);
  }

  /** The terms a query word may stand for, best first, and how many posting entries they hold. */
  private lookUp(word: string): Word {
    const terms = new Map<number, number>();
    const exact = this.vocabulary.id(word);
    if (exact !== undefined) terms.set(exact, 1);
    // Two letters prefix too many words to say anything; two digits (a displacement) do not.
    if (word.length >= 3 || (word.length === 2 && isNumber(word)))
      for (const id of this.vocabulary.prefixed(word)) terms.set(id, 0.85);
    for (const { term, quality } of this.vocabulary.fuzzy(word)) {
      if ((terms.get(term) ?? 0) < quality) terms.set(term, quality);
    }
    const list = [...terms].map(([term, quality]) => ({ term, quality })).sort((a, b) => b.quality - a.quality);
    const year = yearOf(word);
    const cost = list.reduce((n, t) => n + (this.postings[t.term]?.length ?? 0), 0);
    return { year, terms: list, cost: year === null ? cost : this.table.slots.length };
  }

  /**
   * Adds word `k`'s best match per slot into the scores, for the slots `mode` names: `all`,
   * those that matched every earlier word (their hits are k); `rest`, those the first pass
   * did not judge on this word (their level is below k). Returns the entries visited.
   */
  private *scoreWord(w: Word, budget: number, mode: 'all' | 'rest', k: number): Step<number> {
    const s = this.scratch;
    const { alive, yearFrom, yearTo } = this.table;
    const { hits, level } = s;
    const only = mode === 'all' ? k : null;
    const eligible = (slot: number) => alive[slot] === 1 && (only === null ? level[slot] < k : hits[slot] === only);
    let visited = 0;
    const year = w.year;
    if (year !== null && only !== null && only > 0) {
      const { touched, hits } = s;
      yield* inChunks(s.count, (from, to) => {
        for (let i = from; i < to; i += 1) {
          const slot = touched[i];
          if (hits[slot] === only && yearFrom[slot] <= year && year <= yearTo[slot]) s.offer(slot, 1);
        }
      });
      visited += s.count;
    } else if (year !== null) {
      yield* inChunks(Math.min(alive.length, this.table.slots.length), (from, to) => {
        for (let slot = from; slot < to; slot += 1)
          if (eligible(slot) && yearFrom[slot] <= year && year <= yearTo[slot]) s.offer(slot, 1);
      });
      visited += this.table.slots.length;
    }
    if (only !== null && only > 0 && w.year === null && s.count * FORWARD_COST < w.cost)
      return visited + (yield* this.scoreCandidates(w, only));
    for (const { term, quality } of w.terms) {
      const p = this.postings[term];
      if (!p || visited >= budget) continue;
      const end = Math.min(p.length, budget - visited);
      visited += end;
      const { slots, weights } = p;
      const q = quality / 10;
      yield* inChunks(end, (from, to) => {
        if (only === null) {
          for (let i = from; i < to; i += 1)
            if (level[slots[i]] < k && alive[slots[i]] === 1) s.offer(slots[i], q * weights[i]);
        } else {
          for (let i = from; i < to; i += 1)
            if (hits[slots[i]] === only && alive[slots[i]] === 1) s.offer(slots[i], q * weights[i]);
        }
      });
    }
    yield* s.commitWord();
    return visited;
  }

  /** The spec's fields as term ids with their weights (the texts' ids are cached). */
  private fieldsOf(doc: D): [Int32Array, number][] {
    const synonyms = cachedSynonymTokens(doc.component, doc.parameter);
    return [
      [this.termsOf(doc.parameter), FIELD_WEIGHT.parameter],
      [this.termsOf(doc.component), FIELD_WEIGHT.component],
      [this.termsOf(doc.model), FIELD_WEIGHT.model],
      [this.termsOf(doc.make), FIELD_WEIGHT.make],
      [this.termsOf(doc.variant), FIELD_WEIGHT.variant],
      [this.termsOf(synonyms.join(' ')), FIELD_WEIGHT.synonym],
    ];
  }

  /**
   * A later word when few candidates are left: each candidate's own terms are checked
   * against the word's, instead of walking the word's (long) postings.
   */
  private *scoreCandidates(w: Word, only: number): Step<number> {
    const s = this.scratch;
    const quality = new Map(w.terms.map((t) => [t.term, t.quality]));
    const check = (from: number, to: number) => {
      for (let i = from; i < to; i += 1) {
        const slot = s.touched[i];
        const doc = this.table.slots[slot];
        if (s.hits[slot] !== only || doc === null) continue;
        let best = 0;
        for (const [ids, weight] of this.fieldsOf(doc)) {
          for (const id of ids) {
            const q = quality.get(id);
            if (q !== undefined && (q * weight) / 10 > best) best = (q * weight) / 10;
          }
        }
        if (best > 0) s.offer(slot, best);
      }
    };
    yield* inChunks(s.count, check, CANDIDATE_CHUNK);
    yield* s.commitWord();
    return s.count * FORWARD_COST;
  }

  /**
   * The first pass: each word only where the earlier ones all matched. `complete` when some
   * spec matched every word; otherwise it stops at the first word that no candidate left
   * matched, and each slot's hits say how many words, from the first, it matched.
   */
  private *matchAll(words: Word[], budget: number): Step<{ budget: number; complete: boolean }> {
    yield* this.scratch.reset();
    for (let k = 0; k < words.length; k += 1) {
      budget = Math.max(0, budget - (yield* this.scoreWord(words[k], budget, 'all', k)));
      if (this.scratch.committed === 0) return { budget, complete: false };
    }
    return { budget, complete: true };
  }

  /**
   * When no spec matches every word: the words the first pass did not judge for each slot
   * (all after the one it missed) are added, so each slot ends with every word it matches,
   * without walking the first word's postings again.
   */
  private *matchRest(words: Word[], budget: number): Step<void> {
    yield* this.scratch.keepLevels();
    for (let k = 1; k < words.length; k += 1)
      budget = Math.max(0, budget - (yield* this.scoreWord(words[k], budget, 'rest', k)));
  }

  /** One query, pausing (yielding) every so often; the result is the generator's return value. */
  private *query(query: string, limit: number): Step<{ matches: SearchMatch<D>[]; total: number }> {
    const unique = [...new Set(tokenize(query).filter((w) => !STOP_WORDS.has(w)))].slice(0, MAX_QUERY_WORDS);
    if (unique.length === 0) return { matches: [], total: 0 };
    const words: Word[] = [];
    for (const w of unique) {
      words.push(this.lookUp(w));
      yield;
    }
    words.sort((a, b) => a.cost - b.cost);
    this.scratch.fit(this.table.slots.length);
    const first = yield* this.matchAll(words, POSTING_BUDGET);
    let needed = words.length;
    if (!first.complete) {
      // No spec matches every word: show the ones that match the most.
      yield* this.matchRest(words, Math.min(first.budget, REST_BUDGET));
      needed = yield* this.scratch.mostHits();
    }
    return yield* this.scratch.top(needed, limit, words.length, this.table.slots);
  }

  /** Runs a query to the end at once (tests, scripts). Not while `searchAsync` or `exclusive` holds the index. */
  search(query: string, limit: number): { matches: SearchMatch<D>[]; total: number } {
    if (this.turn.isLocked())
      throw new Error('The search index is busy: use searchAsync while queries run concurrently.');
    const run = this.query(query, limit);
    for (;;) {
      const step = run.next();
      if (step.done) return step.value;
    }
  }

  /**
   * Runs a query in slices of at most SLICE_MS, giving the event loop a turn between them.
   * Queries take turns in arrival order (they share the working arrays).
   */
  searchAsync(query: string, limit: number): Promise<{ matches: SearchMatch<D>[]; total: number }> {
    return this.turn.runExclusive(async () => {
      const run = this.query(query, limit);
      let sliceStart = performance.now();
      for (;;) {
        const step = run.next();
        if (step.done) return step.value;
        if (performance.now() - sliceStart >= this.sliceMs) {
          await yieldToLoop();
          sliceStart = performance.now();
        }
      }
    });
  }

  /** Runs a change of the index between two queries: none is paused half-way while it runs. */
  exclusive<T>(change: () => Promise<T>): Promise<T> {
    return this.turn.runExclusive(change);
  }
}
