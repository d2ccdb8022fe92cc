/**
 * The offline reading queue's pure parts: what a queued reading holds, the
 * Idempotency-Key it keeps for life, which failures are worth retrying, and the
 * state transitions. No I/O here (see queue-runner.ts), so every rule is tested.
 *
 * A reading is keyed once, when it is queued; every resend uses the same key, so a
 * reading the server stored but whose answer was lost lands exactly once.
 *
 * A job started with no connection is queued the same way. Until the server has it,
 * it goes by a local id (a negative number, never a server id), and readings added to
 * it wait behind it; once it is stored, its readings move to the server's id and the
 * local id is remembered, so a screen still showing it can follow.
 */
import { ApiError } from '../api/client';
import { IDEMPOTENCY_KEY, type CreateJobBody, type JobSummaryDto, type ReadingBody } from '../contracts/jobs';
import type { RunResultBody } from '../contracts/plans';
import type { StepJudgement } from '../plans/judge-step';
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

/** A job started on this device that the server has not stored yet. */
export type QueuedJob = {
  key: string;
  userId: number;
  /** Negative: what the device calls it (its sheet's address, its readings' job) until it is sent. */
  localId: number;
  body: CreateJobBody;
  /** The library model's title when the job was started, for the sheet and the pickers. */
  modelTitle: string | null;
  queuedAt: string;
  attempts: number;
  lastError: string | null;
};

export type RejectedJob = QueuedJob & { status: number; message: string };

/** A queued job the server stored: its local id now means this server id. */
export type SentJob = { localId: number; jobId: number; userId: number };

/**
 * A test plan step answered with no signal: judged on the device (lib/plans/judge-step.ts)
 * so the run goes on, sent in order, each with its key; the server judges it again.
 */
export type QueuedResult = {
  key: string;
  userId: number;
  jobId: number;
  runId: number;
  body: RunResultBody;
  /** The step's title and how the device judged it, for the run screen until the server answers. */
  title: string;
  judged: StepJudgement;
  queuedAt: string;
  attempts: number;
  lastError: string | null;
};

export type RejectedResult = QueuedResult & { status: number; message: string };

export type QueueState = {
  pending: QueuedReading[];
  rejected: RejectedReading[];
  jobs: QueuedJob[];
  rejectedJobs: RejectedJob[];
  sentJobs: SentJob[];
  results: QueuedResult[];
  rejectedResults: RejectedResult[];
};

export const EMPTY_QUEUE: QueueState = {
  pending: [],
  rejected: [],
  jobs: [],
  rejectedJobs: [],
  sentJobs: [],
  results: [],
  rejectedResults: [],
};
/** How many sent jobs' local ids are remembered (a screen opened on one follows it to its server id). */
export const SENT_JOBS_KEPT = 50;
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

/** A job's local id: negative, and never one this device has used for another job it still remembers. */
export function nextLocalJobId(state: QueueState): number {
  const used = [...state.jobs, ...state.rejectedJobs, ...state.sentJobs].map((j) => j.localId);
  return Math.min(0, ...used) - 1;
}

export const isLocalJobId = (id: number) => Number.isInteger(id) && id < 0;

export function enqueueJob(state: QueueState, item: QueuedJob): QueueState {
  if (state.jobs.some((j) => j.key === item.key)) return state;
  return { ...state, jobs: [...state.jobs, item] };
}

/** The server stored the queued job: its readings move to its id; the local id is remembered. */
export function resolveJob(state: QueueState, key: string, jobId: number): QueueState {
  const job = state.jobs.find((j) => j.key === key);
  if (!job) return state;
  const move = <T extends { jobId: number; userId: number }>(r: T): T =>
    r.jobId === job.localId && r.userId === job.userId ? { ...r, jobId } : r;
  return {
    ...state,
    jobs: state.jobs.filter((j) => j.key !== key),
    pending: state.pending.map(move),
    rejected: state.rejected.map(move),
    sentJobs: [...state.sentJobs, { localId: job.localId, jobId, userId: job.userId }].slice(-SENT_JOBS_KEPT),
  };
}

/** The server refused the job (4xx): it and the readings waiting on it are kept as refused, with the reason. */
export function rejectJob(state: QueueState, key: string, status: number, message: string): QueueState {
  const job = state.jobs.find((j) => j.key === key);
  if (!job) return state;
  const mine = (r: QueuedReading) => r.jobId === job.localId && r.userId === job.userId;
  const why = `Its job was not saved: ${message}`;
  return {
    ...state,
    jobs: state.jobs.filter((j) => j.key !== key),
    rejectedJobs: [...state.rejectedJobs, { ...job, status, message }],
    pending: state.pending.filter((r) => !mine(r)),
    rejected: [...state.rejected, ...state.pending.filter(mine).map((r) => ({ ...r, status, message: why }))],
  };
}

export function recordJobAttempt(state: QueueState, key: string, error: string): QueueState {
  return {
    ...state,
    jobs: state.jobs.map((j) => (j.key === key ? { ...j, attempts: j.attempts + 1, lastError: error } : j)),
  };
}

export function dismissRejectedJob(state: QueueState, key: string): QueueState {
  return { ...state, rejectedJobs: state.rejectedJobs.filter((j) => j.key !== key) };
}

/** The jobs one account has waiting, oldest first. */
export function jobsFor(state: QueueState, userId: number): QueuedJob[] {
  return state.jobs.filter((j) => j.userId === userId);
}

/** The server id a sent job's local id now stands for, if this device remembers it. */
export function sentJobId(state: QueueState, userId: number, localId: number): number | null {
  return state.sentJobs.find((j) => j.userId === userId && j.localId === localId)?.jobId ?? null;
}

/**
 * The queued jobs My jobs shows for a search and a status filter: they are open, and match
 * on what they say (machine, VIN, customer, notes, model), as the server's search does.
 */
export function queuedJobsMatching(
  jobs: JobSummaryDto[],
  q: string,
  status: 'open' | 'closed' | undefined,
): JobSummaryDto[] {
  if (status === 'closed') return [];
  const words = q.trim().toLocaleLowerCase();
  if (!words) return jobs;
  return jobs.filter((j) =>
    [j.modelTitle, j.machineLabel, j.machineId, j.customerRef, j.notes].some((f) =>
      f?.toLocaleLowerCase().includes(words),
    ),
  );
}

/** A queued job as the pickers and lists show jobs: open, no readings stored yet. */
export function queuedJobSummary(job: QueuedJob, ownerName: string): JobSummaryDto {
  return {
    id: job.localId,
    ownerId: job.userId,
    ownerName,
    modelId: job.body.modelId ?? null,
    modelTitle: job.modelTitle,
    machineLabel: job.body.machineLabel ?? '',
    machineId: job.body.machineId ?? '',
    customerRef: job.body.customerRef ?? '',
    notes: job.body.notes || null,
    status: 'open',
    counts: { pass: 0, marginal: 0, fail: 0 },
    createdAt: job.queuedAt,
    updatedAt: job.queuedAt,
  };
}

export function enqueueResult(state: QueueState, item: QueuedResult): QueueState {
  if (state.results.some((r) => r.key === item.key)) return state;
  return { ...state, results: [...state.results, item] };
}

export function removeResult(state: QueueState, key: string): QueueState {
  return { ...state, results: state.results.filter((r) => r.key !== key) };
}

export function recordResultAttempt(state: QueueState, key: string, error: string): QueueState {
  return {
    ...state,
    results: state.results.map((r) => (r.key === key ? { ...r, attempts: r.attempts + 1, lastError: error } : r)),
  };
}

/**
 * The server refused a step's result: it, and every later result of the same run (they
 * followed from it), are kept as refused; the run screen shows the server's run again.
 */
export function rejectResult(state: QueueState, key: string, status: number, message: string): QueueState {
  const index = state.results.findIndex((r) => r.key === key);
  if (index < 0) return state;
  const item = state.results[index];
  const later = state.results.filter((r, i) => i > index && r.runId === item.runId && r.userId === item.userId);
  const out = new Set([item.key, ...later.map((r) => r.key)]);
  return {
    ...state,
    results: state.results.filter((r) => !out.has(r.key)),
    rejectedResults: [
      ...state.rejectedResults,
      { ...item, status, message },
      ...later.map((r) => ({ ...r, status, message: `Not sent: an earlier step was refused (${message})` })),
    ],
  };
}

export function dismissRejectedResult(state: QueueState, key: string): QueueState {
  return { ...state, rejectedResults: state.rejectedResults.filter((r) => r.key !== key) };
}

/** The results one account has waiting for one run, in the order they were taken. */
export function resultsFor(state: QueueState, userId: number, runId: number): QueuedResult[] {
  return state.results.filter((r) => r.userId === userId && r.runId === runId);
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
    ...state,
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

/** Everything one account has waiting (readings, also those behind a queued job), oldest first. */
export function waitingFor(state: QueueState, userId: number): QueuedReading[] {
  return state.pending.filter((p) => p.userId === userId);
}

/** The readings one account may send now, oldest first: not those whose job is still queued. */
export function sendable(state: QueueState, userId: number): QueuedReading[] {
  return waitingFor(state, userId).filter((p) => !isLocalJobId(p.jobId));
}

/** Stored text → state; anything unreadable is treated as an empty queue rather than crashing the app. */
export function parseQueue(text: string | null): QueueState {
  if (!text) return EMPTY_QUEUE;
  try {
    const raw = JSON.parse(text) as Partial<QueueState>;
    const keyed = (x: unknown): x is { key: string } =>
      !!x && typeof x === 'object' && typeof (x as { key?: unknown }).key === 'string';
    const reading = (x: unknown): x is QueuedReading =>
      keyed(x) && typeof (x as QueuedReading).jobId === 'number' && typeof (x as QueuedReading).body === 'object';
    const job = (x: unknown): x is QueuedJob =>
      keyed(x) && isLocalJobId((x as QueuedJob).localId) && typeof (x as QueuedJob).body === 'object';
    const result = (x: unknown): x is QueuedResult =>
      keyed(x) &&
      typeof (x as QueuedResult).runId === 'number' &&
      typeof (x as QueuedResult).body === 'object' &&
      typeof (x as QueuedResult).judged === 'object';
    const sent = (x: unknown): x is SentJob =>
      !!x && typeof x === 'object' && isLocalJobId((x as SentJob).localId) && typeof (x as SentJob).jobId === 'number';
    const list = <T>(v: unknown, ok: (x: unknown) => x is T): T[] => (Array.isArray(v) ? v.filter(ok) : []);
    return {
      pending: list(raw.pending, reading),
      rejected: list(raw.rejected, reading) as RejectedReading[],
      jobs: list(raw.jobs, job),
      rejectedJobs: list(raw.rejectedJobs, job) as RejectedJob[],
      sentJobs: list(raw.sentJobs, sent),
      results: list(raw.results, result),
      rejectedResults: list(raw.rejectedResults, result) as RejectedResult[],
    };
  } catch {
    return EMPTY_QUEUE;
  }
}

/** "1 job and 2 readings waiting to be sent — they will go when the connection returns". */
export function waitingMessage(readings: number, jobs = 0): string {
  if (readings + jobs === 0) return '';
  const parts = [
    jobs ? (jobs === 1 ? '1 job' : `${jobs} jobs`) : '',
    readings ? (readings === 1 ? '1 reading' : `${readings} readings`) : '',
  ].filter(Boolean);
  const it = readings + jobs === 1 ? 'it' : 'they';
  return `${parts.join(' and ')} waiting to be sent — ${it} will go when the connection returns`;
}
