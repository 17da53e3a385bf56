import { useQuery } from '@tanstack/react-query';
import { healthResponseSchema } from '@/shared/api/health';
import { apiGet } from './client';

export const healthQueryKey = ['health'] as const;

/** `GET /api/health`; a degraded server may answer 503 with the same body. */
export function useHealth() {
  return useQuery({
    queryKey: healthQueryKey,
    queryFn: ({ signal }) =>
      apiGet('/api/health', healthResponseSchema, { signal, acceptStatus: [503] }),
    refetchInterval: 20_000,
    staleTime: 5_000,
  });
}
