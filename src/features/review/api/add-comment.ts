import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const addComment = (studyId: string, body: string) =>
  api.post<{ id: string }>(`/studies/${encodeURIComponent(studyId)}/comments`, { body });

export function useAddComment(studyId: string, options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => addComment(studyId, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: reviewKeys.history(studyId) });
      options.onSuccess?.();
    },
  });
}
