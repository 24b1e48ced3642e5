import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';
import { installConnectionTracking } from './connection';

/** The app's one QueryClient. Client errors (4xx) are not retried; a lost signal is, briefly, once it returns. */
export function createQueryClient(): QueryClient {
  // Queries pause (not spin) while the server is out of reach and resume when it is back.
  installConnectionTracking();
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: (failureCount, error) => error instanceof ApiError && error.kind === 'network' && failureCount < 1,
        refetchOnWindowFocus: false,
      },
      // A save with no signal fails at once with words, instead of waiting paused with a spinner.
      mutations: { retry: false, networkMode: 'always' },
    },
  });
}
