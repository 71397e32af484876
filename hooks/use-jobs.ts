import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { JobAnswer, JobInput, JobList, JobListQuery } from '@/shared/schemas/jobs';
import { api } from './api-client';

/** Query keys for jobs. */
export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (query: JobListQuery) => [...jobKeys.lists(), query] as const,
  details: () => [...jobKeys.all, 'detail'] as const,
  detail: (id: number) => [...jobKeys.details(), id] as const,
};

/** The path for a list query, leaving out empty parts. */
export function jobListPath(query: JobListQuery): string {
  const params = new URLSearchParams();
  if (query.q?.trim()) params.set('q', query.q.trim());
  if (query.page && query.page > 1) params.set('page', String(query.page));
  if (query.pageSize) params.set('pageSize', String(query.pageSize));
  const qs = params.toString();
  return qs ? `/jobs?${qs}` : '/jobs';
}

/** GET /api/jobs: search by RO, VIN or customer; open walks first; paged. */
export const jobsOptions = (query: JobListQuery = {}) =>
  queryOptions({
    queryKey: jobKeys.list(query),
    queryFn: () => api<JobList>(jobListPath(query)),
    placeholderData: keepPreviousData,
  });

/** GET /api/jobs/:id. */
export const jobOptions = (id: number) =>
  queryOptions({
    queryKey: jobKeys.detail(id),
    queryFn: async () => (await api<JobAnswer>(`/jobs/${id}`)).job,
    enabled: Number.isSafeInteger(id) && id > 0,
  });

export const useJobs = (query: JobListQuery = {}) => useQuery(jobsOptions(query));
export const useJob = (id: number) => useQuery(jobOptions(id));

/** POST /api/jobs. */
export function useCreateJob() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: JobInput) => api<JobAnswer>('/jobs', { method: 'POST', json: input }),
    onSuccess: (answer) => {
      client.setQueryData(jobKeys.detail(answer.job.id), answer.job);
      void client.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}

/** PUT /api/jobs/:id. */
export function useUpdateJob(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: JobInput) => api<JobAnswer>(`/jobs/${id}`, { method: 'PUT', json: input }),
    onSuccess: (answer) => {
      client.setQueryData(jobKeys.detail(id), answer.job);
      void client.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
