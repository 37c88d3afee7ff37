import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportSelection } from '@shared/schemas/plates';
import { uploadForm, type UploadProgress } from '@/lib/upload';
import { readKeys } from './keys';

export type ImportInput = {
  plateId: string;
  file: File;
  selection: ImportSelection;
  onProgress?: (p: UploadProgress) => void;
  signal?: AbortSignal;
};
export type ImportResult = { fileId: string; readIds: string[]; sha256: string };

/** Sends the same file again with the confirmed blocks; the server stores all or nothing. */
export function importReads({ plateId, file, selection, onProgress, signal }: ImportInput) {
  const form = new FormData();
  // Fields before the file: multer reads them as they stream in.
  form.append('selection', JSON.stringify(selection));
  form.append('file', file, file.name);
  return uploadForm<ImportResult>(`/plates/${encodeURIComponent(plateId)}/reads`, form, {
    onProgress,
    signal,
  });
}

export function useImportReads(
  options: { onSuccess?: (result: ImportResult, input: ImportInput) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importReads,
    onSuccess: async (result, input) => {
      await queryClient.invalidateQueries({ queryKey: readKeys.list(input.plateId) });
      options.onSuccess?.(result, input);
    },
  });
}
