import { useQuery } from '@tanstack/react-query';
import { familiesResponseSchema, familyDetailResponseSchema } from '@/shared/api/families';
import { apiBaseUrl, apiGet } from './client';

/** Every families query starts with this key, so one invalidation refreshes them all. */
export const familiesQueryKey = ['families'] as const;

export type FamilyFilter = 'active' | 'archived';

export const familyListKey = (filter: FamilyFilter) => [...familiesQueryKey, 'list', filter] as const;
export const familyDetailKey = (id: string, version?: number) =>
  [...familiesQueryKey, 'detail', id, version ?? 'current'] as const;

/** `GET /api/families` (active) or `?archived=1` (archived only). */
export function useFamilies(filter: FamilyFilter = 'active', o: { enabled?: boolean } = {}) {
  const path = filter === 'archived' ? '/api/families?archived=1' : '/api/families';
  return useQuery({
    enabled: o.enabled ?? true,
    queryKey: familyListKey(filter),
    queryFn: ({ signal }) => apiGet(path, familiesResponseSchema, { signal }),
  });
}

function detailPath(id: string, version?: number): string {
  const base = `/api/families/${encodeURIComponent(id)}`;
  return version === undefined ? base : `${base}/versions/${version}`;
}

/** `GET /api/families/:id`, or one older version with `version`. */
export function useFamilyDetail(id: string, version?: number) {
  return useQuery({
    queryKey: familyDetailKey(id, version),
    queryFn: ({ signal }) => apiGet(detailPath(id, version), familyDetailResponseSchema, { signal }),
    enabled: id.length > 0,
  });
}

export type ExportFormat = 'csv' | 'json';

/** Download address of a family (one version of it) as CSV or as the engine's JSON. */
export function familyExportUrl(id: string, format: ExportFormat, version?: number): string {
  const query = version === undefined ? '' : `?version=${version}`;
  return `${apiBaseUrl()}/api/families/${encodeURIComponent(id)}/export.${format}${query}`;
}
