/**
 * The offline reading queue at work: keeps the queue in device storage, sends a new
 * reading at once, and resends what is waiting when asked (the app's triggers: start,
 * back online, every few seconds). Storage and the send function are injected, so
 * the runner is tested without a browser or a server.
 *
 * Every change goes through one promise chain (no two changes interleave in this
 * tab), re-reads storage first (another tab may have queued something) and writes the
 * whole state back. A reading leaves the queue only after the server has answered
 * 2xx (stored) or a 4xx that resending cannot fix (then it is kept as "rejected").
 */
import type { ReadingBody, ReadingDto } from '../contracts/jobs';
import {
  EMPTY_QUEUE,
  STORAGE_KEY,
  classifyFailure,
  dismissRejected,
  enqueue,
  newIdempotencyKey,
  parseQueue,
  recordAttempt,
  rejectPending,
  removePending,
  sendable,
  type QueueState,
  type QueuedReading,
  type ReadingPreview,
} from './reading-queue';

export type QueueStorage = {
  getItem: (key: string) => Promise<string | null>;
  setItem: (key: string, value: string) => Promise<void>;
};
export type SendReading = (item: QueuedReading) => Promise<ReadingDto>;
export type AddOutcome =
  { status: 'sent'; reading: ReadingDto } | { status: 'queued'; key: string } | { status: 'rejected'; message: string };
export type NewReading = { userId: number; jobId: number; body: ReadingBody; preview: ReadingPreview };

export class ReadingQueueRunner {
  private state: QueueState = EMPTY_QUEUE;
  private chain: Promise<unknown> = Promise.resolve();
  private inFlight = new Set<string>();
  private flushing: Promise<void> | null = null;
  private listeners = new Set<() => void>();
  private sentListeners = new Set<(item: QueuedReading, reading: ReadingDto) => void>();
  private loaded: Promise<void> | null = null;

  constructor(
    private readonly storage: QueueStorage,
    private readonly send: SendReading,
    private readonly options: { now?: () => Date; newKey?: () => string; describe?: (err: unknown) => string } = {},
  ) {}

  subscribe = (fn: () => void) => {
    this.listeners.add(fn);
    return () => {
      this.listeners.delete(fn);
    };
  };

  getSnapshot = () => this.state;

  /** Called after the server has stored a reading (new or a repeat of a known key). */
  onSent(fn: (item: QueuedReading, reading: ReadingDto) => void) {
    this.sentListeners.add(fn);
    return () => {
      this.sentListeners.delete(fn);
    };
  }

  load = () => {
    this.loaded ??= this.change((s) => s).then(() => undefined);
    return this.loaded;
  };

  /** Queue a reading (stamped with its time and key) and try to send it at once. */
  add = async (reading: NewReading): Promise<AddOutcome> => {
    await this.load();
    const now = (this.options.now ?? (() => new Date()))();
    const item: QueuedReading = {
      ...reading,
      key: (this.options.newKey ?? newIdempotencyKey)(),
      body: { ...reading.body, takenAt: reading.body.takenAt ?? now.toISOString() },
      queuedAt: now.toISOString(),
      attempts: 0,
      lastError: null,
    };
    await this.change((s) => enqueue(s, item));
    return this.attempt(item);
  };

  /** Send everything this account has waiting, oldest first; stops at the first network fault. */
  flush = (userId: number): Promise<void> => {
    this.flushing ??= (async () => {
      try {
        await this.load();
        await this.change((s) => s);
        for (const item of sendable(this.state, userId)) {
          // Sent meanwhile (by add(), or by another tab): nothing to do.
          if (this.inFlight.has(item.key) || !this.state.pending.some((p) => p.key === item.key)) continue;
          const outcome = await this.attempt(item);
          if (outcome.status === 'queued') break;
        }
      } finally {
        this.flushing = null;
      }
    })();
    return this.flushing;
  };

  dismiss = (key: string) => this.change((s) => dismissRejected(s, key)).then(() => undefined);

  private async attempt(item: QueuedReading): Promise<AddOutcome> {
    if (this.inFlight.has(item.key)) return { status: 'queued', key: item.key };
    this.inFlight.add(item.key);
    try {
      const reading = await this.send(item);
      await this.change((s) => removePending(s, item.key));
      this.sentListeners.forEach((fn) => fn(item, reading));
      return { status: 'sent', reading };
    } catch (err) {
      const message = this.options.describe?.(err) ?? (err instanceof Error ? err.message : String(err));
      if (classifyFailure(err) === 'retry') {
        await this.change((s) => recordAttempt(s, item.key, message));
        return { status: 'queued', key: item.key };
      }
      await this.change((s) => rejectPending(s, item.key, (err as { status: number }).status, message));
      return { status: 'rejected', message };
    } finally {
      this.inFlight.delete(item.key);
    }
  }

  /** Re-read storage, apply the change, write it back, tell the subscribers. */
  private change(fn: (s: QueueState) => QueueState): Promise<QueueState> {
    const next = this.chain.then(async () => {
      let stored = this.state;
      try {
        stored = parseQueue(await this.storage.getItem(STORAGE_KEY));
      } catch {
        // Storage unreadable: carry on with what this tab holds in memory.
      }
      const updated = fn(stored);
      try {
        await this.storage.setItem(STORAGE_KEY, JSON.stringify(updated));
      } catch {
        // Storage full or refused: the reading is still held in memory and sent from there.
      }
      if (JSON.stringify(updated) !== JSON.stringify(this.state)) {
        this.state = updated;
        this.listeners.forEach((l) => l());
      }
      return updated;
    });
    this.chain = next.catch(() => undefined);
    return next;
  }
}
