import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { designResponseSchema, designsResponseSchema, type DesignInput } from '@/shared/api/designs';
import { apiGet, apiSend } from './client';

/** Every designs query starts with this key, so one invalidation refreshes them all. */
export const designsQueryKey = ['designs'] as const;
export const designListKey = [...designsQueryKey, 'list'] as const;
export const designDetailKey = (id: string) => [...designsQueryKey, 'detail', id] as const;

const designPath = (id: string) => `/api/designs/${encodeURIComponent(id)}`;

/** `GET /api/designs`: the team's leg designs, most recently changed first. */
export function useDesigns() {
  return useQuery({
    queryKey: designListKey,
    queryFn: ({ signal }) => apiGet('/api/designs', designsResponseSchema, { signal }),
  });
}

/** `GET /api/designs/:id`. */
export function useDesign(id: string) {
  return useQuery({
    queryKey: designDetailKey(id),
    queryFn: ({ signal }) => apiGet(designPath(id), designResponseSchema, { signal }),
    enabled: id.length > 0,
  });
}

function useRefreshDesigns() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: designsQueryKey });
}

/** `POST /api/designs`; 400 answers name the offending fields (`lengthMm`, `coldSide`, …). */
export function useCreateDesign() {
  const onSuccess = useRefreshDesigns();
  return useMutation({
    mutationFn: (body: DesignInput) => apiSend('POST', '/api/designs', { json: body }, designResponseSchema),
    onSuccess,
  });
}

export type UpdateDesignVariables = { id: string; body: DesignInput };

/** `PUT /api/designs/:id`: the whole design again (runs keep their own frozen copy). */
export function useUpdateDesign() {
  const onSuccess = useRefreshDesigns();
  return useMutation({
    mutationFn: ({ id, body }: UpdateDesignVariables) => apiSend('PUT', designPath(id), { json: body }, designResponseSchema),
    onSuccess,
  });
}

export type FollowVariables = { id: string; follow: boolean };

/** `POST` / `DELETE /api/designs/:id/follow`: followers are e-mailed when the design's runs end. */
export function useFollowDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, follow }: FollowVariables) =>
      apiSend(follow ? 'POST' : 'DELETE', `${designPath(id)}/follow`, { none: true }, designResponseSchema),
    onSuccess: (data) => {
      queryClient.setQueryData(designDetailKey(data.design.id), data);
      return queryClient.invalidateQueries({ queryKey: designListKey });
    },
  });
}
