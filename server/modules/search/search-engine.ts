/**
 * One process's search: the index, how it is built and how it follows the library. A full
 * build reads the published specs page by page and yields to the event loop between pages,
 * while the old index (if any) keeps answering; it swaps in when complete. After that the
 * index follows library_changes (library-follower.ts): the specs a change names are read
 * again and replaced or removed between two queries, so an edit anywhere shows here within
 * a poll. A full build runs again only when a change names very many specs or replaced
 * entries pile up.
 */
import { setImmediate as yieldToLoop } from 'node:timers/promises';
import { lastChangeId } from '../library/library-changes';
import { LibraryFollower } from '../library/library-follower';
import { SearchIndex } from './search-index';
import { loadPublishedByIds, loadPublishedPage, type IndexedSpec } from './search.queries';

const PAGE = 5000;
/** A change naming more specs than this is cheaper to take in by a full build. */
const REBUILD_AT = 50_000;
const MAX_WASTED = 0.3;

/** Specs added between two turns of the event loop (each takes some microseconds). */
const SLICE = 500;

async function addInSlices(index: SearchIndex<IndexedSpec>, docs: IndexedSpec[]) {
  for (let i = 0; i < docs.length; i += SLICE) {
    for (let j = i; j < Math.min(docs.length, i + SLICE); j += 1) index.upsert(docs[j]);
    if (i + SLICE < docs.length) await yieldToLoop();
  }
}

export type SearchStats = { specs: number; terms: number; buildMs: number | null; builtAt: string | null };

export class SearchEngine {
  private index: SearchIndex<IndexedSpec> | null = null;
  private building: Promise<void> | null = null;
  private buildMs: number | null = null;
  private builtAt: Date | null = null;
  readonly follower: LibraryFollower;

  constructor(options: { pollMs?: number } = {}) {
    this.follower = new LibraryFollower(options.pollMs);
    this.follower.subscribe((ids) => this.apply(ids));
  }

  /** The current index, built on first use (a request waits for the first build only). */
  async current(): Promise<SearchIndex<IndexedSpec>> {
    if (!this.index) await this.rebuild();
    this.follower.start();
    return this.index!;
  }

  /** A full build off the request path; concurrent calls share it. */
  rebuild(): Promise<void> {
    this.building ??= this.build().finally(() => {
      this.building = null;
    });
    return this.building;
  }

  private async build() {
    const started = Date.now();
    const from = await lastChangeId();
    const next = new SearchIndex<IndexedSpec>();
    for (let after = 0; ;) {
      const page = await loadPublishedPage(after, PAGE);
      await addInSlices(next, page);
      if (page.length < PAGE) break;
      after = page[page.length - 1].specId;
      await yieldToLoop();
    }
    this.index = next;
    this.follower.resetTo(from);
    this.buildMs = Date.now() - started;
    this.builtAt = new Date();
  }

  /** Takes in the specs a change names: each is read again, then replaced, or removed when no longer published. */
  private async apply(ids: number[]) {
    if (!this.index) return;
    if (ids.length > REBUILD_AT) {
      void this.rebuild();
      return;
    }
    for (let i = 0; i < ids.length; i += PAGE) {
      const slice = ids.slice(i, i + PAGE);
      const docs = await loadPublishedByIds(slice);
      const index = this.index;
      const published = new Set(docs.map((d) => d.specId));
      // Between two queries, so a query in flight sees the index as it started.
      await index.exclusive(async () => {
        for (const id of slice) if (!published.has(id)) index.remove(id);
        await addInSlices(index, docs);
      });
    }
    if (this.index.wasted > MAX_WASTED && this.index.size > 10_000) void this.rebuild();
  }

  /** Waits until every change logged so far is in the index (tests and the benchmark). */
  async settle(): Promise<void> {
    await this.current();
    await this.follower.poll();
  }

  /**
   * Seconds since this index last held every library change (built, or the follower found
   * nothing newer); null before the first build. /metrics reports it as the index age.
   */
  ageSeconds(now = Date.now()): number | null {
    if (!this.index || !this.builtAt) return null;
    const upToDate = Math.max(this.builtAt.getTime(), this.follower.caughtUpAt ?? 0);
    return Math.max(0, (now - upToDate) / 1000);
  }

  stats(): SearchStats {
    return {
      specs: this.index?.size ?? 0,
      terms: this.index?.termCount ?? 0,
      buildMs: this.buildMs,
      builtAt: this.builtAt?.toISOString() ?? null,
    };
  }

  stop() {
    this.follower.stop();
  }
}
