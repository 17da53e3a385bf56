import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  familySummarySchema,
  type CreateFamilyRequest,
  type UpdateFamilyRequest,
} from '@/shared/api/families';
import { apiSend } from './client';
import { familiesQueryKey } from './families';

/** Create, update, duplicate, archive and unarchive all answer `{ family }`. */
export const familyEnvelopeSchema = z.object({ family: familySummarySchema });
export type FamilyEnvelope = z.infer<typeof familyEnvelopeSchema>;

const familyPath = (id: string) => `/api/families/${encodeURIComponent(id)}`;

/** Any change to a family can change every list and detail view: refetch them all. */
function useRefreshFamilies() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: familiesQueryKey });
}

/** `POST /api/families` (band-model or constant family as JSON). */
export function useCreateFamily() {
  const onSuccess = useRefreshFamilies();
  return useMutation({
    mutationFn: (body: CreateFamilyRequest) =>
      apiSend('POST', '/api/families', { json: body }, familyEnvelopeSchema),
    onSuccess,
  });
}

export type UpdateFamilyVariables = { id: string; body: UpdateFamilyRequest };

/** `PUT /api/families/:id`: a new version when definition, summary or source change. */
export function useUpdateFamily() {
  const onSuccess = useRefreshFamilies();
  return useMutation({
    mutationFn: ({ id, body }: UpdateFamilyVariables) =>
      apiSend('PUT', familyPath(id), { json: body }, familyEnvelopeSchema),
    onSuccess,
  });
}

export type DuplicateFamilyVariables = { id: string; name: string };

/** `POST /api/families/:id/duplicate`: a new family from the current version. */
export function useDuplicateFamily() {
  const onSuccess = useRefreshFamilies();
  return useMutation({
    mutationFn: ({ id, name }: DuplicateFamilyVariables) =>
      apiSend('POST', `${familyPath(id)}/duplicate`, { json: { name } }, familyEnvelopeSchema),
    onSuccess,
  });
}

export type SetArchivedVariables = { id: string; archived: boolean };

/** `POST /api/families/:id/archive` or `/unarchive`. */
export function useSetArchived() {
  const onSuccess = useRefreshFamilies();
  return useMutation({
    mutationFn: ({ id, archived }: SetArchivedVariables) =>
      apiSend(
        'POST',
        `${familyPath(id)}/${archived ? 'archive' : 'unarchive'}`,
        { none: true },
        familyEnvelopeSchema,
      ),
    onSuccess,
  });
}
