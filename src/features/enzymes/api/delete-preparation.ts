import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export const deletePreparation = (id: string) => api.delete<void>(`/preparations/${encodeURIComponent(id)}`);

export function useDeletePreparation(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePreparation,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.();
    },
  });
}
