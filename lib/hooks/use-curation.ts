/**
 * TanStack Query hooks for the editors' curation: imports, spec writes, history, revert.
 * Every write refreshes what it can change: the spec cards (SPEC_KEY, which also holds
 * each spec's revision list), the model sheets (MODELS_KEY) and search results.
 */
import { useState } from 'react';
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  commitImport,
  createSpec,
  downloadExport,
  downloadTemplate,
  getColumnReference,
  getImport,
  listImports,
  listRevisions,
  revertSpec,
  updateSpec,
  uploadImport,
  type PreviewPage,
} from '../api/curation';
import type { UploadFile } from '../api/upload';
import type { RevertSpecBody, UpdateSpecBody } from '../contracts/curation';
import { COLUMN_REFERENCE } from '../csv';
import { useSession } from '../session/session-provider';
import { MODELS_KEY, SEARCH_KEY, SPEC_KEY } from './use-library';

export const IMPORTS_KEY = ['imports'] as const;
/** Rows per group on one page of the import preview. */
export const PREVIEW_PAGE_SIZE = 200;

const revisionsKey = (specId: number) => [...SPEC_KEY, specId, 'revisions'] as const;

function useInvalidateLibrary() {
  const qc = useQueryClient();
  return () =>
    Promise.all([SPEC_KEY, MODELS_KEY, SEARCH_KEY, IMPORTS_KEY].map((queryKey) => qc.invalidateQueries({ queryKey })));
}

export function useImportsQuery() {
  const { can } = useSession();
  return useQuery({ queryKey: [...IMPORTS_KEY, 'list'], queryFn: () => listImports(10), enabled: can('editor') });
}

export function useImportQuery(id: number | null, offset = 0) {
  const { can } = useSession();
  const page: PreviewPage = { offset, limit: PREVIEW_PAGE_SIZE };
  return useQuery({
    queryKey: [...IMPORTS_KEY, 'one', id, offset],
    queryFn: () => getImport(id!, page),
    enabled: id !== null && can('editor'),
    placeholderData: keepPreviousData,
  });
}

/** Upload → preview, with the upload's progress (0…1) while the bytes go up. */
export function useUploadImportMutation() {
  const qc = useQueryClient();
  const [progress, setProgress] = useState(0);
  const mutation = useMutation({
    mutationFn: (file: UploadFile) => {
      setProgress(0);
      return uploadImport(file, { offset: 0, limit: PREVIEW_PAGE_SIZE }, setProgress);
    },
    onSuccess: (preview) => {
      qc.setQueryData([...IMPORTS_KEY, 'one', preview.id, 0], preview);
      return qc.invalidateQueries({ queryKey: [...IMPORTS_KEY, 'list'] });
    },
    onError: () => qc.invalidateQueries({ queryKey: [...IMPORTS_KEY, 'list'] }),
  });
  return { ...mutation, progress };
}

export function useCommitImportMutation(id: number) {
  const invalidate = useInvalidateLibrary();
  return useMutation({ mutationFn: () => commitImport(id), onSettled: invalidate });
}

/** The column reference from the server; the shared table stands in until it answers. */
export function useColumnReferenceQuery() {
  return useQuery({
    queryKey: [...IMPORTS_KEY, 'columns'],
    queryFn: getColumnReference,
    placeholderData: COLUMN_REFERENCE,
    staleTime: Infinity,
  });
}

export function useDownloadTemplateMutation() {
  return useMutation({ mutationFn: downloadTemplate });
}

export function useExportMutation() {
  return useMutation({ mutationFn: (make?: string) => downloadExport(make) });
}

export function useCreateSpecMutation() {
  const invalidate = useInvalidateLibrary();
  return useMutation({ mutationFn: createSpec, onSuccess: invalidate });
}

export function useUpdateSpecMutation(id: number) {
  const invalidate = useInvalidateLibrary();
  return useMutation({ mutationFn: (body: UpdateSpecBody) => updateSpec(id, body), onSuccess: invalidate });
}

export function useRevisionsQuery(specId: number) {
  return useQuery({
    queryKey: revisionsKey(specId),
    queryFn: () => listRevisions(specId),
    enabled: Number.isInteger(specId) && specId > 0,
  });
}

export function useRevertMutation(specId: number) {
  const invalidate = useInvalidateLibrary();
  return useMutation({ mutationFn: (body: RevertSpecBody) => revertSpec(specId, body), onSettled: invalidate });
}
