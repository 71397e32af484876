import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TreeStatsAnswer } from '@/shared/schemas/tree-authoring';
import { api } from './api-client';

/** Query keys for step statistics. */
export const treeStatsKeys = {
  all: ['tree-stats'] as const,
  tree: (treeId: number) => [...treeStatsKeys.all, treeId] as const,
  version: (treeId: number, versionId?: number) => [...treeStatsKeys.tree(treeId), versionId ?? 'all'] as const,
};

/** GET /api/trees/:id/stats: answers, verdicts, causes and endings from the shop's finished walks. */
export const treeStatsOptions = (treeId: number, versionId?: number) =>
  queryOptions({
    queryKey: treeStatsKeys.version(treeId, versionId),
    queryFn: () => api<TreeStatsAnswer>(`/trees/${treeId}/stats${versionId ? `?version=${versionId}` : ''}`),
    enabled: treeId > 0,
  });

export const useTreeStats = (treeId: number, versionId?: number) => useQuery(treeStatsOptions(treeId, versionId));
