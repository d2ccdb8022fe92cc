import type { CorrectionDto, CorrectionReviewDto, EditProposalBody, ProposeBody } from '../contracts/corrections';
import { apiFetch, query } from './client';

export type CorrectionSummary = { pendingForReview: number | null; myPending: number; myRecentDecisions: number };
export type CorrectionFilter = { status?: CorrectionDto['status']; mine?: boolean; make?: string; modelId?: number };

const json = (method: string, body: unknown) => ({ method, body: JSON.stringify(body) });

export const proposeCorrection = (body: ProposeBody) =>
  apiFetch<CorrectionReviewDto>('/api/corrections', json('POST', body));
export const listCorrections = (f: CorrectionFilter) =>
  apiFetch<CorrectionDto[]>(
    `/api/corrections${query({ status: f.status, mine: f.mine ? 'true' : undefined, make: f.make, modelId: f.modelId })}`,
  );
export const correctionSummary = () => apiFetch<CorrectionSummary>('/api/corrections/summary');
export const getCorrection = (id: number) => apiFetch<CorrectionReviewDto>(`/api/corrections/${id}`);
export const editCorrection = (id: number, body: EditProposalBody) =>
  apiFetch<CorrectionReviewDto>(`/api/corrections/${id}`, json('PATCH', body));
export const withdrawCorrection = (id: number) =>
  apiFetch<CorrectionReviewDto>(`/api/corrections/${id}/withdraw`, { method: 'POST' });
export const acceptCorrection = (id: number, body: { confirmStale?: boolean; note?: string }) =>
  apiFetch<CorrectionReviewDto>(`/api/corrections/${id}/accept`, json('POST', body));
export const rejectCorrection = (id: number, note: string) =>
  apiFetch<CorrectionReviewDto>(`/api/corrections/${id}/reject`, json('POST', { note }));
