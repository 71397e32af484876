import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** The app's QueryClient: no retries on 4xx (a person must act), a few on network or 5xx. */
export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 15_000,
        retry: (count, error) => {
          if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
          return count < 2;
        },
      },
      mutations: { retry: false },
    },
  });
}
