import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeDetail, TreeList, TreeListQuery } from '@/shared/schemas/trees';
import { api } from './api-client';

/** Query keys for the tree library. */
export const treeKeys = {
  all: ['trees'] as const,
  lists: () => [...treeKeys.all, 'list'] as const,
  list: (filter: TreeListQuery) => [...treeKeys.lists(), filter] as const,
  details: () => [...treeKeys.all, 'detail'] as const,
  detail: (id: number) => [...treeKeys.details(), id] as const,
};

/** The query string for a list filter, leaving out empty parts. */
export function treeListPath(filter: TreeListQuery): string {
  const params = new URLSearchParams();
  if (filter.symptom) params.set('symptom', filter.symptom);
  if (filter.installType) params.set('installType', filter.installType);
  if (filter.q?.trim()) params.set('q', filter.q.trim());
  const qs = params.toString();
  return qs ? `/trees?${qs}` : '/trees';
}

/** GET /api/trees with filters and text search. */
export const treesOptions = (filter: TreeListQuery = {}) =>
  queryOptions({
    queryKey: treeKeys.list(filter),
    queryFn: () => api<TreeList>(treeListPath(filter)),
    // Keep the last list on screen while a new search runs, so results do not flash away.
    placeholderData: keepPreviousData,
  });

/** GET /api/trees/:id: the tree, its published version, steps and causes. */
export const treeOptions = (id: number) =>
  queryOptions({
    queryKey: treeKeys.detail(id),
    queryFn: () => api<TreeDetail>(`/trees/${id}`),
    enabled: Number.isSafeInteger(id) && id > 0,
  });

export const useTrees = (filter: TreeListQuery = {}) => useQuery(treesOptions(filter));
export const useTree = (id: number) => useQuery(treeOptions(id));
