/** Job sheets: TanStack Query hooks and their keys. Mutations refresh what they change. */
import { keepPreviousData, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { createJob, downloadReadingsCsv, getJob, listJobs, updateJob, type JobsFilter } from '../api/jobs';
import type { JobDetailDto, UpdateJobBody } from '../contracts/jobs';

export const JOBS_KEY = ['jobs'] as const;
export const JOB_KEY = ['job'] as const;

/** After a reading lands or a job changes: the sheet and the lists (their counts) are stale. */
export function invalidateJob(qc: QueryClient, jobId: number) {
  return Promise.all([
    qc.invalidateQueries({ queryKey: [...JOB_KEY, jobId] }),
    qc.invalidateQueries({ queryKey: JOBS_KEY }),
  ]);
}

export function useJobsQuery(filter: JobsFilter, enabled = true) {
  const q = filter.q?.trim() ?? '';
  return useQuery({
    queryKey: [...JOBS_KEY, filter.status ?? 'all', q],
    queryFn: () => listJobs({ status: filter.status, q: q || undefined }),
    enabled,
    placeholderData: keepPreviousData,
  });
}

export function useJobQuery(id: number, enabled = true) {
  return useQuery({
    queryKey: [...JOB_KEY, id],
    queryFn: () => getJob(id),
    enabled: enabled && Number.isInteger(id) && id > 0,
  });
}

function useStoreJob() {
  const qc = useQueryClient();
  return (job: JobDetailDto) => {
    qc.setQueryData([...JOB_KEY, job.id], job);
    return qc.invalidateQueries({ queryKey: JOBS_KEY });
  };
}

export function useCreateJobMutation() {
  const store = useStoreJob();
  return useMutation({ mutationFn: createJob, onSuccess: store });
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
