import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { comparisonKeys } from './keys';

export const deleteComparison = (id: string) => api.delete<void>(`/comparisons/${encodeURIComponent(id)}`);

export function useDeleteComparison(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteComparison,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: comparisonKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: comparisonKeys.lists() });
      options.onSuccess?.();
    },
  });
}
