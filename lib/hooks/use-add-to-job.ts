/**
 * "Add to job" under a calculator: which job a reading goes on, the re-take it may
 * replace, and what became of the last one sent. The screen says what it knows (the
 * spec, a job and re-take from its address); every reading goes through the device's
 * queue (use-reading-queue.ts), so a dead connection loses nothing.
 */
import { useState } from 'react';
import type { JobSummaryDto, ReadingDto } from '../contracts/jobs';
import type { AddOutcome } from '../offline/queue-runner';
import { draftBody, type ReadingDraft } from '../offline/reading-body';
import { isLocalJobId } from '../offline/reading-queue';
import { useSession } from '../session/session-provider';
import { checkText, type Verdict } from '../verdict';
import { useJobQuery, useJobsQuery, useLastJob } from './use-jobs';
import { useReadingQueue } from './use-reading-queue';

/** What the screen knows about where a reading goes. */
export type AddToJobTarget = {
  /** The library spec the reading checks (a spec card); without it the reading goes with a typed label. */
  spec?: { id: number; modelId: number; parameter: string; componentName: string };
  /** The job to add to (the address's ?job=); otherwise the job last used, if any. */
  jobId?: number;
  /** The reading this one re-takes (the address's &retake=): it stays on the sheet, struck through. */
  retakeOf?: number;
};

const integer = (s: string | string[] | undefined, ok: (n: number) => boolean) => {
  const n = Number(Array.isArray(s) ? s[0] : s);
  return Number.isInteger(n) && ok(n) ? n : undefined;
};

/** ?job= and &retake= of a calculator's address (links from the job sheet; a job not sent yet has a local, negative id). */
export function jobLink(params: { job?: string | string[]; retake?: string | string[] }): AddToJobTarget {
  return { jobId: integer(params.job, (n) => n !== 0), retakeOf: integer(params.retake, (n) => n > 0) };
}

export type AddToJobMode = 'idle' | 'picking' | 'creating';
/** A reading's outcome as shown: as added, or — for one that was queued — what became of it since. */
export type ShownOutcome = AddOutcome | { status: 'delivered' };
type Sent = { for: string; jobId: number; outcome: AddOutcome };

export function useAddToJob({ spec, jobId: linkedJob, retakeOf: linkedRetake }: AddToJobTarget) {
  const { user } = useSession();
  const queue = useReadingQueue();
  const [lastJob, rememberJob] = useLastJob(user?.id);
  const [picked, setJobId] = useState<number | null>(linkedJob ?? lastJob);
  // A job started offline is known by its local id until the server has it; then by the server's.
  const follow = (id: number) => (isLocalJobId(id) ? (queue.sentJobId(id) ?? id) : id);
  const jobId = picked === null ? null : follow(picked);
  const [retakeOf, setRetakeOf] = useState(linkedRetake);
  const [mode, setMode] = useState<AddToJobMode>('idle');
  const [sent, setSent] = useState<Sent | null>(null);
  const [sending, setSending] = useState(false);
  const jobs = useJobsQuery({ status: 'open' }, mode === 'picking' || jobId !== null);
  // The open jobs to pick from: those started on this device and not sent yet first, then the kept list.
  const openJobs: JobSummaryDto[] | undefined =
    jobs.data || queue.queuedJobs.length ? [...queue.queuedJobs, ...(jobs.data ?? [])] : undefined;
  const retakeJob = useJobQuery(jobId, retakeOf !== undefined);
  const retaken: ReadingDto | undefined = retakeJob.data?.readings.find((r) => r.id === retakeOf);
  const chosen: JobSummaryDto | undefined = openJobs?.find((j) => j.id === jobId);

  /** Sends one reading to job `target`; `label` says what was measured when there is no spec. */
  const send = async (target: number, draft: ReadingDraft, verdict: Verdict, label: string) => {
    setSending(true);
    rememberJob(target);
    setJobId(target);
    setMode('idle');
    const body = draftBody(draft, spec ? { specId: spec.id } : { label }, { retakeOf });
    const preview = {
      label: spec?.parameter ?? label,
      componentName: spec?.componentName ?? '',
      ...(draft.kind === 'measured'
        ? { value: draft.input.reading.value, unit: draft.input.reading.unit }
        : { value: 0, unit: '', text: checkText(draft.check) }),
      verdict,
    };
    const outcome = await queue.add({ jobId: target, body, preview });
    if (outcome.status !== 'rejected') setRetakeOf(undefined);
    setSent({ for: JSON.stringify(draft), jobId: target, outcome });
    setSending(false);
  };

  return {
    jobId,
    chosen,
    retakeOf,
    retaken,
    jobs,
    openJobs,
    mode,
    setMode,
    sending,
    send,
    /** What became of the reading sent for `draft`; null once it changed (a new reading). */
    doneFor: (draft: ReadingDraft): { jobId: number; outcome: ShownOutcome } | null => {
      if (sent?.for !== JSON.stringify(draft)) return null;
      if (sent.outcome.status !== 'queued') return sent;
      const fate = queue.fate(sent.outcome.key);
      return {
        jobId: follow(sent.jobId),
        outcome: fate.status === 'waiting' ? sent.outcome : fate,
      };
    },
  };
}
