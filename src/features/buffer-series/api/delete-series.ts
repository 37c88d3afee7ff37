import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';

export const deleteSeries = (id: string) => api.delete<void>(`/buffer-series/${encodeURIComponent(id)}`);

export function useDeleteSeries(options: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSeries,
    onSuccess: async (_data, id) => {
      queryClient.removeQueries({ queryKey: seriesKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: seriesKeys.lists() });
      options.onSuccess?.();
    },
  });
}
