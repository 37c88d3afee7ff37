import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { studyKeys } from './keys';

export const deleteStudy = (id: string) => api.delete<void>(`/studies/${encodeURIComponent(id)}`);

export function useDeleteStudy(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteStudy,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: studyKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: studyKeys.all });
      options.onSuccess?.();
    },
  });
}
