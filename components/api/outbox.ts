import { useQuery } from '@tanstack/react-query';
import { outboxResponseSchema, type OutboxMessage } from '@/shared/api/outbox';
import { apiGet } from './client';

export const outboxQueryKey = ['outbox'] as const;

function newestFirst(messages: OutboxMessage[]): OutboxMessage[] {
  return [...messages].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}

/** `GET /api/outbox`: captured e-mail, newest first (development only). */
export function useOutbox() {
  return useQuery({
    queryKey: outboxQueryKey,
    queryFn: async ({ signal }) => {
      const data = await apiGet('/api/outbox', outboxResponseSchema, { signal });
      return newestFirst(data.messages);
    },
    refetchInterval: 15_000,
  });
}
