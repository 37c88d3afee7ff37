import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { assayKeys } from './keys';

export const deleteAssay = (id: string) => api.delete<void>(`/assays/${encodeURIComponent(id)}`);

export function useDeleteAssay(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAssay,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: assayKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: assayKeys.all });
      options.onSuccess?.();
    },
  });
}
