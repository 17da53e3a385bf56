import { useMutation, useQueryClient } from '@tanstack/react-query';
import { uploadPreviewSchema, uploadSavedSchema } from '@/shared/api/family-upload';
import { apiSend } from './client';
import { familiesQueryKey } from './families';
import type { PickedFile } from './picked-file';
import { appendFile } from './upload-form';

export type { PickedFile } from './picked-file';

/** `POST /api/families/upload/preview`: parse and check a CSV, save nothing. */
export function usePreviewUpload() {
  return useMutation({
    mutationFn: (file: PickedFile) => {
      const form = new FormData();
      appendFile(form, 'file', file);
      return apiSend('POST', '/api/families/upload/preview', { form }, uploadPreviewSchema);
    },
  });
}

export type SaveUploadVariables = {
  file: PickedFile;
  name: string;
  source: string;
  summary: string;
};

/** `POST /api/families/upload`: the same file again plus provenance; all or nothing. */
export function useSaveUpload() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, name, source, summary }: SaveUploadVariables) => {
      const form = new FormData();
      form.append('name', name);
      form.append('source', source);
      form.append('summary', summary);
      appendFile(form, 'file', file);
      return apiSend('POST', '/api/families/upload', { form }, uploadSavedSchema);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: familiesQueryKey }),
  });
}
