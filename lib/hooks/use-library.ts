import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { getModel, getSpec, listModels, searchSpecs } from '../api/library';

export const SEARCH_KEY = ['search'] as const;
export const MODELS_KEY = ['models'] as const;
export const SPEC_KEY = ['spec'] as const;

export function useSearchQuery(q: string) {
  const text = q.trim();
  return useQuery({
    queryKey: [...SEARCH_KEY, text],
    queryFn: () => searchSpecs(text),
    enabled: text.length > 0,
    placeholderData: keepPreviousData,
  });
}

export function useModelsQuery() {
  return useQuery({ queryKey: MODELS_KEY, queryFn: () => listModels() });
}

export function useModelQuery(id: number) {
  return useQuery({
    queryKey: [...MODELS_KEY, id],
    queryFn: () => getModel(id),
    enabled: Number.isInteger(id) && id > 0,
  });
}

export function useSpecQuery(id: number) {
  return useQuery({ queryKey: [...SPEC_KEY, id], queryFn: () => getSpec(id), enabled: Number.isInteger(id) && id > 0 });
}
