import type { HealthDto, ModelDetailDto, ModelSummaryDto, SearchResultDto, SpecDetailDto } from '../contracts/library';
import { apiFetch, query } from './client';

export const searchSpecs = (q: string, limit?: number) =>
  apiFetch<SearchResultDto>(`/api/search${query({ q, limit })}`);
export const listModels = (make?: string) => apiFetch<ModelSummaryDto[]>(`/api/models${query({ make })}`);
export const getModel = (id: number) => apiFetch<ModelDetailDto>(`/api/models/${id}`);
export const getSpec = (id: number) => apiFetch<SpecDetailDto>(`/api/specs/${id}`);
export const getHealth = () => apiFetch<HealthDto>('/api/health');
