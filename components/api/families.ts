import { useQuery } from '@tanstack/react-query';
import { familiesResponseSchema } from '@/shared/api/families';
import { apiGet } from './client';

export const familiesQueryKey = ['families'] as const;

/** `GET /api/families`: the team and its material families. */
export function useFamilies() {
  return useQuery({
    queryKey: familiesQueryKey,
    queryFn: ({ signal }) => apiGet('/api/families', familiesResponseSchema, { signal }),
  });
}
