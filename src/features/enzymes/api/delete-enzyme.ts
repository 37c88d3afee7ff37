import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export const deleteEnzyme = (id: string) => api.delete<void>(`/enzymes/${encodeURIComponent(id)}`);

export function useDeleteEnzyme(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteEnzyme,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: enzymeKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.();
    },
  });
}
