/**
 * Editors' curation endpoints: CSV import (upload with progress → preview → commit),
 * template, column reference and export downloads, and spec create / edit / history / revert.
 */
import type { CreateSpecBody, RevertSpecBody, RevisionListDto, UpdateSpecBody } from '../contracts/curation';
import type { ColumnReferenceDto, ImportBatchSummaryDto, ImportPreviewDto } from '../contracts/imports';
import type { SpecDetailDto } from '../contracts/library';
import { ApiError, apiFetch, apiFetchBlob, query } from './client';
import { saveFile } from './save-file';
import { uploadFile, type UploadFile, type UploadProgress } from './upload';

export type PreviewPage = { offset?: number; limit?: number };

const json = (method: string, body: unknown) => ({ method, body: JSON.stringify(body) });

/** 201 with the dry-run preview; 422 (errors per line, `batchId` in the body) when the file cannot be read. */
export const uploadImport = (file: UploadFile, page: PreviewPage = {}, onProgress?: UploadProgress) =>
  uploadFile<ImportPreviewDto>(`/api/imports${query(page)}`, 'file', file, onProgress);
export const listImports = (limit = 10) => apiFetch<ImportBatchSummaryDto[]>(`/api/imports${query({ limit })}`);
export const getImport = (id: number, page: PreviewPage = {}) =>
  apiFetch<ImportPreviewDto>(`/api/imports/${id}${query(page)}`);
export const commitImport = (id: number, reason?: string) =>
  apiFetch<ImportBatchSummaryDto>(`/api/imports/${id}/commit`, json('POST', reason ? { reason } : {}));
export const getColumnReference = () => apiFetch<ColumnReferenceDto>('/api/imports/columns');

export async function downloadTemplate(): Promise<void> {
  await saveFile(await apiFetchBlob('/api/imports/template.csv', 'text/csv'), 'spec-template.csv');
}

/** The published library (or one make) in the import format, saved with the session's token. */
export async function downloadExport(make?: string): Promise<void> {
  const blob = await apiFetchBlob(`/api/exports/specs.csv${query({ make: make?.trim() })}`, 'text/csv');
  const slug = make
    ?.trim()
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  await saveFile(blob, `specbench-specs${slug ? `-${slug}` : ''}.csv`);
}

export const createSpec = (body: CreateSpecBody) => apiFetch<SpecDetailDto>('/api/specs', json('POST', body));
/** 409 `conflict` with the spec as it is now in `current` when `version` is stale (see staleCurrent). */
export const updateSpec = (id: number, body: UpdateSpecBody) =>
  apiFetch<SpecDetailDto>(`/api/specs/${id}`, json('PATCH', body));
export const listRevisions = (id: number) => apiFetch<RevisionListDto>(`/api/specs/${id}/revisions`);
export const revertSpec = (id: number, body: RevertSpecBody) =>
  apiFetch<SpecDetailDto>(`/api/specs/${id}/revert`, json('POST', body));

/** The spec as it is now, from a 409 on a stale edit or revert; null for any other failure. */
export function staleCurrent(err: unknown): SpecDetailDto | null {
  if (!(err instanceof ApiError) || err.status !== 409) return null;
  const current = err.body.current as SpecDetailDto | undefined;
  return current && typeof current.id === 'number' ? current : null;
}
