import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { WalkDetail, WalkFinish, WalkList, WalkStart, WalkStepAnswer, WalkSummary } from '@/shared/schemas/walks';
import type { WalkSource } from '@/components/walk/walk-source';
import { api } from './api-client';
import { jobKeys } from './use-jobs';
import { uploadWalkPhoto } from './use-photos';

/** Query keys for walks. */
export const walkKeys = {
  all: ['walks'] as const,
  details: () => [...walkKeys.all, 'detail'] as const,
  detail: (id: number) => [...walkKeys.details(), id] as const,
  forJob: (jobId: number) => [...walkKeys.all, 'job', jobId] as const,
};

/** GET /api/walks/:id: the walk, its pinned tree, the replayed position, history and photos. */
export const walkOptions = (id: number) =>
  queryOptions({
    queryKey: walkKeys.detail(id),
    queryFn: () => api<WalkDetail>(`/walks/${id}`),
    enabled: Number.isSafeInteger(id) && id > 0,
    // The server is the source of truth: a second device may have moved the walk on.
    staleTime: 0,
    refetchOnWindowFocus: true,
  });

/** GET /api/jobs/:id/walks. */
export const jobWalksOptions = (jobId: number) =>
  queryOptions({
    queryKey: walkKeys.forJob(jobId),
    queryFn: async () => (await api<WalkList>(`/jobs/${jobId}/walks`)).items,
    enabled: Number.isSafeInteger(jobId) && jobId > 0,
  });

export const useWalk = (id: number) => useQuery(walkOptions(id));
export const useJobWalks = (jobId: number) => useQuery(jobWalksOptions(jobId));

/** POST /api/walks: start a walk on a job. */
export function useStartWalk() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: WalkStart) => api<{ walk: WalkSummary }>('/walks', { method: 'POST', json: input }),
    onSuccess: (_a, input) => {
      void client.invalidateQueries({ queryKey: walkKeys.forJob(input.jobId) });
      void client.invalidateQueries({ queryKey: jobKeys.all });
    },
  });
}

/** The staff walk screen's data source: the walk query plus its step, undo, finish and photo calls. */
export function useStaffWalkSource(id: number): WalkSource {
  const client = useQueryClient();
  const walk = useWalk(id);
  const refresh = async () => {
    await client.invalidateQueries({ queryKey: walkKeys.detail(id) });
    const jobId = client.getQueryData<WalkDetail>(walkKeys.detail(id))?.walk.jobId;
    if (jobId) void client.invalidateQueries({ queryKey: walkKeys.forJob(jobId) });
    void client.invalidateQueries({ queryKey: jobKeys.lists() });
  };
  const post = async <T>(path: string, json: unknown) => {
    const answer = await api<T>(path, { method: 'POST', json });
    await refresh();
    return answer;
  };
  return {
    data: walk.data,
    // isLoading, not isPending: an address that names no walk never fetches, and must not spin for ever.
    isLoading: walk.isLoading,
    error: walk.error,
    refetch: () => void walk.refetch(),
    sendStep: (input) => post<WalkStepAnswer>(`/walks/${id}/steps`, input),
    undo: (stepId) => post<WalkStepAnswer>(`/walks/${id}/undo`, { stepId }),
    finish: (input: WalkFinish) => post<WalkDetail>(`/walks/${id}/finish`, input),
    uploadPhoto: async (file, step, onProgress) => {
      const photo = await uploadWalkPhoto(id, file, step, onProgress);
      await refresh();
      return photo;
    },
    removePhoto: async (photoId) => {
      await api<void>(`/walks/${id}/photos/${photoId}`, { method: 'DELETE' });
      await refresh();
    },
    links: {
      report: `/walks/${id}/report`,
      pdf: `/api/walks/${id}/report.pdf`,
      job: walk.data?.walk.jobId ? `/jobs/${walk.data.walk.jobId}` : null,
    },
  };
}
