import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { meQueryKey } from './auth';
import { ApiError } from './client';

const maxRetries = 2;

/** Retry network trouble and 5xx a couple of times, never a 4xx. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.isClientError) return false;
  return failureCount < maxRetries;
}

export function createQueryClient(): QueryClient {
  // A 401 anywhere means the session ended (signed out elsewhere, password
  // reset, member removed): the session becomes "nobody", and the auth gate
  // takes the page to the sign-in screen.
  const onError = (error: unknown) => {
    if (error instanceof ApiError && error.status === 401) client.setQueryData(meQueryKey, null);
  };
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000 },
    },
  });
  return client;
}
