import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { coolerResponseSchema, coolersResponseSchema, type CoolerInput, type CoolerKind } from '@/shared/api/coolers';
import { apiBaseUrl, apiCommand, apiGet, apiSend } from './client';
import { runEnvelopeSchema, runsQueryKey } from './runs';

/** Every coolers query starts with this key, so one invalidation refreshes them all. */
export const coolersQueryKey = ['coolers'] as const;
export const coolerDetailKey = (id: string) => [...coolersQueryKey, 'detail', id] as const;

const coolerPath = (id: string) => `/api/coolers/${encodeURIComponent(id)}`;

/** `GET /api/coolers`: the team's cascades and matched couples, newest first, each with its latest run. */
export function useCoolers() {
  return useQuery({
    queryKey: [...coolersQueryKey, 'list'],
    queryFn: ({ signal }) => apiGet('/api/coolers', coolersResponseSchema, { signal }),
  });
}

/** `GET /api/coolers/:id`: the saved setup and its resolved engine case. */
export function useCooler(id: string) {
  return useQuery({
    enabled: id.length > 0,
    queryKey: coolerDetailKey(id),
    queryFn: ({ signal }) => apiGet(coolerPath(id), coolerResponseSchema, { signal }),
  });
}

export type SaveCoolerVariables = { id: string | null; body: CoolerInput };

/** `POST /api/coolers` (new) or `PUT /api/coolers/:id`; a 400 names the field (`stages.1.couples`, `p.designId`). */
export function useSaveCooler() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: SaveCoolerVariables) =>
      id === null ? apiSend('POST', '/api/coolers', { json: body }, coolerResponseSchema) : apiSend('PUT', coolerPath(id), { json: body }, coolerResponseSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: coolersQueryKey }),
  });
}

/** `DELETE /api/coolers/:id` (admins): the setup goes and its finished runs with it; refused while one is queued or running. */
export function useDeleteCooler() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiCommand('DELETE', coolerPath(id), { none: true }),
    onSuccess: (_data, id) => {
      queryClient.removeQueries({ queryKey: coolerDetailKey(id) });
      // Its runs went with it: the run lists must not offer them.
      void queryClient.invalidateQueries({ queryKey: runsQueryKey });
      return queryClient.invalidateQueries({ queryKey: coolersQueryKey });
    },
  });
}

/** `POST /api/coolers/:id/runs`: queued like a leg run (same team limits and fair share). */
export function useLaunchCooler() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (coolerId: string) => apiSend('POST', `${coolerPath(coolerId)}/runs`, { none: true }, runEnvelopeSchema),
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: runsQueryKey }), queryClient.invalidateQueries({ queryKey: coolersQueryKey })]),
  });
}

/** Download address of a finished cooler run's CSV: the stage table and curves, or the couple and its legs' profiles. */
export function coolerCsvUrl(runId: string, kind: CoolerKind): string {
  return `${apiBaseUrl()}/api/runs/${encodeURIComponent(runId)}/${kind}.csv`;
}
