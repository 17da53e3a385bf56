import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './client';

const maxRetries = 2;

/** Retry network trouble and 5xx a couple of times, never a 4xx. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.isClientError) return false;
  return failureCount < maxRetries;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000 },
    },
  });
}
