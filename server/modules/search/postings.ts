/**
 * The search index's storage (search-index.ts): posting lists and the slot table in
 * growable typed arrays, and the per-query working arrays. Typed arrays keep a million
 * specs' postings compact (5 bytes an entry) and their loops fast. The working arrays'
 * loops are generators that pause every PAUSE_EVERY iterations, so a query over a million
 * slots can give the event loop a turn (SearchIndex.searchAsync).
 */
/** Loop iterations between two points where a query may pause. */
export const PAUSE_EVERY = 16_384;

/**
 * Runs `work` over [0, n) in chunks of `chunk`, pausing (yielding) between two chunks; stops
 * early, returning true, when `work` returns true. The hot loops stay in plain functions
 * (`work`), which V8 optimises better than loops inside a generator.
 */
export function* inChunks(
  n: number,
  work: (from: number, to: number) => boolean | void,
  chunk = PAUSE_EVERY,
): Generator<void, boolean> {
  for (let from = 0; from < n; from += chunk) {
    if (work(from, Math.min(n, from + chunk)) === true) return true;
    if (from + chunk < n) yield;
  }
  return false;
}

function grown<T extends Int32Array | Uint8Array | Int16Array | Float32Array>(a: T, size: number): T {
  const b = new (a.constructor as new (n: number) => T)(size);
  b.set(a);
  return b;
}

export class Posting {
  slots = new Int32Array(4);
  weights = new Uint8Array(4);
  length = 0;
  push(slot: number, weight: number) {
    if (this.length === this.slots.length) {
      this.slots = grown(this.slots, this.length * 2);
      this.weights = grown(this.weights, this.length * 2);
    }
    this.slots[this.length] = slot;
    this.weights[this.length] = weight;
    this.length += 1;
  }
  /** The slot was just pushed with a lower weight (the same term in a weightier field). */
  raise(slot: number, weight: number) {
    if (this.slots[this.length - 1] === slot) this.weights[this.length - 1] = weight;
  }
}

/** Slot → spec, live flags and years; spec id → slot. */
export class SlotTable<D extends { specId: number; yearFrom: number; yearTo: number | null }> {
  readonly slots: (D | null)[] = [];
  alive = new Uint8Array(1024);
  yearFrom = new Int16Array(1024);
  yearTo = new Int16Array(1024);
  private readonly slotOf = new Map<number, number>();
  private removed = 0;

  get live() {
    return this.slotOf.size;
  }
  get wasted() {
    return this.slots.length === 0 ? 0 : this.removed / this.slots.length;
  }
  has(specId: number) {
    return this.slotOf.has(specId);
  }

  /** A new slot for the spec (the old one, if any, is removed). */
  add(doc: D): number {
    this.remove(doc.specId);
    const slot = this.slots.length;
    if (slot >= this.alive.length) {
      const size = this.alive.length * 2;
      this.alive = grown(this.alive, size);
      this.yearFrom = grown(this.yearFrom, size);
      this.yearTo = grown(this.yearTo, size);
    }
    this.slots.push(doc);
    this.slotOf.set(doc.specId, slot);
    this.alive[slot] = 1;
    this.yearFrom[slot] = doc.yearFrom;
    this.yearTo[slot] = doc.yearTo ?? 9999;
    return slot;
  }

  remove(specId: number) {
    const slot = this.slotOf.get(specId);
    if (slot === undefined) return;
    this.slots[slot] = null;
    this.alive[slot] = 0;
    this.slotOf.delete(specId);
    this.removed += 1;
  }
}

/** Per-slot working arrays, reused by every query (the index runs one query at a time). */
export class Scratch {
  score = new Float32Array(0);
  best = new Float32Array(0);
  hits = new Uint8Array(0);
  /** Hits as the first pass left them (search-index.ts matchRest). */
  level = new Uint8Array(0);
  touched = new Int32Array(0);
  count = 0;
  /** Slots the last committed word matched. */
  committed = 0;
  private wordTouched = new Int32Array(0);
  private wordCount = 0;
  private markSlot = new Int32Array(0);
  private markWeight = new Uint8Array(0);

  fit(n: number) {
    if (this.score.length >= n) return;
    const size = Math.max(1024, Math.ceil(n * 1.25));
    this.score = new Float32Array(size);
    this.best = new Float32Array(size);
    this.hits = new Uint8Array(size);
    this.level = new Uint8Array(size);
    this.touched = new Int32Array(size);
    this.wordTouched = new Int32Array(size);
  }

  /** Per-term marks used while one spec is added (which terms it already posted, at what weight). */
  marks(terms: number) {
    if (this.markSlot.length < terms) {
      this.markSlot = grown(this.markSlot, terms * 2);
      this.markWeight = grown(this.markWeight, terms * 2);
    }
    return { slot: this.markSlot, weight: this.markWeight };
  }

  *reset(): Generator<void, void> {
    const { touched, score, hits, level } = this;
    yield* inChunks(this.count, (from, to) => {
      for (let i = from; i < to; i += 1) {
        score[touched[i]] = 0;
        hits[touched[i]] = 0;
        level[touched[i]] = 0;
      }
    });
    this.count = 0;
  }

  /** Copies each touched slot's hits into its level. */
  *keepLevels(): Generator<void, void> {
    const { touched, hits, level } = this;
    yield* inChunks(this.count, (from, to) => {
      for (let i = from; i < to; i += 1) level[touched[i]] = hits[touched[i]];
    });
  }

  offer(slot: number, q: number) {
    if (q > this.best[slot]) {
      if (this.best[slot] === 0) this.wordTouched[this.wordCount++] = slot;
      this.best[slot] = q;
    }
  }

  /** Adds the word's best match per slot into the scores. */
  *commitWord(): Generator<void, void> {
    const { wordTouched, touched, score, best, hits } = this;
    yield* inChunks(this.wordCount, (from, to) => {
      let count = this.count;
      for (let i = from; i < to; i += 1) {
        const slot = wordTouched[i];
        if (hits[slot] === 0) touched[count++] = slot;
        score[slot] += best[slot];
        hits[slot] += 1;
        best[slot] = 0;
      }
      this.count = count;
    });
    this.committed = this.wordCount;
    this.wordCount = 0;
  }

  *mostHits(): Generator<void, number> {
    const { touched, hits } = this;
    let most = 0;
    yield* inChunks(this.count, (from, to) => {
      for (let i = from; i < to; i += 1) if (hits[touched[i]] > most) most = hits[touched[i]];
    });
    return most;
  }

  /** The best `limit` slots with at least `needed` hits, and how many there are; clears the scores. */
  *top<D extends { specId: number }>(
    needed: number,
    limit: number,
    words: number,
    slots: (D | null)[],
  ): Generator<void, { matches: { doc: D; score: number }[]; total: number }> {
    const top: { doc: D; score: number }[] = [];
    let total = 0;
    // Compared as plain numbers first: most matches never enter the top and allocate nothing.
    let floorScore = -1;
    let floorId = 0;
    const { touched, hits } = this;
    yield* inChunks(this.count, (from, to) => {
      for (let i = from; i < to; i += 1) {
        const slot = touched[i];
        const doc = slots[slot];
        if (needed === 0 || hits[slot] < needed || doc === null) continue;
        total += 1;
        const score = this.score[slot] / words;
        if (top.length === limit && (score < floorScore || (score === floorScore && doc.specId > floorId))) continue;
        let j = top.length;
        while (
          j > 0 &&
          (top[j - 1].score < score || (top[j - 1].score === score && top[j - 1].doc.specId > doc.specId))
        )
          j -= 1;
        top.splice(j, 0, { doc, score });
        if (top.length > limit) top.pop();
        if (top.length === limit) {
          floorScore = top[limit - 1].score;
          floorId = top[limit - 1].doc.specId;
        }
      }
    });
    yield* this.reset();
    return { matches: top, total };
  }
}
