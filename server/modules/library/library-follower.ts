/**
 * Follows library_changes from one process: a short poll of the rows after the last id it
 * has seen (and at once after a local write, see markLibraryChanged), handing the changed
 * spec ids to its listeners. A listener that fails (the database is down) leaves the
 * cursor where it was, so the same changes are offered again on the next tick.
 */
import { AppDataSource } from '@/server/db/data-source';
import { changesAfter, lastChangeId, onLibraryChanged } from './library-changes';

export type ChangeListener = (specIds: number[]) => void | Promise<void>;

const PAGE = 5000;

export class LibraryFollower {
  private cursor: number | null = null;
  /** Moves on every resetTo: a poll under way when the reader rebuilt must not move the cursor past the reset. */
  private resets = 0;
  private timer: ReturnType<typeof setInterval> | null = null;
  private polling: Promise<void> | null = null;
  private again = false;
  private upToDate: number | null = null;
  private readonly listeners = new Set<ChangeListener>();
  private unsubscribe: (() => void) | null = null;

  constructor(private readonly intervalMs = 250) {}

  subscribe(listener: ChangeListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  get running() {
    return this.timer !== null;
  }

  /** When the last poll found nothing more to take in (ms since the epoch), or null before the first. */
  get caughtUpAt(): number | null {
    return this.upToDate;
  }

  /** Starts polling (once); the first poll only learns where the log ends. */
  start() {
    if (this.timer) return;
    this.timer = setInterval(() => void this.poll(), this.intervalMs);
    (this.timer as unknown as { unref?: () => void }).unref?.();
    this.unsubscribe = onLibraryChanged(() => void this.poll());
    void this.poll();
  }

  stop() {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    this.unsubscribe?.();
    this.unsubscribe = null;
  }

  /** Replays from `id`: the caller has just read the library as it stood at that change. */
  resetTo(id: number) {
    this.cursor = id;
    this.resets += 1;
  }

  /** One poll; overlapping calls share it, and one more runs after it while the follower is started. */
  poll(): Promise<void> {
    if (this.polling) {
      this.again = true;
      return this.polling;
    }
    this.polling = this.drain()
      .catch(() => undefined)
      .finally(() => {
        this.polling = null;
        const again = this.again && this.timer !== null;
        this.again = false;
        if (again) void this.poll();
      });
    return this.polling;
  }

  private async drain() {
    if (!AppDataSource.isInitialized) return;
    if (this.cursor === null) {
      this.cursor = await lastChangeId();
      this.upToDate = Date.now();
      return;
    }
    for (;;) {
      const resets = this.resets;
      const started = Date.now();
      const changes = await changesAfter(this.cursor, PAGE);
      if (changes.length === 0) {
        this.upToDate = started;
        return;
      }
      const ids = [...new Set(changes.map((c) => c.specId))];
      for (const listener of this.listeners) await listener(ids);
      if (resets !== this.resets) continue;
      this.cursor = changes[changes.length - 1].id;
      if (changes.length < PAGE) {
        this.upToDate = started;
        return;
      }
    }
  }
}

/** The process's follower for its shared caches (the spec-card cache). */
export const libraryFollower = new LibraryFollower();
