/** Job sheets: one typed function per endpoint of /api/jobs. */
import type {
  CreateJobBody,
  JobDetailDto,
  JobSummaryDto,
  ReadingBody,
  ReadingDto,
  UpdateJobBody,
} from '../contracts/jobs';
import { apiFetch, apiFetchBlob, query } from './client';
import { saveFile } from './save-file';

export type JobsFilter = { q?: string; status?: 'open' | 'closed' };

export const listJobs = (filter: JobsFilter = {}) => apiFetch<JobSummaryDto[]>(`/api/jobs${query(filter)}`);
export const getJob = (id: number) => apiFetch<JobDetailDto>(`/api/jobs/${id}`);
/** 201 for a new job, 200 when the key was seen before (a job queued offline, resent). */
export const createJob = (body: CreateJobBody, idempotencyKey: string) =>
  apiFetch<JobDetailDto>('/api/jobs', {
    method: 'POST',
    body: JSON.stringify(body),
    headers: { 'Idempotency-Key': idempotencyKey },
  });
export const updateJob = (id: number, body: UpdateJobBody) =>
  apiFetch<JobDetailDto>(`/api/jobs/${id}`, { method: 'PATCH', body: JSON.stringify(body) });

/** 201 for a new reading, 200 when the key was seen before: either way the stored reading comes back. */
export const addReading = (jobId: number, body: ReadingBody, idempotencyKey: string) =>
  apiFetch<ReadingDto>(`/api/jobs/${jobId}/readings`, {
    method: 'POST',
    body: JSON.stringify(body),
    headers: { 'Idempotency-Key': idempotencyKey },
  });

/** Fetches the readings CSV with the session's token and saves it on the device. */
export async function downloadReadingsCsv(jobId: number): Promise<void> {
  const blob = await apiFetchBlob(`/api/jobs/${jobId}/readings.csv`, 'text/csv');
  await saveFile(blob, `job-${jobId}-readings.csv`);
}
