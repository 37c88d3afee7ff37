import { useMutation } from '@tanstack/react-query';
import type { ImportPreview } from '@shared/schemas/plates-types';
import { uploadForm, type UploadProgress } from '@/lib/upload';

export type PreviewInput = {
  plateId: string;
  file: File;
  onProgress?: (p: UploadProgress) => void;
  signal?: AbortSignal;
};

/** Sends the file to be parsed: what was found comes back; nothing is stored. */
export function previewImport({ plateId, file, onProgress, signal }: PreviewInput) {
  const form = new FormData();
  form.append('file', file, file.name);
  return uploadForm<ImportPreview>(`/plates/${encodeURIComponent(plateId)}/reads/preview`, form, {
    onProgress,
    signal,
  });
}

export function usePreviewImport() {
  return useMutation({ mutationFn: previewImport });
}
