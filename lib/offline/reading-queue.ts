/**
 * The offline reading queue's pure parts: what a queued reading holds, the
 * Idempotency-Key it keeps for life, which failures are worth retrying, and the
 * state transitions. No I/O here (see queue-runner.ts), so every rule is tested.
 *
 * A reading is keyed once, when it is queued; every resend uses the same key, so a
 * reading the server stored but whose answer was lost lands exactly once.
 */
import { ApiError } from '../api/client';
import { IDEMPOTENCY_KEY, type ReadingBody } from '../contracts/jobs';
import type { Verdict } from '../verdict';

/** What the job sheet shows for a reading that has not reached the server yet. */
export type ReadingPreview = {
  label: string;
  componentName: string;
  value: number;
  unit: string;
  /** A beep-only check's result in words (it has no value to show). */
  text?: string;
  verdict: Verdict | null;
};

export type QueuedReading = {
  key: string;
  /** The account that took it: another account signing in on this device never sends it. */
  userId: number;
  jobId: number;
  body: ReadingBody;
  preview: ReadingPreview;
  queuedAt: string;
  attempts: number;
  lastError: string | null;
};

/** Refused by the server (4xx): out of the queue, kept here until the technician has seen it. */
export type RejectedReading = QueuedReading & { status: number; message: string };

export type QueueState = { pending: QueuedReading[]; rejected: RejectedReading[] };

export const EMPTY_QUEUE: QueueState = { pending: [], rejected: [] };
export const STORAGE_KEY = 'specbench.reading-queue.v1';

type RandomSource =
  { randomUUID?: () => string; getRandomValues?: <T extends ArrayBufferView | null>(a: T) => T } | undefined;
const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/** A fresh Idempotency-Key: a UUID where the platform has one, else 32 random letters and digits. */
export function newIdempotencyKey(random: RandomSource = (globalThis as { crypto?: RandomSource }).crypto): string {
  if (typeof random?.randomUUID === 'function') return random.randomUUID();
  const bytes = new Uint8Array(32);
  if (typeof random?.getRandomValues === 'function') random.getRandomValues(bytes);
  else for (let i = 0; i < bytes.length; i++) bytes[i] = Math.floor(Math.random() * 256);
  const key = Array.from(bytes, (b) => ALPHABET[b % ALPHABET.length]).join('');
  if (!IDEMPOTENCY_KEY.test(key)) throw new Error('generated an invalid idempotency key');
  return key;
}

export type FailureAction = 'retry' | 'drop';

/**
 * What to do after a failed send. Network faults (no answer at all), timeouts, rate
 * limits and server faults are retried. 401 is retried too: the session has ended, and
 * the reading goes once the technician signs in again — dropping it would lose it.
 * Any other 4xx is the reading's own fault (a closed job, a bad value) and is dropped.
 */
export function classifyFailure(err: unknown): FailureAction {
  if (!(err instanceof ApiError)) return 'retry';
  if (err.status === 401 || err.status === 408 || err.status === 429 || err.status >= 500) return 'retry';
  return err.status >= 400 ? 'drop' : 'retry';
}

export function enqueue(state: QueueState, item: QueuedReading): QueueState {
  if (state.pending.some((p) => p.key === item.key)) return state;
  return { ...state, pending: [...state.pending, item] };
}

export function removePending(state: QueueState, key: string): QueueState {
  return { ...state, pending: state.pending.filter((p) => p.key !== key) };
}

export function recordAttempt(state: QueueState, key: string, error: string): QueueState {
  return {
    ...state,
    pending: state.pending.map((p) => (p.key === key ? { ...p, attempts: p.attempts + 1, lastError: error } : p)),
  };
}

export function rejectPending(state: QueueState, key: string, status: number, message: string): QueueState {
  const item = state.pending.find((p) => p.key === key);
  if (!item) return state;
  return {
    pending: state.pending.filter((p) => p.key !== key),
    rejected: [...state.rejected, { ...item, status, message }],
  };
}

export function dismissRejected(state: QueueState, key: string): QueueState {
  return { ...state, rejected: state.rejected.filter((r) => r.key !== key) };
}

/** The readings waiting for one job of one account, oldest first. */
export function pendingFor(state: QueueState, userId: number, jobId: number): QueuedReading[] {
  return state.pending.filter((p) => p.userId === userId && p.jobId === jobId);
}

/** The readings one account may send now, oldest first. */
export function sendable(state: QueueState, userId: number): QueuedReading[] {
  return state.pending.filter((p) => p.userId === userId);
}

/** Stored text → state; anything unreadable is treated as an empty queue rather than crashing the app. */
export function parseQueue(text: string | null): QueueState {
  if (!text) return EMPTY_QUEUE;
  try {
    const raw = JSON.parse(text) as Partial<QueueState>;
    const ok = (x: unknown): x is QueuedReading =>
      !!x &&
      typeof x === 'object' &&
      typeof (x as QueuedReading).key === 'string' &&
      typeof (x as QueuedReading).jobId === 'number' &&
      typeof (x as QueuedReading).body === 'object';
    return {
      pending: Array.isArray(raw.pending) ? raw.pending.filter(ok) : [],
      rejected: Array.isArray(raw.rejected) ? (raw.rejected.filter(ok) as RejectedReading[]) : [],
    };
  } catch {
    return EMPTY_QUEUE;
  }
}

/** "2 readings waiting to be sent — they will go when the connection returns". */
export function waitingMessage(count: number): string {
  if (count === 0) return '';
  return count === 1
    ? '1 reading waiting to be sent — it will go when the connection returns'
    : `${count} readings waiting to be sent — they will go when the connection returns`;
}
