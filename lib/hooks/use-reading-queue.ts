/**
 * The device's reading queue (lib/offline) wired to device storage and the API.
 * One queue per app: the calculator adds readings to it, "New job" adds jobs (so one can
 * be started with no signal), the job sheet shows what waits, and
 * useReadingQueueSync (mounted once, in the root layout) sends what waits on start,
 * when the connection returns and every 10 s, while someone is signed in.
 */
import { useEffect, useState, useSyncExternalStore } from 'react';
import AsyncStorage from '@react-native-async-storage/async-storage';
import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { ApiError } from '../api/client';
import { addReading, createJob } from '../api/jobs';
import { answerStep } from '../api/plans';
import type { CreateJobBody } from '../contracts/jobs';
import { describeError } from '../api/describe-error';
import {
  ReadingQueueRunner,
  type AddJobOutcome,
  type AddOutcome,
  type AddResultOutcome,
  type NewReading,
  type NewResult,
} from '../offline/queue-runner';
import { jobsFor, pendingFor, queuedJobSummary, resultsFor, sentJobId, waitingFor } from '../offline/reading-queue';
import { useSession } from '../session/session-provider';
import { invalidateJob, prefetchOpenJobs, storeJob } from './use-jobs';
import { RUNS_KEY } from './use-plans';

const RETRY_EVERY_MS = 10_000;

const runner = new ReadingQueueRunner(
  { getItem: (k) => AsyncStorage.getItem(k), setItem: (k, v) => AsyncStorage.setItem(k, v) },
  (item) => addReading(item.jobId, item.body, item.key),
  {
    describe: (err) =>
      err instanceof ApiError && err.status === 404
        ? 'That job is not among yours (it may have been removed).'
        : describeError(err),
    sendJob: (item) => createJob(item.body, item.key),
    sendResult: (item) => answerStep(item.jobId, item.runId, item.body, item.key),
  },
);

export function useReadingQueue() {
  const state = useSyncExternalStore(runner.subscribe, runner.getSnapshot, runner.getSnapshot);
  const { user } = useSession();
  const userId = user?.id ?? -1;
  const jobs = jobsFor(state, userId);
  return {
    pendingFor: (jobId: number) => pendingFor(state, userId, jobId),
    /** Everything this account has waiting on the device (the header's "N readings waiting to be sent"). */
    pendingCount: waitingFor(state, userId).length + state.results.filter((r) => r.userId === userId).length,
    /** Jobs started on this device that the server does not have yet, as the lists show jobs. */
    queuedJobs: jobs.map((j) => queuedJobSummary(j, user?.displayName ?? '')),
    /** A job still queued under this local id, if any. */
    queuedJob: (localId: number) => jobs.find((j) => j.localId === localId) ?? null,
    /** The server id a queued job got once sent (a screen still showing its local id follows it). */
    sentJobId: (localId: number) => sentJobId(state, userId, localId),
    rejectedJob: (localId: number) =>
      state.rejectedJobs.find((j) => j.userId === userId && j.localId === localId) ?? null,
    /** What became of a queued reading: still waiting, refused (with the server's reason), or sent. */
    fate: (key: string): { status: 'waiting' } | { status: 'rejected'; message: string } | { status: 'delivered' } => {
      if (state.pending.some((p) => p.key === key)) return { status: 'waiting' };
      const r = state.rejected.find((x) => x.key === key);
      return r ? { status: 'rejected', message: r.message } : { status: 'delivered' };
    },
    rejectedFor: (jobId: number) => state.rejected.filter((r) => r.userId === userId && r.jobId === jobId),
    add: (reading: Omit<NewReading, 'userId'>): Promise<AddOutcome> => runner.add({ ...reading, userId }),
    /** A test plan run's results still on this device, in order, and those the server refused. */
    resultsFor: (runId: number) => resultsFor(state, userId, runId),
    rejectedResultsFor: (runId: number) =>
      state.rejectedResults.filter((r) => r.userId === userId && r.runId === runId),
    addResult: (result: Omit<NewResult, 'userId'>): Promise<AddResultOutcome> =>
      runner.addResult({ ...result, userId }),
    dismiss: runner.dismiss,
  };
}

/**
 * Starts a job through the queue: sent at once when there is a connection, kept on the
 * device (with a local id to add readings to) when there is none. A refusal keeps the
 * server's error for the form.
 */
export function useCreateJob() {
  const qc = useQueryClient();
  const { user } = useSession();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<unknown>(null);
  const submit = async (body: CreateJobBody, modelTitle: string | null): Promise<AddJobOutcome | null> => {
    if (!user) return null;
    setPending(true);
    setError(null);
    try {
      const outcome = await runner.addJob({ userId: user.id, body, modelTitle });
      if (outcome.status === 'sent') await storeJob(qc, outcome.job);
      if (outcome.status === 'rejected') setError(outcome.error);
      return outcome;
    } finally {
      setPending(false);
    }
  };
  return { submit, pending, error };
}

/** Mount once, inside the session and query providers. */
export function useReadingQueueSync() {
  const qc = useQueryClient();
  const { status, user, connected } = useSession();
  // Only with a token the API accepts: offline, or while the session resumes, readings wait.
  const userId = status === 'signed-in' && connected ? user?.id : undefined;

  useEffect(() => {
    const offSent = runner.onSent((item) => {
      void invalidateJob(qc, item.jobId);
    });
    const offJob = runner.onJobSent((_item, job) => {
      void storeJob(qc, job);
    });
    const offResult = runner.onResultSent((item, answer) => {
      qc.setQueryData([...RUNS_KEY, item.jobId, item.runId], answer.run);
      void qc.invalidateQueries({ queryKey: [...RUNS_KEY, item.jobId], exact: true });
      void invalidateJob(qc, item.jobId);
    });
    return () => {
      offSent();
      offJob();
      offResult();
    };
  }, [qc]);

  useEffect(() => {
    void runner.load();
    if (userId === undefined) return;
    const flush = () => {
      void runner.flush(userId);
    };
    flush();
    // Keep the open jobs on the device, so "Add to job" has its list with no signal.
    void prefetchOpenJobs(qc);
    const timer = setInterval(flush, RETRY_EVERY_MS);
    // TanStack's online manager follows the browser's online/offline events on web.
    const unsubscribe = onlineManager.subscribe((online) => {
      if (online) flush();
    });
    return () => {
      clearInterval(timer);
      unsubscribe();
    };
  }, [userId, qc]);
}
