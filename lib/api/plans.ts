/** Test plans and plan runs: one typed function per endpoint of /api/plans and /api/jobs/:jobId/runs. */
import type {
  PlanBody,
  PlanDto,
  PlanFile,
  PlanRevisionDto,
  PlansQuery,
  PlanSummaryDto,
  RunAnswerDto,
  RunDto,
  RunResultBody,
  UpdatePlanBody,
} from '../contracts/plans';
import { apiFetch, query } from './client';

export const listPlans = (filter: PlansQuery = {}) => apiFetch<PlanSummaryDto[]>(`/api/plans${query(filter)}`);
export const getPlan = (id: number) => apiFetch<PlanDto>(`/api/plans/${id}`);
export const createPlan = (body: PlanBody) =>
  apiFetch<PlanDto>('/api/plans', { method: 'POST', body: JSON.stringify(body) });
export const updatePlan = (id: number, body: UpdatePlanBody) =>
  apiFetch<PlanDto>(`/api/plans/${id}`, { method: 'PATCH', body: JSON.stringify(body) });
export const planRevisions = (id: number) => apiFetch<PlanRevisionDto[]>(`/api/plans/${id}/revisions`);
export const exportPlans = () => apiFetch<PlanFile>('/api/plans/export.json');
export const importPlans = (file: unknown) =>
  apiFetch<{ created: number; updated: number; unchanged: number; connectors: number }>('/api/plans/import', {
    method: 'POST',
    body: JSON.stringify(file),
  });

export const listRuns = (jobId: number) => apiFetch<RunDto[]>(`/api/jobs/${jobId}/runs`);
export const getRun = (jobId: number, runId: number) => apiFetch<RunDto>(`/api/jobs/${jobId}/runs/${runId}`);
export const startRun = (jobId: number, planId: number) =>
  apiFetch<RunDto>(`/api/jobs/${jobId}/runs`, { method: 'POST', body: JSON.stringify({ planId }) });
/** 201 for a new result, 200 when the key was seen before: either way the stored answer comes back. */
export const answerStep = (jobId: number, runId: number, body: RunResultBody, idempotencyKey: string) =>
  apiFetch<RunAnswerDto>(`/api/jobs/${jobId}/runs/${runId}/results`, {
    method: 'POST',
    body: JSON.stringify(body),
    headers: { 'Idempotency-Key': idempotencyKey },
  });
export const stepBack = (jobId: number, runId: number) =>
  apiFetch<RunDto>(`/api/jobs/${jobId}/runs/${runId}/back`, { method: 'POST', body: '{}' });
