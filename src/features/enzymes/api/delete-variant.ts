import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export const deleteVariant = (id: string) => api.delete<void>(`/variants/${encodeURIComponent(id)}`);

export function useDeleteVariant(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteVariant,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.();
    },
  });
}
