import { useInfiniteQuery } from '@tanstack/react-query';
import { auditPageSchema } from '@/shared/api/audit';
import { apiBaseUrl, apiGet } from './client';

export const auditQueryKey = ['audit'] as const;

/** `GET /api/audit` (admins): the team's audit trail, newest first, 50 events a page; older pages on demand. */
export function useAuditTrail(enabled = true) {
  return useInfiniteQuery({
    queryKey: auditQueryKey,
    enabled,
    queryFn: ({ signal, pageParam }) =>
      apiGet(`/api/audit?limit=50${pageParam ? `&before=${encodeURIComponent(pageParam)}` : ''}`, auditPageSchema, { signal }),
    initialPageParam: '',
    getNextPageParam: (last) => last.next ?? undefined,
  });
}

/** `GET /api/audit/export.csv` (admins): the whole trail as CSV; the download itself is recorded too. */
export const auditCsvUrl = (): string => `${apiBaseUrl()}/api/audit/export.csv`;
