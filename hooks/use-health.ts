import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Health } from '@/shared/schemas/health';
import { api } from './api-client';

/** Query keys for the health resource. */
export const healthKeys = {
  all: ['health'] as const,
};

/** GET /api/health; a 503 still carries the health body, so it is read, not thrown. */
export const healthOptions = () =>
  queryOptions({
    queryKey: healthKeys.all,
    queryFn: () => api<Health>('/health', { acceptStatuses: [503] }),
    refetchInterval: 30_000,
  });

export const useHealth = () => useQuery(healthOptions());
