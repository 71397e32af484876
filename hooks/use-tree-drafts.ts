import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  Draft,
  DraftSave,
  DraftSaved,
  Imported,
  Published,
  PublishInput,
  RetiredTrees,
  TreeCreate,
  TreeImport,
  VersionDiff,
} from '@/shared/schemas/tree-authoring';
import type { TreeVersionInfo } from '@/shared/schemas/trees';
import { ApiError, api } from './api-client';
import { treeKeys } from './use-trees';
import { treeStatsKeys } from './use-tree-stats';

/** A version as the history lists it (who wrote and who published it). */
export type HistoryVersion = TreeVersionInfo & { publishedBy: string | null; updatedBy: string | null; updatedAt: string | null };
export interface TreeHistory {
  tree: { id: number; title: string; slug: string; status: 'active' | 'retired'; publishedVersionId: number | null };
  versions: HistoryVersion[];
}

/** Query keys for tree authoring: drafts, history, differences, retired trees. */
export const draftKeys = {
  all: ['tree-authoring'] as const,
  draft: (treeId: number) => [...draftKeys.all, 'draft', treeId] as const,
  history: (treeId: number) => [...draftKeys.all, 'history', treeId] as const,
  diff: (treeId: number, from: number, to: number) => [...draftKeys.all, 'diff', treeId, from, to] as const,
  retired: () => [...draftKeys.all, 'retired'] as const,
};

/** GET /api/trees/:id/draft; a tree without a draft answers 404, which is not worth retrying. */
export const draftOptions = (treeId: number) =>
  queryOptions({
    queryKey: draftKeys.draft(treeId),
    queryFn: () => api<Draft>(`/trees/${treeId}/draft`),
    enabled: treeId > 0,
    retry: (n, err) => !(err instanceof ApiError && err.status === 404) && n < 2,
    // The editor holds its own copy while open; refetching behind its back would look like lost typing.
    refetchOnWindowFocus: false,
    staleTime: Infinity,
  });

export const historyOptions = (treeId: number) =>
  queryOptions({ queryKey: draftKeys.history(treeId), queryFn: () => api<TreeHistory>(`/trees/${treeId}/history`), enabled: treeId > 0 });

export const diffOptions = (treeId: number, from: number, to: number) =>
  queryOptions({
    queryKey: draftKeys.diff(treeId, from, to),
    queryFn: () => api<VersionDiff>(`/trees/${treeId}/diff?from=${from}&to=${to}`),
    enabled: treeId > 0 && from > 0 && to > 0,
    staleTime: Infinity, // versions other than a draft never change; a draft's key changes with saves via invalidation
  });

export const retiredOptions = () => queryOptions({ queryKey: draftKeys.retired(), queryFn: () => api<RetiredTrees>('/retired-trees') });

export const useDraft = (treeId: number) => useQuery(draftOptions(treeId));
export const useTreeHistory = (treeId: number) => useQuery(historyOptions(treeId));
export const useVersionDiff = (treeId: number, from: number, to: number) => useQuery(diffOptions(treeId, from, to));
export const useRetiredTrees = (enabled = true) => useQuery({ ...retiredOptions(), enabled });

/** Where the export of a tree downloads from (a plain GET, so a link works). */
export const exportUrl = (treeId: number, version?: number) => `/api/trees/${treeId}/export${version ? `?version=${version}` : ''}`;

/** Everything about one tree that an authoring change can make stale. */
function useTreeInvalidation() {
  const client = useQueryClient();
  return (treeId: number) =>
    Promise.all([
      client.invalidateQueries({ queryKey: treeKeys.all }),
      client.invalidateQueries({ queryKey: draftKeys.history(treeId) }),
      client.invalidateQueries({ queryKey: draftKeys.retired() }),
      client.invalidateQueries({ queryKey: treeStatsKeys.tree(treeId) }),
    ]);
}

/** POST /api/trees: a new tree, answered with its first draft. */
export function useCreateTree() {
  const client = useQueryClient();
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: (input: TreeCreate) => api<Draft>('/trees', { method: 'POST', json: input }),
    onSuccess: (draft) => {
      client.setQueryData(draftKeys.draft(draft.treeId), draft);
      return invalidate(draft.treeId);
    },
  });
}

/** POST /api/trees/:id/draft: a new draft copied from the published version. */
export function useStartDraft(treeId: number) {
  const client = useQueryClient();
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: () => api<Draft>(`/trees/${treeId}/draft`, { method: 'POST' }),
    onSuccess: (draft) => {
      client.setQueryData(draftKeys.draft(treeId), draft);
      return invalidate(treeId);
    },
  });
}

/**
 * PUT /api/trees/:id/draft with the revision it was based on. The editor
 * keeps the draft in its own state, so a save does not refetch the draft.
 */
export function useSaveDraft(treeId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: DraftSave & { keepalive?: boolean }) => {
      const { keepalive, ...json } = input;
      return api<DraftSaved>(`/trees/${treeId}/draft`, { method: 'PUT', json, keepalive });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: draftKeys.history(treeId) }),
  });
}

/** DELETE /api/trees/:id/draft. */
export function useDiscardDraft(treeId: number) {
  const client = useQueryClient();
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: () => api<void>(`/trees/${treeId}/draft`, { method: 'DELETE' }),
    onSuccess: () => {
      client.removeQueries({ queryKey: draftKeys.draft(treeId) });
      return invalidate(treeId);
    },
  });
}

/** POST /api/trees/:id/publish. */
export function usePublishDraft(treeId: number) {
  const client = useQueryClient();
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: (input: PublishInput) => api<Published>(`/trees/${treeId}/publish`, { method: 'POST', json: input }),
    onSuccess: () => {
      client.removeQueries({ queryKey: draftKeys.draft(treeId) });
      return invalidate(treeId);
    },
  });
}

/** POST /api/trees/:id/retire or /restore. */
export function useTreeStatus(treeId: number) {
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: (status: 'retired' | 'active') =>
      api<{ status: string }>(`/trees/${treeId}/${status === 'retired' ? 'retire' : 'restore'}`, { method: 'POST' }),
    onSuccess: () => invalidate(treeId),
  });
}

/** POST /api/trees/import: a tree file becomes a draft (refusals carry the validator's findings in `details`). */
export function useImportTree() {
  const client = useQueryClient();
  const invalidate = useTreeInvalidation();
  return useMutation({
    mutationFn: (input: TreeImport) => api<Imported>('/trees/import', { method: 'POST', json: input }),
    onSuccess: (answer) => {
      client.removeQueries({ queryKey: draftKeys.draft(answer.treeId) });
      return invalidate(answer.treeId);
    },
  });
}
