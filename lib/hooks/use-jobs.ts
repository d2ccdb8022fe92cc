/** Job sheets: TanStack Query hooks and their keys. Mutations refresh what they change. */
import {
  keepPreviousData,
  skipToken,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import { downloadReadingsCsv, getJob, listJobs, updateJob, type JobsFilter } from '../api/jobs';
import type { JobDetailDto, UpdateJobBody } from '../contracts/jobs';

export const JOBS_KEY = ['jobs'] as const;
export const JOB_KEY = ['job'] as const;
/** Not a server answer: the job this device last added a reading to, per user, for this visit. */
export const LAST_JOB_KEY = ['last-job'] as const;

/** After a reading lands or a job changes: the sheet and the lists (their counts) are stale. */
export function invalidateJob(qc: QueryClient, jobId: number) {
  return Promise.all([
    qc.invalidateQueries({ queryKey: [...JOB_KEY, jobId] }),
    qc.invalidateQueries({ queryKey: JOBS_KEY }),
  ]);
}

const jobsKey = (status: JobsFilter['status'], q: string) => [...JOBS_KEY, status ?? 'all', q] as const;

/** Fetches the open jobs into the cache (kept on the device), unless a fresh copy is there. */
export function prefetchOpenJobs(qc: QueryClient) {
  return qc.prefetchQuery({ queryKey: jobsKey('open', ''), queryFn: () => listJobs({ status: 'open' }) });
}

export function useJobsQuery(filter: JobsFilter, enabled = true) {
  const q = filter.q?.trim() ?? '';
  return useQuery({
    queryKey: jobsKey(filter.status, q),
    queryFn: () => listJobs({ status: filter.status, q: q || undefined }),
    enabled,
    placeholderData: keepPreviousData,
  });
}

/** One job sheet; no request while `id` is null (no job chosen yet) or not a job number. */
export function useJobQuery(id: number | null, enabled = true) {
  const valid = id !== null && Number.isInteger(id) && id > 0;
  return useQuery({
    queryKey: [...JOB_KEY, id],
    queryFn: id === null ? skipToken : () => getJob(id),
    enabled: enabled && valid,
  });
}

/**
 * The job the signed-in user last added a reading to on this device, in this visit (the
 * next reading most likely belongs to it too), and how to remember a new one. Kept in the
 * query cache, never fetched, so every "Add to job" panel sees the same memory.
 */
export function useLastJob(userId: number | undefined) {
  const qc = useQueryClient();
  const queryKey = [...LAST_JOB_KEY, userId ?? null];
  const last = useQuery<number | null>({
    queryKey,
    queryFn: skipToken,
    initialData: null,
    staleTime: Infinity,
    gcTime: Infinity,
  });
  return [last.data ?? null, (jobId: number) => qc.setQueryData(queryKey, jobId)] as const;
}

/** A job the server answered with: its sheet goes in the cache, the lists are stale. */
export function storeJob(qc: QueryClient, job: JobDetailDto) {
  qc.setQueryData([...JOB_KEY, job.id], job);
  return qc.invalidateQueries({ queryKey: JOBS_KEY });
}

function useStoreJob() {
  const qc = useQueryClient();
  return (job: JobDetailDto) => storeJob(qc, job);
}

export function useUpdateJobMutation() {
  const store = useStoreJob();
  return useMutation({
    mutationFn: ({ id, ...body }: UpdateJobBody & { id: number }) => updateJob(id, body),
    onSuccess: store,
  });
}

export function useDownloadCsvMutation() {
  return useMutation({ mutationFn: downloadReadingsCsv });
}
