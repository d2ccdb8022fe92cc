/**
 * An in-memory, typo-tolerant index of the published specs. Each query word is
 * matched against the index's vocabulary (exactly, by prefix, or fuzzily through
 * fuse.js); every word must match some field of a spec (make, model, years,
 * variant, component, parameter or one of their synonyms). Matching the vocabulary
 * rather than every document keeps a query fast at 100 000 specs.
 */
import Fuse from 'fuse.js';
import { SYNONYM_GROUPS } from './synonyms';

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

export type SearchMatch = { doc: SearchDoc; score: number };

const STOP_WORDS = new Set(['the', 'of', 'for', 'and', 'a', 'an', 'to', 'on', 'at', 'in', 'spec', 'specs']);
const FIELD_WEIGHT = { parameter: 1.2, component: 1.1, model: 1.0, make: 0.9, variant: 0.8, synonym: 1.1 } as const;

export function tokenize(text: string): string[] {
  return text
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((t) => t.length > 0);
}

function synonymTokens(text: string): string[] {
  const lower = ` ${tokenize(text).join(' ')} `;
  return SYNONYM_GROUPS.filter((g) => g.some((p) => lower.includes(` ${tokenize(p).join(' ')} `)))
    .flat()
    .flatMap(tokenize);
}

export class SearchIndex {
  private readonly postings = new Map<string, Map<number, number>>();
  private readonly vocabulary: string[];
  private readonly fuse: Fuse<string>;

  constructor(readonly docs: SearchDoc[]) {
    docs.forEach((d, i) => {
      const add = (text: string, weight: number) => tokenize(text).forEach((t) => this.post(t, i, weight));
      add(d.parameter, FIELD_WEIGHT.parameter);
      add(d.component, FIELD_WEIGHT.component);
      add(d.model, FIELD_WEIGHT.model);
      add(d.make, FIELD_WEIGHT.make);
      add(d.variant, FIELD_WEIGHT.variant);
      synonymTokens(`${d.component} ${d.parameter}`).forEach((t) => this.post(t, i, FIELD_WEIGHT.synonym));
    });
    this.vocabulary = [...this.postings.keys()].filter((t) => !/^\d+$/.test(t));
    this.fuse = new Fuse(this.vocabulary, {
      includeScore: true,
      threshold: 0.4,
      ignoreLocation: true,
      minMatchCharLength: 2,
    });
  }

  private post(token: string, doc: number, weight: number) {
    let list = this.postings.get(token);
    if (!list) this.postings.set(token, (list = new Map()));
    if ((list.get(doc) ?? 0) < weight) list.set(doc, weight);
  }

  /** Vocabulary terms a query word may stand for, with a quality from 0 to 1. */
  private termsFor(word: string): [string, number][] {
    const terms = new Map<string, number>();
    if (this.postings.has(word)) terms.set(word, 1);
    if (word.length >= 2) {
      for (const t of this.postings.keys()) if (t !== word && t.startsWith(word)) terms.set(t, 0.85);
    }
    if (word.length >= 3 && !/^\d+$/.test(word)) {
      for (const r of this.fuse.search(word, { limit: 12 })) {
        const quality = 0.75 * (1 - (r.score ?? 1));
        if ((terms.get(r.item) ?? 0) < quality) terms.set(r.item, quality);
      }
    }
    return [...terms.entries()];
  }

  /** Per document, the best quality with which one query word matches it. */
  private wordMatches(word: string): Map<number, number> {
    const best = new Map<number, number>();
    for (const [term, quality] of this.termsFor(word)) {
      for (const [doc, weight] of this.postings.get(term)!) {
        const q = quality * weight;
        if ((best.get(doc) ?? 0) < q) best.set(doc, q);
      }
    }
    const year = Number(word);
    if (/^\d{4}$/.test(word) && year >= 1900 && year <= 2100) {
      this.docs.forEach((d, i) => {
        if (d.yearFrom <= year && year <= (d.yearTo ?? 9999) && (best.get(i) ?? 0) < 1) best.set(i, 1);
      });
    }
    return best;
  }

  search(query: string, limit: number): { matches: SearchMatch[]; total: number } {
    const words = tokenize(query).filter((w) => !STOP_WORDS.has(w));
    if (words.length === 0) return { matches: [], total: 0 };
    const perWord = words.map((w) => this.wordMatches(w));
    const totals = new Map<number, { score: number; hits: number }>();
    for (const matches of perWord) {
      for (const [doc, q] of matches) {
        const t = totals.get(doc) ?? { score: 0, hits: 0 };
        t.score += q;
        t.hits += 1;
        totals.set(doc, t);
      }
    }
    // Every word must match; when no spec matches them all, the best partial matches are shown.
    let most = 0;
    for (const t of totals.values()) if (t.hits > most) most = t.hits;
    const needed = Math.min(words.length, most);
    if (needed === 0) return { matches: [], total: 0 };
    // Keep only the best `limit` (a full sort of tens of thousands of hits is the slow part).
    const top: SearchMatch[] = [];
    let total = 0;
    const better = (a: SearchMatch, b: SearchMatch) => b.score - a.score || a.doc.specId - b.doc.specId;
    for (const [doc, t] of totals) {
      if (t.hits < needed) continue;
      total += 1;
      const match = { doc: this.docs[doc], score: t.score / words.length };
      if (top.length === limit && better(match, top[top.length - 1]) >= 0) continue;
      let i = top.length;
      while (i > 0 && better(match, top[i - 1]) < 0) i -= 1;
      top.splice(i, 0, match);
      if (top.length > limit) top.pop();
    }
    return { matches: top, total };
  }
}
