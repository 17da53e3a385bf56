import { useMutation, useQueries, useQuery, useQueryClient } from '@tanstack/react-query';
import { moduleResponseSchema, modulesResponseSchema, type ModuleCsvVersus, type ModuleInput } from '@/shared/api/modules';
import { apiBaseUrl, apiCommand, apiGet, apiSend } from './client';

export const modulesQueryKey = ['modules'] as const;
export const moduleDetailKey = (id: string) => [...modulesQueryKey, 'detail', id] as const;

const modulePath = (id: string) => `/api/modules/${encodeURIComponent(id)}`;

/** `GET /api/modules`: the team's saved couples and modules. */
export function useModules() {
  return useQuery({
    queryKey: [...modulesQueryKey, 'list'],
    queryFn: ({ signal }) => apiGet('/api/modules', modulesResponseSchema, { signal }),
  });
}

const moduleDetailQuery = (id: string) => ({
  enabled: id.length > 0,
  queryKey: moduleDetailKey(id),
  queryFn: ({ signal }: { signal: AbortSignal }) => apiGet(modulePath(id), moduleResponseSchema, { signal }),
});

/** `GET /api/modules/:id`: the saved input and the resolved engine case. */
export function useModuleDetail(id: string) {
  return useQuery(moduleDetailQuery(id));
}

/** Several modules at once (the comparison). */
export function useModuleDetails(ids: readonly string[]) {
  return useQueries({ queries: ids.map(moduleDetailQuery) });
}

export type SaveModuleVariables = { id: string | null; body: ModuleInput };

/** `POST /api/modules` (new) or `PUT /api/modules/:id`; 400 answers name the field. */
export function useSaveModule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: SaveModuleVariables) =>
      id === null ? apiSend('POST', '/api/modules', { json: body }, moduleResponseSchema) : apiSend('PUT', modulePath(id), { json: body }, moduleResponseSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: modulesQueryKey }),
  });
}

/** `DELETE /api/modules/:id`: the module goes; the runs and families it was built from stay. */
export function useDeleteModule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiCommand('DELETE', modulePath(id), { none: true }),
    onSuccess: (_data, id) => {
      queryClient.removeQueries({ queryKey: moduleDetailKey(id) });
      return queryClient.invalidateQueries({ queryKey: modulesQueryKey });
    },
  });
}

/** `GET /api/modules/:id/curves.csv`: the module's curve versus current (or versus ΔT) as CSV. */
export function moduleCsvUrl(id: string, versus: ModuleCsvVersus = 'current'): string {
  return `${apiBaseUrl()}${modulePath(id)}/curves.csv${versus === 'current' ? '' : `?versus=${versus}`}`;
}
