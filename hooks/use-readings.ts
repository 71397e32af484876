import { useMutation } from '@tanstack/react-query';
import type { ReadingsCheckAnswer, ReadingsCheckRequest } from '@/shared/schemas/readings';
import { api } from './api-client';

/** Query keys for the readings resource (the check itself is not cached; saved readings will live here). */
export const readingsKeys = {
  all: ['readings'] as const,
  check: () => [...readingsKeys.all, 'check'] as const,
};

/** POST /api/readings/check: the authoritative judgement from the server (the screen computes the same live). */
export function useReadingsCheck() {
  return useMutation({
    mutationKey: readingsKeys.check(),
    mutationFn: (input: ReadingsCheckRequest) => api<ReadingsCheckAnswer>('/readings/check', { method: 'POST', json: input }),
  });
}
