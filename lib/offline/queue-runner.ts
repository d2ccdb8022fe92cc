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
import type { CreateJobBody, JobDetailDto, ReadingBody, ReadingDto } from '../contracts/jobs';
import type { RunAnswerDto } from '../contracts/plans';
import {
  EMPTY_QUEUE,
  STORAGE_KEY,
  classifyFailure,
  dismissRejected,
  dismissRejectedJob,
  enqueue,
  enqueueJob,
  enqueueResult,
  dismissRejectedResult,
  rejectResult,
  recordResultAttempt,
  removeResult,
  isLocalJobId,
  jobsFor,
  newIdempotencyKey,
  nextLocalJobId,
  parseQueue,
  recordAttempt,
  recordJobAttempt,
  rejectJob,
  rejectPending,
  removePending,
  resolveJob,
  sendable,
  sentJobId,
  type QueueState,
  type QueuedJob,
  type QueuedReading,
  type QueuedResult,
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
export type SendJob = (item: QueuedJob) => Promise<JobDetailDto>;
export type SendResult = (item: QueuedResult) => Promise<RunAnswerDto>;
export type NewResult = Omit<QueuedResult, 'key' | 'queuedAt' | 'attempts' | 'lastError'>;
export type AddResultOutcome =
  | { status: 'sent'; answer: RunAnswerDto }
  | { status: 'queued'; key: string }
  | { status: 'rejected'; error: unknown; message: string };
export type NewJob = { userId: number; body: CreateJobBody; modelTitle: string | null };
/** A refused job keeps the server's error (its field messages go back on the form). */
export type AddJobOutcome =
  | { status: 'sent'; job: JobDetailDto }
  | { status: 'queued'; localId: number }
  | { status: 'rejected'; error: unknown };

export class ReadingQueueRunner {
  private state: QueueState = EMPTY_QUEUE;
  private chain: Promise<unknown> = Promise.resolve();
  private inFlight = new Set<string>();
  private flushing: Promise<void> | null = null;
  private listeners = new Set<() => void>();
  private sentListeners = new Set<(item: QueuedReading, reading: ReadingDto) => void>();
  private jobListeners = new Set<(item: QueuedJob, job: JobDetailDto) => void>();
  private resultListeners = new Set<(item: QueuedResult, answer: RunAnswerDto) => void>();
  private loaded: Promise<void> | null = null;

  constructor(
    private readonly storage: QueueStorage,
    private readonly send: SendReading,
    private readonly options: {
      now?: () => Date;
      newKey?: () => string;
      describe?: (err: unknown) => string;
      /** Sends a job started on this device (without it, queued jobs wait). */
      sendJob?: SendJob;
      /** Sends a test plan step's result (without it, queued results wait). */
      sendResult?: SendResult;
    } = {},
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

  /**
   * Queue a reading (stamped with its time and key) and try to send it at once. A
   * reading for a job still queued waits behind it; one for a job sent meanwhile (the
   * screen still knew it by its local id) goes to the job's server id.
   */
  add = async (reading: NewReading): Promise<AddOutcome> => {
    await this.load();
    const now = (this.options.now ?? (() => new Date()))();
    const key = (this.options.newKey ?? newIdempotencyKey)();
    const queued = await this.change((s) =>
      enqueue(s, {
        ...reading,
        jobId: isLocalJobId(reading.jobId)
          ? (sentJobId(s, reading.userId, reading.jobId) ?? reading.jobId)
          : reading.jobId,
        key,
        body: { ...reading.body, takenAt: reading.body.takenAt ?? now.toISOString() },
        queuedAt: now.toISOString(),
        attempts: 0,
        lastError: null,
      }),
    );
    const item = queued.pending.find((p) => p.key === key)!;
    if (!isLocalJobId(item.jobId)) return this.attempt(item);
    if (queued.jobs.some((j) => j.localId === item.jobId && j.userId === item.userId)) return { status: 'queued', key };
    // Its job was refused (or belongs to no one here): the reading cannot go anywhere; say so now.
    const message = 'Its job was not saved, so the reading has nowhere to go. Add it to another job.';
    await this.change((s) => rejectPending(s, key, 422, message));
    return { status: 'rejected', message };
  };

  /**
   * Queue a job started on this device and try to send it at once. It gets a local id
   * (negative) before anything is sent, so readings can be added to it offline.
   */
  addJob = async (job: NewJob): Promise<AddJobOutcome> => {
    await this.load();
    const now = (this.options.now ?? (() => new Date()))();
    const key = (this.options.newKey ?? newIdempotencyKey)();
    const queued = await this.change((s) =>
      enqueueJob(s, {
        ...job,
        key,
        localId: nextLocalJobId(s),
        queuedAt: now.toISOString(),
        attempts: 0,
        lastError: null,
      }),
    );
    return this.attemptJob(queued.jobs.find((j) => j.key === key)!);
  };

  /** Send everything this account has waiting, oldest first (jobs before readings); stops at the first network fault. */
  flush = (userId: number): Promise<void> => {
    this.flushing ??= (async () => {
      try {
        await this.load();
        await this.change((s) => s);
        for (const job of jobsFor(this.state, userId)) {
          if (this.inFlight.has(job.key) || !this.state.jobs.some((j) => j.key === job.key)) continue;
          const outcome = await this.attemptJob(job);
          if (outcome.status === 'queued') return;
        }
        for (const item of sendable(this.state, userId)) {
          // Sent meanwhile (by add(), or by another tab): nothing to do.
          if (this.inFlight.has(item.key) || !this.state.pending.some((p) => p.key === item.key)) continue;
          const outcome = await this.attempt(item);
          if (outcome.status === 'queued') return;
        }
        // Step results, each run in the order its results were taken: a run waits behind its first unsent one.
        const held = new Set<number>();
        for (const item of this.state.results.filter((r) => r.userId === userId)) {
          if (held.has(item.runId)) continue;
          if (this.inFlight.has(item.key) || !this.state.results.some((r) => r.key === item.key)) {
            held.add(item.runId);
            continue;
          }
          const outcome = await this.attemptResult(item);
          if (outcome.status === 'queued') return;
        }
      } finally {
        this.flushing = null;
      }
    })();
    return this.flushing;
  };

  /**
   * Queue a step's result (judged on the device) and send it at once, unless an earlier
   * result of the same run is still waiting: results go in the order they were taken.
   */
  addResult = async (result: NewResult): Promise<AddResultOutcome> => {
    await this.load();
    const now = (this.options.now ?? (() => new Date()))();
    const key = (this.options.newKey ?? newIdempotencyKey)();
    const queued = await this.change((s) =>
      enqueueResult(s, { ...result, key, queuedAt: now.toISOString(), attempts: 0, lastError: null }),
    );
    const first = queued.results.find((r) => r.runId === result.runId && r.userId === result.userId)!;
    if (first.key !== key) return { status: 'queued', key };
    return this.attemptResult(first);
  };

  /** Called after the server has stored a step's result queued on this device. */
  onResultSent(fn: (item: QueuedResult, answer: RunAnswerDto) => void) {
    this.resultListeners.add(fn);
    return () => {
      this.resultListeners.delete(fn);
    };
  }

  private async attemptResult(item: QueuedResult): Promise<AddResultOutcome> {
    const sendResult = this.options.sendResult;
    if (!sendResult) return { status: 'queued', key: item.key };
    const result = await this.tryOnce(item.key, () => sendResult(item), {
      sent: () => (s) => removeResult(s, item.key),
      retry: (message) => (s) => recordResultAttempt(s, item.key, message),
      refused: (status, message) => (s) => rejectResult(s, item.key, status, message),
    });
    if (result.status === 'sent') this.resultListeners.forEach((fn) => fn(item, result.value));
    return result.status === 'sent'
      ? { status: 'sent', answer: result.value }
      : result.status === 'refused'
        ? { status: 'rejected', error: result.error, message: result.message }
        : { status: 'queued', key: item.key };
  }

  dismiss = (key: string) =>
    this.change((s) => dismissRejectedResult(dismissRejectedJob(dismissRejected(s, key), key), key)).then(
      () => undefined,
    );

  /** Called after the server has stored a job queued on this device. */
  onJobSent(fn: (item: QueuedJob, job: JobDetailDto) => void) {
    this.jobListeners.add(fn);
    return () => {
      this.jobListeners.delete(fn);
    };
  }

  private async attemptJob(item: QueuedJob): Promise<AddJobOutcome> {
    const sendJob = this.options.sendJob;
    if (!sendJob) return { status: 'queued', localId: item.localId };
    const result = await this.tryOnce(item.key, () => sendJob(item), {
      sent: (job) => (s) => resolveJob(s, item.key, job.id),
      retry: (message) => (s) => recordJobAttempt(s, item.key, message),
      refused: (status, message) => (s) => rejectJob(s, item.key, status, message),
    });
    if (result.status === 'sent') this.jobListeners.forEach((fn) => fn(item, result.value));
    return result.status === 'sent'
      ? { status: 'sent', job: result.value }
      : result.status === 'refused'
        ? { status: 'rejected', error: result.error }
        : { status: 'queued', localId: item.localId };
  }

  private async attempt(item: QueuedReading): Promise<AddOutcome> {
    const result = await this.tryOnce(item.key, () => this.send(item), {
      sent: () => (s) => removePending(s, item.key),
      retry: (message) => (s) => recordAttempt(s, item.key, message),
      refused: (status, message) => (s) => rejectPending(s, item.key, status, message),
    });
    if (result.status === 'sent') this.sentListeners.forEach((fn) => fn(item, result.value));
    return result.status === 'sent'
      ? { status: 'sent', reading: result.value }
      : result.status === 'refused'
        ? { status: 'rejected', message: result.message }
        : { status: 'queued', key: item.key };
  }

  /**
   * One send of one queued item (a job or a reading), never two at once for a key, and
   * the queue change for what came of it: sent, worth retrying, or refused for good.
   */
  private async tryOnce<T>(
    key: string,
    send: () => Promise<T>,
    on: {
      sent: (value: T) => (s: QueueState) => QueueState;
      retry: (message: string) => (s: QueueState) => QueueState;
      refused: (status: number, message: string) => (s: QueueState) => QueueState;
    },
  ): Promise<
    { status: 'sent'; value: T } | { status: 'busy' | 'retry' } | { status: 'refused'; error: unknown; message: string }
  > {
    if (this.inFlight.has(key)) return { status: 'busy' };
    this.inFlight.add(key);
    try {
      const value = await send();
      await this.change(on.sent(value));
      return { status: 'sent', value };
    } catch (err) {
      const message = this.options.describe?.(err) ?? (err instanceof Error ? err.message : String(err));
      if (classifyFailure(err) === 'retry') {
        await this.change(on.retry(message));
        return { status: 'retry' };
      }
      await this.change(on.refused((err as { status: number }).status, message));
      return { status: 'refused', error: err, message };
    } finally {
      this.inFlight.delete(key);
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
