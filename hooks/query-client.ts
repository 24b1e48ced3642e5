import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** The app's one QueryClient. Client errors (4xx) are not retried; a lost signal is, briefly. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: (failureCount, error) => error instanceof ApiError && error.kind === 'network' && failureCount < 1,
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
}
